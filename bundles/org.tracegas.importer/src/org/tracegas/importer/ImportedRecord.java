package org.tracegas.importer;

import java.util.Map;

/** One spectrum or interferogram of an imported file, with its metadata and where it came from. */
public sealed interface ImportedRecord permits ImportedSpectrum, ImportedInterferogram {

    /** Metadata as found in the file (keys as the format names them), unmodifiable. */
    Map<String, String> metadata();

    /** First 1-based line (text formats) or record number (binary formats) of this record. */
    long firstLine();

    /** Last line or record number of this record. */
    long lastLine();
}
