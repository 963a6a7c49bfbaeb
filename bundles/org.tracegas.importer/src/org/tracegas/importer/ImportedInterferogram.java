package org.tracegas.importer;

import java.util.Map;

import org.tracegas.spectrum.Interferogram;

/** An imported raw interferogram. */
public record ImportedInterferogram(Interferogram interferogram, Map<String, String> metadata, long firstLine,
        long lastLine) implements ImportedRecord {

    public ImportedInterferogram {
        if (interferogram == null) {
            throw new IllegalArgumentException("interferogram must not be null");
        }
        metadata = Metadata.copy(metadata);
        Metadata.checkLines(firstLine, lastLine);
    }
}
