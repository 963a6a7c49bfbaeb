package org.tracegas.store;

/** How spectral values are stored: IEEE 754 numbers, little-endian, one after the other. */
public enum SampleEncoding {
    /** 8 bytes per value; the round trip is bit-exact. */
    FLOAT64_LE(8),
    /** 4 bytes per value; values are rounded to the nearest float, for long time series. */
    FLOAT32_LE(4);

    private final int bytesPerValue;

    SampleEncoding(int bytesPerValue) {
        this.bytesPerValue = bytesPerValue;
    }

    public int bytesPerValue() {
        return bytesPerValue;
    }
}
