package org.tracegas.importer;

import org.tracegas.spectrum.AxisUnit;

/**
 * Settings of one import.
 *
 * @param maxWholeFileBytes         whole-file formats (JCAMP-DX, delimited text) refuse larger files;
 *                                  streaming formats are not limited
 * @param wavelengthToWavenumber    convert micrometre axes of delimited text to wavenumbers (1e4/λ)
 * @param assumedAxisUnit           axis unit of delimited text without a header naming it; null: refuse
 */
public record ImportOptions(long maxWholeFileBytes, boolean wavelengthToWavenumber, AxisUnit assumedAxisUnit) {

    /** 256 MiB: far above any single spectrum file, well below a typical heap. Common practice, no source. */
    public static final long DEFAULT_MAX_WHOLE_FILE_BYTES = 256L << 20;

    public ImportOptions {
        if (maxWholeFileBytes < 1) {
            throw new IllegalArgumentException("maxWholeFileBytes must be positive, was " + maxWholeFileBytes);
        }
        if (assumedAxisUnit == AxisUnit.SAMPLE_INDEX) {
            throw new IllegalArgumentException("assumedAxisUnit must be a spectral unit, was SAMPLE_INDEX");
        }
    }

    public static ImportOptions defaults() {
        return new ImportOptions(DEFAULT_MAX_WHOLE_FILE_BYTES, false, null);
    }

    public ImportOptions withMaxWholeFileBytes(long bytes) {
        return new ImportOptions(bytes, wavelengthToWavenumber, assumedAxisUnit);
    }

    public ImportOptions withWavelengthToWavenumber(boolean convert) {
        return new ImportOptions(maxWholeFileBytes, convert, assumedAxisUnit);
    }

    public ImportOptions withAssumedAxisUnit(AxisUnit unit) {
        return new ImportOptions(maxWholeFileBytes, wavelengthToWavenumber, unit);
    }
}
