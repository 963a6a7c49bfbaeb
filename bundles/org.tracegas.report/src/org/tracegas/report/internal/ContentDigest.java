package org.tracegas.report.internal;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The canonical bytes of a sequence of fields and their SHA-256. Each field is written with its length first,
 * so that no two different field sequences give the same byte stream.
 */
public final class ContentDigest {

    private final ByteArrayOutputStream bytes = new ByteArrayOutputStream();

    public ContentDigest add(String field) {
        byte[] b = String.valueOf(field).getBytes(StandardCharsets.UTF_8);
        bytes.writeBytes((b.length + ":").getBytes(StandardCharsets.US_ASCII));
        bytes.writeBytes(b);
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

    /** The canonical bytes written so far. */
    public byte[] bytes() {
        return bytes.toByteArray();
    }

    /** Lower-case hex of the SHA-256 of the canonical bytes. */
    public String hex() {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes.toByteArray()));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
