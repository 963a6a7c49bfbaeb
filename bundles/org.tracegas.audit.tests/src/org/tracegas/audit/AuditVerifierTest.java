package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.tracegas.audit.ChainFinding.Kind;
import org.tracegas.audit.internal.ChainHash;

class AuditVerifierTest {

    static List<String> kinds() {
        return TestDatabase.kinds();
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void consistentRewriteIsCaughtOnlyByAnAnchor(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            ChainFixture.build(c, 30, new Random(7));
            c.commit();
            ChainAnchor anchor = ChainAnchor.headOf(AuditVerifier.verify(c));
            assertEquals(30, anchor.sequence());
            // an attacker with owner rights changes record 12 and recomputes every later hash and the head
            db.dropTriggers(c);
            List<AuditRecord> chain = AuditReview.review(c, AuditQuery.all().build()).records();
            String prev = chain.get(10).hash();
            for (AuditRecord r : chain.subList(11, chain.size())) {
                AuditRecord forged = new AuditRecord(r.sequence(), r.recordId(), r.recordedAt(),
                        r.sequence() == 12 ? "mallory" : r.userId(), r.action(), r.objectType(), r.objectId(),
                        r.objectVersion(), r.oldValue(), r.newValue(), r.reason(), r.signerName(), r.meaning(),
                        r.contentSha256(), prev, null);
                prev = ChainHash.of(forged);
                try (PreparedStatement ps = c.prepareStatement(
                        "UPDATE audit_record SET user_id = ?, prev_hash = ?, hash = ? WHERE seq = ?")) {
                    ps.setString(1, forged.userId());
                    ps.setString(2, forged.previousHash());
                    ps.setString(3, prev);
                    ps.setLong(4, r.sequence());
                    ps.executeUpdate();
                }
            }
            try (PreparedStatement ps = c.prepareStatement("UPDATE audit_chain_head SET last_hash = ?")) {
                ps.setString(1, prev);
                ps.executeUpdate();
            }
            c.commit();
            assertTrue(AuditVerifier.verify(c).intact(), "without a secret a full rewrite is self-consistent");
            VerificationReport anchored = AuditVerifier.verify(c, List.of(anchor));
            assertEquals(List.of(new ChainFinding(Kind.ALTERED, 30, chain.get(29).recordId(),
                    "hash differs from the anchor kept outside the database")), anchored.findings());
            VerificationReport early = AuditVerifier.verify(c, List.of(new ChainAnchor(11, chain.get(10).hash()),
                    new ChainAnchor(31, anchor.hash())));
            assertEquals(1, early.findings().size(), early.findings().toString());
            assertTrue(early.names(Kind.REMOVED, 31), "an anchor beyond the chain names a removed record");
        }
    }

    @Test
    void streamsALongChain() throws Exception {
        try (TestDatabase db = TestDatabase.create("h2"); Connection c = db.openInstalled()) {
            for (int t = 0; t < 5; t++) {
                List<AuditEntry> batch = new java.util.ArrayList<>();
                for (int i = 0; i < 1000; i++) {
                    batch.add(AuditEntry.builder("u", AuditAction.CHANGE, "result", "r" + i).version(t).build());
                }
                AuditTrail.appendAll(c, batch);
                c.commit();
            }
            c.setAutoCommit(true);
            VerificationReport report = AuditVerifier.verify(c);
            assertTrue(report.intact());
            assertEquals(5000, report.recordsChecked());
            assertTrue(c.getAutoCommit(), "the caller's auto-commit mode is restored");
        }
    }

    @Test
    void anchorNamesMalformedFields() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ChainAnchor(0, ChainHash.GENESIS)).getMessage()
                .startsWith("sequence:"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ChainAnchor(1, "abc")).getMessage()
                .startsWith("hash:"));
        assertFalse(new ChainAnchor(1, ChainHash.GENESIS).hash().isEmpty());
    }
}
