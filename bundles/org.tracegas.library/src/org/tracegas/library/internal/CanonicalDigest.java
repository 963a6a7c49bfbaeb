package org.tracegas.library.internal;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * SHA-256 over a canonical serialization. Every item is written as a type tag, its field name and a
 * length-prefixed text, so that no two different field sequences give the same byte stream. Doubles are
 * written through {@link Double#toString(double)}, which is exact and distinguishes -0.0 from 0.0.
 */
public final class CanonicalDigest {

    private final MessageDigest digest;

    public CanonicalDigest() {
        try {
            digest = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            // every Java platform must provide SHA-256 (java.security.MessageDigest specification)
            throw new IllegalStateException("SHA-256 is not available", e);
        }
    }

    public CanonicalDigest text(String field, String value) {
        return put('s', field, value);
    }

    public CanonicalDigest number(String field, double value) {
        return put('d', field, Double.toString(value));
    }

    public CanonicalDigest count(String field, long value) {
        return put('n', field, Long.toString(value));
    }

    public CanonicalDigest numbers(String field, double[] values) {
        count(field + ".length", values.length);
        StringBuilder sb = new StringBuilder(values.length * 20);
        for (double v : values) {
            sb.append(Double.toString(v)).append(';');
        }
        return put('a', field, sb.toString());
    }

    private CanonicalDigest put(char tag, String field, String value) {
        byte[] f = field.getBytes(StandardCharsets.UTF_8);
        byte[] v = value.getBytes(StandardCharsets.UTF_8);
        digest.update((byte) tag);
        digest.update((f.length + ":").getBytes(StandardCharsets.US_ASCII));
        digest.update(f);
        digest.update((v.length + ":").getBytes(StandardCharsets.US_ASCII));
        digest.update(v);
        return this;
    }

    /** The digest as 64 lower-case hexadecimal digits; the instance must not be used afterwards. */
    public String hex() {
        return HexFormat.of().formatHex(digest.digest());
    }
}
