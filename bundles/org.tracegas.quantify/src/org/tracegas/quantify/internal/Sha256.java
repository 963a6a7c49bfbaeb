package org.tracegas.quantify.internal;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** SHA-256 digests as lower-case hex, for the reprocessing record. */
public final class Sha256 {

    private Sha256() {
    }

    public static String hex(byte[] data) {
        return HexFormat.of().formatHex(digest().digest(data));
    }

    /**
     * Digest of a spectrum's axis values followed by its values, each as the 8 big-endian bytes of its raw IEEE 754
     * bits, preceded by the point count; two spectra hash alike only if every bit of their numbers is alike.
     */
    public static String ofSpectrum(Spectrum spectrum) {
        return HexFormat.of().formatHex(values(axisPrefix(spectrum.axis()), spectrum));
    }

    /**
     * {@link #ofSpectrum(Spectrum)} for many spectra on one axis: the digest state after the count and axis is
     * computed once and copied for each spectrum, which halves the work per spectrum.
     */
    public static final class SpectrumHasher {
        private final SpectralAxis axis;
        private final MessageDigest prefix;

        public SpectrumHasher(SpectralAxis axis) {
            this.axis = axis;
            this.prefix = axisPrefix(axis);
        }

        public String hash(Spectrum spectrum) {
            if (!spectrum.axis().equals(axis)) {
                return ofSpectrum(spectrum);
            }
            try {
                return HexFormat.of().formatHex(values((MessageDigest) prefix.clone(), spectrum));
            } catch (CloneNotSupportedException e) {
                return ofSpectrum(spectrum);
            }
        }
    }

    private static MessageDigest axisPrefix(SpectralAxis axis) {
        MessageDigest md = digest();
        md.update(longBytes(axis.size()));
        double[] values = axis.toArray();
        byte[] buffer = new byte[8 * values.length];
        fill(buffer, values);
        md.update(buffer);
        return md;
    }

    private static byte[] values(MessageDigest md, Spectrum spectrum) {
        byte[] buffer = new byte[8 * spectrum.size()];
        fill(buffer, spectrum.toArray());
        md.update(buffer);
        return md.digest();
    }

    private static void fill(byte[] buffer, double[] values) {
        for (int i = 0; i < values.length; i++) {
            long bits = Double.doubleToRawLongBits(values[i]);
            for (int b = 0; b < 8; b++) {
                buffer[8 * i + b] = (byte) (bits >>> (56 - 8 * b));
            }
        }
    }

    private static byte[] longBytes(long v) {
        byte[] b = new byte[8];
        for (int i = 0; i < 8; i++) {
            b[i] = (byte) (v >>> (56 - 8 * i));
        }
        return b;
    }

    private static MessageDigest digest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            // every Java platform must provide SHA-256 (java.security.MessageDigest contract)
            throw new IllegalStateException("SHA-256 not available", e);
        }
    }
}
