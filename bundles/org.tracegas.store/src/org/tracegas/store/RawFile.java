package org.tracegas.store;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * A file as it was read, kept whole and addressed by the SHA-256 of its bytes, so that the same file imported
 * again is recognised whatever its name.
 */
public final class RawFile {

    private final String fileName;
    private final String format;
    private final byte[] content;
    private final String sha256;

    /**
     * @param fileName the file's name as given (without folders it is still unique enough to be named)
     * @param format   the format the reader recognised, e.g. "JCAMP-DX 5.01"
     * @param content  the file's bytes, copied
     * @throws IllegalArgumentException if a field is null or blank, or the content is empty
     */
    public RawFile(String fileName, String format, byte[] content) {
        if (fileName == null || fileName.isBlank()) {
            throw new IllegalArgumentException("fileName must not be blank");
        }
        if (format == null || format.isBlank()) {
            throw new IllegalArgumentException("format of " + fileName + " must not be blank");
        }
        if (content == null || content.length == 0) {
            throw new IllegalArgumentException("content of " + fileName + " must not be empty");
        }
        this.fileName = fileName;
        this.format = format;
        this.content = content.clone();
        this.sha256 = sha256Hex(this.content);
    }

    /** SHA-256, lower-case hex, of a file's bytes: the address under which the store keeps it. */
    public static String sha256Hex(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }


    public String fileName() {
        return fileName;
    }

    public String format() {
        return format;
    }

    /** A copy of the bytes. */
    public byte[] content() {
        return content.clone();
    }

    public int size() {
        return content.length;
    }

    public String sha256() {
        return sha256;
    }
}
