package org.tracegas.importer;

import java.util.Map;

import org.tracegas.spectrum.Spectrum;

/** An imported spectrum. */
public record ImportedSpectrum(Spectrum spectrum, Map<String, String> metadata, long firstLine, long lastLine)
        implements ImportedRecord {

    public ImportedSpectrum {
        if (spectrum == null) {
            throw new IllegalArgumentException("spectrum must not be null");
        }
        metadata = Metadata.copy(metadata);
        Metadata.checkLines(firstLine, lastLine);
    }
}
