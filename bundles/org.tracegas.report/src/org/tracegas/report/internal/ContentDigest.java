package org.tracegas.report.internal;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * SHA-256 over a sequence of fields. Each field is fed with its length first, so that no two different
 * field sequences give the same byte stream.
 */
public final class ContentDigest {

    private final MessageDigest sha;

    public ContentDigest() {
        try {
            sha = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    public ContentDigest add(String field) {
        byte[] b = String.valueOf(field).getBytes(StandardCharsets.UTF_8);
        sha.update((b.length + ":").getBytes(StandardCharsets.US_ASCII));
        sha.update(b);
        return this;
    }

    public ContentDigest add(double value) {
        return add(Double.toString(value));
    }

    public ContentDigest add(double[] values) {
        add(values.length);
        for (double v : values) {
            add(v);
        }
        return this;
    }

    public ContentDigest add(Object value) {
        return add(String.valueOf(value));
    }

    /** Lower-case hex of the digest; the digest cannot be used afterwards. */
    public String hex() {
        return HexFormat.of().formatHex(sha.digest());
    }
}
