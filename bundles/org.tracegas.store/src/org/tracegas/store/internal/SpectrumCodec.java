package org.tracegas.store.internal;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

import org.tracegas.store.SampleEncoding;

/** Spectral arrays to and from little-endian IEEE 754 bytes. */
final class SpectrumCodec {

    private SpectrumCodec() {
    }

    static byte[] encode(double[] values, SampleEncoding encoding) {
        ByteBuffer buffer = ByteBuffer.allocate(values.length * encoding.bytesPerValue())
                .order(ByteOrder.LITTLE_ENDIAN);
        switch (encoding) {
            case FLOAT64_LE -> buffer.asDoubleBuffer().put(values);
            case FLOAT32_LE -> {
                for (double v : values) {
                    buffer.putFloat((float) v);
                }
            }
        }
        return buffer.array();
    }

    /**
     * @param what names the array for the error message
     * @throws IllegalStateException if the byte count does not match the point count
     */
    static double[] decode(byte[] bytes, SampleEncoding encoding, int count, String what) {
        if (bytes.length != (long) count * encoding.bytesPerValue()) {
            throw new IllegalStateException(what + " holds " + bytes.length + " bytes, expected " + count
                    + " values of " + encoding.bytesPerValue() + " bytes");
        }
        ByteBuffer buffer = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN);
        double[] values = new double[count];
        switch (encoding) {
            case FLOAT64_LE -> buffer.asDoubleBuffer().get(values);
            case FLOAT32_LE -> {
                for (int i = 0; i < count; i++) {
                    values[i] = buffer.getFloat();
                }
            }
        }
        return values;
    }

    static String sha256Hex(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is not available in this Java runtime", e);
        }
    }
}
