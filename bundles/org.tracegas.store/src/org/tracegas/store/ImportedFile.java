package org.tracegas.store;

import java.time.Instant;
import java.util.List;

/**
 * An imported file as the store keeps it.
 *
 * @param sha256         SHA-256 of its bytes, its address in the project
 * @param fileName       the name it was imported under first
 * @param format         the format its reader recognised
 * @param byteCount      its size
 * @param importedAt     when it was imported first
 * @param measurementIds its measurements, in record order
 * @param added          whether this call added it; false when the project held the same bytes already
 */
public record ImportedFile(String sha256, String fileName, String format, long byteCount, Instant importedAt,
        List<String> measurementIds, boolean added) {

    public ImportedFile {
        measurementIds = List.copyOf(measurementIds);
    }
}
