package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.sql.Connection;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class AuditReviewTest {

    static List<String> kinds() {
        return TestDatabase.kinds();
    }

    private static AuditEntry entry(String user, AuditAction action, String type, String id) {
        return AuditEntry.builder(user, action, type, id).version(1).build();
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void filtersByUserObjectActionAndTime(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            AuditTrail.append(c, entry("alice", AuditAction.CREATE, "result", "r1"));
            AuditTrail.append(c, entry("bob", AuditAction.CHANGE, "result", "r1"));
            c.commit();
            Thread.sleep(20);
            Instant between = AuditReview.review(c, AuditQuery.all().build()).records().get(1).recordedAt().plusMillis(10);
            Thread.sleep(20);
            AuditTrail.append(c, entry("alice", AuditAction.CHANGE, "report", "p1"));
            AuditTrail.append(c, entry("bob", AuditAction.LOGIN, "session", "s1"));
            c.commit();
            assertEquals(List.of(1L, 3L), seqs(c, AuditQuery.all().user("alice").build()));
            assertEquals(List.of(1L, 2L), seqs(c, AuditQuery.all().object("result", "r1").build()));
            assertEquals(List.of(3L), seqs(c, AuditQuery.all().objectType("report").build()));
            assertEquals(List.of(2L, 3L), seqs(c, AuditQuery.all().actions(AuditAction.CHANGE).build()));
            assertEquals(List.of(1L, 2L), seqs(c, AuditQuery.all().between(null, between).build()));
            assertEquals(List.of(3L, 4L), seqs(c, AuditQuery.all().between(between, null).build()));
            assertEquals(List.of(4L), seqs(c, AuditQuery.all().user("bob").between(between, null)
                    .actions(AuditAction.LOGIN, AuditAction.LOGOUT).build()));
            assertTrue(AuditReview.review(c, AuditQuery.all().build()).chain().intact());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void exportsCsvWithQuotingAndTheChainStateShowsTampering(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            AuditRecord r = AuditTrail.append(c, AuditEntry.builder("alice", AuditAction.CHANGE, "result", "r,1")
                    .version(2).oldValue("note=say \"hi\"\n").newValue("note=bye\n").reason("typo, fixed")
                    .touchesApprovedData(true).build());
            c.commit();
            StringWriter out = new StringWriter();
            assertEquals(1, AuditReview.exportCsv(c, AuditQuery.all().build(), out));
            String expected = String.join(",", AuditReview.CSV_HEADER) + "\r\n"
                    + "1," + r.recordId() + "," + r.recordedAt() + ",alice,CHANGE,result,\"r,1\",2,"
                    + "\"note=say \"\"hi\"\"\n\",\"note=bye\n\",\"typo, fixed\",,,," + r.previousHash() + "," + r.hash() + "\r\n";
            assertEquals(expected, out.toString(), "RFC 4180 section 2 rules 1, 6, 7");
            assertTrue(r.recordedAt().toString().endsWith("Z"), "times are exported in UTC");

            db.dropTriggers(c);
            try (Statement s = c.createStatement()) {
                s.executeUpdate("UPDATE audit_record SET reason = 'none' WHERE seq = 1");
            }
            c.commit();
            AuditReview.Result result = AuditReview.review(c, AuditQuery.all().user("alice").build());
            assertFalse(result.chain().intact());
            assertTrue(result.chain().names(ChainFinding.Kind.ALTERED, 1), result.chain().findings().toString());
        }
    }

    @Test
    void queryRefusesContradictoryCriteria() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> AuditQuery.all().between(Instant.EPOCH, Instant.EPOCH)
                .build()).getMessage().startsWith("from:"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> new AuditQuery(null, null, "x", null, null, null)).getMessage().startsWith("objectType:"));
    }

    private static List<Long> seqs(Connection c, AuditQuery q) throws Exception {
        return AuditReview.review(c, q).records().stream().map(AuditRecord::sequence).toList();
    }
}
