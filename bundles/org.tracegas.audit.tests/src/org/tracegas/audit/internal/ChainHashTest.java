package org.tracegas.audit.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.SignatureMeaning;

class ChainHashTest {

    private static final Instant T = Instant.parse("2026-03-01T10:15:30.123456Z");

    private static AuditRecord record(String prev, String user, String oldValue, String newValue) {
        return new AuditRecord(1, "id-1", T, user, AuditAction.CHANGE, "result", "r1", 2, oldValue, newValue, null, null,
                null, null, prev, null);
    }

    @Test
    void sha256MatchesPublishedVectors() {
        // FIPS 180-2 Appendix B.1 ("abc") and B.2 (448-bit message); empty string: NIST CAVS SHA256ShortMsg Len = 0
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                ChainHash.sha256Hex("abc".getBytes(StandardCharsets.US_ASCII)));
        assertEquals("248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1", ChainHash.sha256Hex(
                "abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq".getBytes(StandardCharsets.US_ASCII)));
        assertEquals("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855", ChainHash.sha256Hex(new byte[0]));
    }

    @Test
    void everyFieldAndThePredecessorEnterTheHash() {
        AuditRecord base = record(ChainHash.GENESIS, "alice", "a", "b");
        List<AuditRecord> variants = List.of(base,
                record("1".repeat(64), "alice", "a", "b"),
                record(ChainHash.GENESIS, "alicf", "a", "b"),
                record(ChainHash.GENESIS, "alice", null, "b"),
                record(ChainHash.GENESIS, "alice", "", "b"),
                // moving text between neighbouring fields must change the hash (length-prefixed fields)
                record(ChainHash.GENESIS, "alice", "ab", ""),
                new AuditRecord(1, "id-1", T.plusNanos(1000), "alice", AuditAction.CHANGE, "result", "r1", 2, "a", "b",
                        null, null, null, null, ChainHash.GENESIS, null),
                new AuditRecord(1, "id-1", T, "alice", AuditAction.CHANGE, "result", "r1", 2, "a", "b", null, "N",
                        SignatureMeaning.REVIEWED, null, ChainHash.GENESIS, null));
        Set<String> hashes = new HashSet<>();
        for (AuditRecord r : variants) {
            String h = ChainHash.of(r);
            assertTrue(ChainHash.isSha256Hex(h), h);
            hashes.add(h);
        }
        assertEquals(variants.size(), hashes.size(), "no two variants share a hash");
    }

    @Test
    void sequenceNumberAndStoredHashDoNotEnterTheHash() {
        AuditRecord a = record(ChainHash.GENESIS, "alice", "a", "b");
        AuditRecord moved = new AuditRecord(9, a.recordId(), a.recordedAt(), a.userId(), a.action(), a.objectType(),
                a.objectId(), a.objectVersion(), a.oldValue(), a.newValue(), a.reason(), null, null, null, a.previousHash(),
                "f".repeat(64));
        assertEquals(ChainHash.of(a), ChainHash.of(moved));
        assertNotEquals(ChainHash.of(a), ChainHash.GENESIS);
        assertFalse(ChainHash.isSha256Hex("F".repeat(64)), "upper case is not the stored form");
    }
}
