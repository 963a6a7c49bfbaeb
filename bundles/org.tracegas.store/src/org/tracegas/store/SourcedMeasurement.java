package org.tracegas.store;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tracegas.model.SpectralContent;

/**
 * A measurement of a project with the file record it came from.
 *
 * @param measurement the measurement: kind, time, conditions
 * @param title       the record's title
 * @param fileName    the imported file's name
 * @param fileSha256  the SHA-256 of the imported file's bytes
 * @param recordIndex the record's place in the file, from 0
 * @param content     what the stored values are
 * @param spectrumId  the stored values as read from the file
 * @param labels      the record's labels as imported
 */
public record SourcedMeasurement(MeasurementInfo measurement, String title, String fileName, String fileSha256,
        int recordIndex, SpectralContent content, String spectrumId, Map<String, String> labels) {

    public SourcedMeasurement {
        labels = Collections.unmodifiableMap(new LinkedHashMap<>(labels));
    }
}
