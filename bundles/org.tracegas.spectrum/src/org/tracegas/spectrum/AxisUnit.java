package org.tracegas.spectrum;

/** Unit of a spectral axis. */
public enum AxisUnit {
    /** Wavenumber in reciprocal centimetres. */
    WAVENUMBER,
    /** Wavelength in micrometres. */
    MICROMETRE,
    /** Sample index of an interferogram (one step per sampling interval of the reference laser). */
    SAMPLE_INDEX
}
