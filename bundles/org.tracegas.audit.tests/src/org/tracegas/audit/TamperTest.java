package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.UUID;

import org.junit.jupiter.api.Test;
import org.tracegas.audit.ChainFinding.Kind;
import org.tracegas.audit.internal.ChainHash;
import org.tracegas.audit.internal.RecordRows;

/**
 * Random tampering by someone with owner rights on the database who has removed the append-only
 * triggers: every change must be found by the verifier and named by sequence number (and record id).
 * Each tampering is made in a transaction, verified inside it, and rolled back.
 */
class TamperTest {

    private static final int CHAIN_LENGTH = 60;

    /** Ways of tampering. */
    enum Tampering {
        ALTER_FIELD, ALTER_AND_REHASH, DELETE, INSERT_FORGED, INSERT_UNLINKED, SWAP
    }

    @Test
    void everyTamperingIsFoundOnH2() throws Exception {
        try (TestDatabase db = TestDatabase.create("h2")) {
            Map<Tampering, Integer> done = tamper(db, 1400, 20260101L);
            assertTrue(done.values().stream().mapToInt(Integer::intValue).sum() >= 1400);
        }
    }

    @Test
    void everyTamperingIsFoundOnPostgresql() throws Exception {
        try (TestDatabase db = TestDatabase.create("postgresql")) {
            tamper(db, 600, 20260102L);
        }
    }

    private static Map<Tampering, Integer> tamper(TestDatabase db, int count, long seed) throws Exception {
        Random rnd = new Random(seed);
        Map<Tampering, Integer> done = new EnumMap<>(Tampering.class);
        try (Connection c = db.openInstalled()) {
            ChainFixture.build(c, CHAIN_LENGTH, rnd);
            c.commit();
            db.dropTriggers(c);
            List<AuditRecord> chain = AuditReview.review(c, AuditQuery.all().build()).records();
            c.commit();
            for (int i = 0; i < count; i++) {
                Tampering t = Tampering.values()[i % Tampering.values().length];
                Expected expected = apply(c, t, chain, rnd);
                VerificationReport report = AuditVerifier.verify(c);
                String context = t + " " + expected + " -> " + report.findings();
                assertFalse(report.intact(), context);
                assertTrue(report.names(expected.kind, expected.sequence), context);
                // no false alarms elsewhere: one finding per tampered record (a swap moves two)
                assertEquals(t == Tampering.SWAP ? 2 : 1, report.findings().size(), context);
                if (expected.recordId != null) {
                    assertTrue(report.findings().stream().anyMatch(f -> f.kind() == expected.kind
                            && f.sequence() == expected.sequence && expected.recordId.equals(f.recordId())), context);
                }
                c.rollback();
                done.merge(t, 1, Integer::sum);
            }
            assertTrue(AuditVerifier.verify(c).intact(), "rolling back every tampering restored the chain");
        }
        for (Tampering t : Tampering.values()) {
            assertTrue(done.getOrDefault(t, 0) >= count / Tampering.values().length, t.toString());
        }
        return done;
    }

    record Expected(Kind kind, long sequence, String recordId) {
    }

    private static Expected apply(Connection c, Tampering t, List<AuditRecord> chain, Random rnd) throws SQLException {
        int n = chain.size();
        switch (t) {
            case ALTER_FIELD -> {
                AuditRecord r = chain.get(rnd.nextInt(n));
                alterField(c, r, rnd);
                return new Expected(Kind.ALTERED, r.sequence(), r.recordId());
            }
            case ALTER_AND_REHASH -> {
                AuditRecord r = chain.get(rnd.nextInt(n));
                AuditRecord changed = rehash(withUser(r, r.userId() + "x"));
                update(c, "UPDATE audit_record SET user_id = ?, hash = ? WHERE seq = ?", changed.userId(), changed.hash(),
                        r.sequence());
                return new Expected(Kind.ALTERED, r.sequence(), r.recordId());
            }
            case DELETE -> {
                AuditRecord r = chain.get(rnd.nextInt(n));
                update(c, "DELETE FROM audit_record WHERE seq = ?", r.sequence());
                return new Expected(Kind.REMOVED, r.sequence(), null);
            }
            case INSERT_FORGED, INSERT_UNLINKED -> {
                // insert after position k (0 = before the first), renumbering what follows as an attacker would
                int k = rnd.nextInt(n + 1);
                String prev = t == Tampering.INSERT_UNLINKED ? ChainHash.sha256Hex(new byte[] {(byte) k})
                        : k == 0 ? ChainHash.GENESIS : chain.get(k - 1).hash();
                AuditRecord forged = rehash(new AuditRecord(k + 1, UUID.randomUUID().toString(),
                        chain.get(Math.max(0, k - 1)).recordedAt(), "mallory", AuditAction.CHANGE, "result", "r-forged", 3,
                        "ppm=1\n", "ppm=2\n", "correction", null, null, null, prev, null));
                if (k < n) {
                    update(c, "UPDATE audit_record SET seq = -(seq + 1) WHERE seq > ?", k);
                    update(c, "UPDATE audit_record SET seq = -seq WHERE seq < 0");
                    update(c, "UPDATE audit_chain_head SET last_seq = last_seq + 1");
                }
                try (PreparedStatement ps = c.prepareStatement(RecordRows.INSERT)) {
                    RecordRows.bind(ps, forged);
                    ps.executeUpdate();
                }
                return new Expected(Kind.INSERTED, k + 1, forged.recordId());
            }
            case SWAP -> {
                int a = rnd.nextInt(n);
                int b = (a + 1 + rnd.nextInt(rnd.nextBoolean() ? 1 : n - 1)) % n;
                long sa = chain.get(a).sequence();
                long sb = chain.get(b).sequence();
                update(c, "UPDATE audit_record SET seq = -1 WHERE seq = ?", sa);
                update(c, "UPDATE audit_record SET seq = ? WHERE seq = ?", sa, sb);
                update(c, "UPDATE audit_record SET seq = ? WHERE seq = -1", sb);
                // both moved records are named; the one now at sa is the record that was at sb
                return new Expected(Kind.REORDERED, rnd.nextBoolean() ? sa : sb, null);
            }
            default -> throw new IllegalStateException(t.toString());
        }
    }

    private static void alterField(Connection c, AuditRecord r, Random rnd) throws SQLException {
        long seq = r.sequence();
        switch (rnd.nextInt(12)) {
            case 0 -> update(c, "UPDATE audit_record SET user_id = ? WHERE seq = ?", "mallory", seq);
            case 1 -> update(c, "UPDATE audit_record SET action = ? WHERE seq = ?",
                    r.action() == AuditAction.DELETE ? "CREATE" : "DELETE", seq);
            case 2 -> update(c, "UPDATE audit_record SET object_id = ? WHERE seq = ?", r.objectId() + "0", seq);
            case 3 -> update(c, "UPDATE audit_record SET object_version = object_version + 1 WHERE seq = ?", seq);
            case 4 -> update(c, "UPDATE audit_record SET old_value = ? WHERE seq = ?", r.oldValue() == null ? "" : null, seq);
            case 5 -> update(c, "UPDATE audit_record SET new_value = ? WHERE seq = ?",
                    r.newValue() == null ? "ppm=0\n" : r.newValue().replace('1', '7') + " ", seq);
            case 6 -> update(c, "UPDATE audit_record SET reason = ? WHERE seq = ?", r.reason() == null ? "typo" : null, seq);
            case 7 -> update(c, "UPDATE audit_record SET recorded_at = ? WHERE seq = ?",
                    OffsetDateTime.ofInstant(r.recordedAt().plusNanos(1000), ZoneOffset.UTC), seq);
            case 8 -> update(c, "UPDATE audit_record SET signer_name = ? WHERE seq = ?", "Someone Else", seq);
            case 9 -> update(c, "UPDATE audit_record SET content_sha256 = ? WHERE seq = ?",
                    ChainHash.sha256Hex(new byte[] {1}), seq);
            case 10 -> update(c, "UPDATE audit_record SET prev_hash = ? WHERE seq = ?", ChainHash.sha256Hex(new byte[] {2}), seq);
            default -> update(c, "UPDATE audit_record SET action = ? WHERE seq = ?", "UNKNOWN", seq);
        }
    }

    private static AuditRecord withUser(AuditRecord r, String user) {
        return new AuditRecord(r.sequence(), r.recordId(), r.recordedAt(), user, r.action(), r.objectType(), r.objectId(),
                r.objectVersion(), r.oldValue(), r.newValue(), r.reason(), r.signerName(), r.meaning(), r.contentSha256(),
                r.previousHash(), r.hash());
    }

    private static AuditRecord rehash(AuditRecord r) {
        return new AuditRecord(r.sequence(), r.recordId(), r.recordedAt(), r.userId(), r.action(), r.objectType(),
                r.objectId(), r.objectVersion(), r.oldValue(), r.newValue(), r.reason(), r.signerName(), r.meaning(),
                r.contentSha256(), r.previousHash(), ChainHash.of(r));
    }

    private static void update(Connection c, String sql, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            for (int i = 0; i < args.length; i++) {
                ps.setObject(i + 1, args[i]);
            }
            ps.executeUpdate();
        }
    }
}
