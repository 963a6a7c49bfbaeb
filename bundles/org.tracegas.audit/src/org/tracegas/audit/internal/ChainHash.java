package org.tracegas.audit.internal;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;

import org.tracegas.audit.AuditRecord;

/**
 * The hash of an audit record: SHA-256 over the predecessor's hash (32 bytes) followed by the record's
 * canonical form. The canonical form writes every field except the sequence number and the hash itself,
 * each as a tag byte, a 4-byte length (-1 for null) and its UTF-8 bytes, so that no two different records
 * share a canonical form. The sequence number is left out on purpose: order is carried by the
 * predecessor links, which lets the verifier tell an inserted or moved record from an altered one.
 */
public final class ChainHash {

    /** Predecessor hash of the first record. */
    public static final String GENESIS = "0".repeat(64);

    private static final HexFormat HEX = HexFormat.of();

    private ChainHash() {
    }

    /** Hash (lower-case hex) of {@code r}, from its stored previous hash and fields; ignores {@code r.hash()}. */
    public static String of(AuditRecord r) {
        MessageDigest sha = sha256();
        sha.update(HEX.parseHex(r.previousHash()));
        Canonical out = new Canonical(sha);
        out.field(1, r.recordId());
        out.field(2, r.recordedAt() == null ? null : Long.toString(micros(r.recordedAt())));
        out.field(3, r.userId());
        out.field(4, r.action() == null ? null : r.action().name());
        out.field(5, r.objectType());
        out.field(6, r.objectId());
        out.field(7, Long.toString(r.objectVersion()));
        out.field(8, r.oldValue());
        out.field(9, r.newValue());
        out.field(10, r.reason());
        out.field(11, r.signerName());
        out.field(12, r.meaning() == null ? null : r.meaning().name());
        out.field(13, r.contentSha256());
        return HEX.formatHex(sha.digest());
    }

    /** SHA-256 of {@code content}, lower-case hex. */
    public static String sha256Hex(byte[] content) {
        return HEX.formatHex(sha256().digest(content));
    }

    /** Whether {@code hex} looks like a SHA-256 value (64 lower-case hex digits). */
    public static boolean isSha256Hex(String hex) {
        return hex != null && hex.length() == 64 && hex.chars().allMatch(ch -> ch >= '0' && ch <= '9' || ch >= 'a' && ch <= 'f');
    }

    /** Microseconds since the epoch: the precision both databases store. */
    public static long micros(Instant t) {
        return ChronoUnit.MICROS.between(Instant.EPOCH, t);
    }

    /** A fresh SHA-256 digest. */
    public static MessageDigest newSha256() {
        return sha256();
    }

    /** Lower-case hex of {@code bytes}. */
    public static String hex(byte[] bytes) {
        return HEX.formatHex(bytes);
    }

    static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    private static final class Canonical {
        private final MessageDigest sha;
        private final byte[] header = new byte[5];

        Canonical(MessageDigest sha) {
            this.sha = sha;
        }

        void field(int tag, String value) {
            byte[] bytes = value == null ? null : value.getBytes(StandardCharsets.UTF_8);
            int length = bytes == null ? -1 : bytes.length;
            header[0] = (byte) tag;
            header[1] = (byte) (length >>> 24);
            header[2] = (byte) (length >>> 16);
            header[3] = (byte) (length >>> 8);
            header[4] = (byte) length;
            sha.update(header);
            if (bytes != null) {
                sha.update(bytes);
            }
        }
    }
}
