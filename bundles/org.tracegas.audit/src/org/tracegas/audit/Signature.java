package org.tracegas.audit;

import java.security.MessageDigest;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;

import org.tracegas.audit.internal.ChainHash;

/**
 * A stored electronic signature: who (id and printed name), when (database time, UTC), what it means,
 * and exactly what was signed (object version and SHA-256 of the content). It is an audit record of
 * action {@link AuditAction#SIGNATURE}, so the hash chain links it to the trail and it cannot be excised,
 * copied or transferred unnoticed (21 CFR 11.70; EU GMP Annex 11 section 14: permanently linked).
 */
public record Signature(long sequence, String recordId, String signerId, String printedName, Instant signedAt,
        SignatureMeaning meaning, String objectType, String objectId, long objectVersion, String contentSha256) {

    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    /** @throws IllegalArgumentException when {@code r} is not a signature record (names its sequence number) */
    public static Signature of(AuditRecord r) {
        if (r.action() != AuditAction.SIGNATURE || r.meaning() == null || r.signerName() == null
                || r.contentSha256() == null) {
            throw new IllegalArgumentException("record " + r.sequence() + ": not a signature record");
        }
        return new Signature(r.sequence(), r.recordId(), r.userId(), r.signerName(), r.recordedAt(), r.meaning(),
                r.objectType(), r.objectId(), r.objectVersion(), r.contentSha256());
    }

    /**
     * The human-readable form required with every display or printout of the signed record: printed name,
     * date and time, meaning (21 CFR 11.50(a), (b)), e.g. "APPROVED by Jane Roe (jroe) 2026-01-05 14:03:10 UTC".
     */
    public String manifestation() {
        return meaning + " by " + printedName + " (" + signerId + ") " + SHOWN.format(signedAt);
    }

    /** Whether {@code content} is exactly what was signed (same SHA-256); false once the content changed. */
    public boolean covers(byte[] content) {
        return MessageDigest.isEqual(ChainHash.sha256Hex(content).getBytes(StandardCharsets.US_ASCII),
                contentSha256.getBytes(StandardCharsets.US_ASCII));
    }
}
