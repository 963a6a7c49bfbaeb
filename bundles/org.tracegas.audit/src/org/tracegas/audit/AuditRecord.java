package org.tracegas.audit;

import java.time.Instant;

/**
 * One stored audit record: the {@link AuditEntry} fields plus what the trail adds (sequence number,
 * record id, database time in UTC, signature fields, hash chain). Immutable.
 *
 * <p>{@code hash} = SHA-256(previousHash || canonical form of the other fields); see
 * {@link AuditVerifier} for what is checked. The signature fields are set only on {@link AuditAction#SIGNATURE}
 * records (21 CFR 11.50 printed name and meaning, 11.70 link to the signed content).
 *
 * @param sequence       position in the chain, 1 for the first record
 * @param recordId       random UUID of the record
 * @param recordedAt     database time of the append (UTC, microseconds)
 * @param signerName     printed name of the signer, or null
 * @param meaning        meaning of the signature, or null
 * @param contentSha256  SHA-256 (hex) of the signed content; on a record without signer and meaning, the digest
 *                       of the data rows the record vouches for ({@link AuditTrail#appendBound}); or null
 * @param previousHash   hash of the preceding record (64 zeros for the first), hex
 * @param hash           hash of this record, hex
 */
public record AuditRecord(long sequence, String recordId, Instant recordedAt, String userId, AuditAction action,
        String objectType, String objectId, long objectVersion, String oldValue, String newValue, String reason,
        String signerName, SignatureMeaning meaning, String contentSha256, String previousHash, String hash) {
}
