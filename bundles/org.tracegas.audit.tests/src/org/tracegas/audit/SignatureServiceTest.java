package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.tracegas.audit.SignatureRefusedException.Reason;

class SignatureServiceTest {

    /** SHA-256("abc") from FIPS 180-2, Appendix B.1 (also in FIPS 180-4 example files). */
    private static final String SHA256_ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";

    private static final byte[] CONTENT = "abc".getBytes(StandardCharsets.US_ASCII);

    private final SignatureService service = new SignatureService((user, pw) -> new String(pw).equals("secret-" + user));

    static List<String> kinds() {
        return TestDatabase.kinds();
    }

    private static SignatureRequest request(String session, String signer, String password, SignatureMeaning meaning,
            String author) {
        return new SignatureRequest(session, signer, password.toCharArray(), "Printed " + signer, meaning, "report",
                "rep-7", 3, CONTENT, author, null);
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void independentApprovalIsStoredWithNameTimeMeaningAndContentHash(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            SignatureRequest r = request("qa1", "qa1", "secret-qa1", SignatureMeaning.APPROVED, "analyst");
            Signature s = service.sign(c, r);
            c.commit();
            assertArrayEquals(new char[r.password().length], r.password(), "password cleared after use");
            assertEquals(SHA256_ABC, s.contentSha256(), "21 CFR 11.70: the exact signed content is bound by its hash");
            assertEquals(3, s.objectVersion());
            assertTrue(s.covers(CONTENT));
            assertFalse(s.covers("abd".getBytes(StandardCharsets.US_ASCII)), "a changed content is not covered");
            String shown = s.manifestation();
            // 21 CFR 11.50(a): printed name, date and time, meaning
            assertTrue(shown.startsWith("APPROVED by Printed qa1 (qa1) "), shown);
            assertTrue(shown.matches(".* \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2}:\\d{2} UTC"), shown);
            assertEquals(List.of(s), SignatureService.signaturesOf(c, "report", "rep-7"));
            assertTrue(AuditVerifier.verify(c).intact());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void wrongPasswordIsRefusedAndTheRefusalCommitted(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            SignatureRefusedException e = assertThrows(SignatureRefusedException.class,
                    () -> service.sign(c, request("qa1", "qa1", "guess", SignatureMeaning.REVIEWED, "analyst")));
            assertEquals(Reason.WRONG_CREDENTIALS, e.reason());
            try (Connection other = db.open()) {
                List<AuditRecord> seen = AuditReview.review(other, AuditQuery.all().build()).records();
                assertEquals(1, seen.size(), "the refusal is committed and visible to other sessions");
                AuditRecord refused = seen.get(0);
                assertEquals(AuditAction.REFUSED, refused.action());
                assertEquals(e.refusalRecord(), refused);
                assertTrue(refused.newValue().contains("refusal=WRONG_CREDENTIALS\n"), refused.newValue());
                assertFalse(refused.newValue().contains("guess"), "the typed password is never recorded");
                assertTrue(SignatureService.signaturesOf(other, "report", "rep-7").isEmpty());
            }
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void nobodyApprovesOwnWork(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            SignatureRefusedException e = assertThrows(SignatureRefusedException.class,
                    () -> service.sign(c, request("analyst", "analyst", "secret-analyst", SignatureMeaning.APPROVED, "analyst")));
            assertEquals(Reason.OWN_WORK, e.reason());
            // authorship may be signed by the author
            Signature own = service.sign(c, request("analyst", "analyst", "secret-analyst", SignatureMeaning.AUTHORED, "analyst"));
            c.commit();
            assertEquals(SignatureMeaning.AUTHORED, own.meaning());
            assertEquals(2, own.sequence(), "the refusal took sequence 1");
        }
    }

    @Test
    void signingForAnotherSessionIsRefused() throws Exception {
        try (TestDatabase db = TestDatabase.create("h2"); Connection c = db.openInstalled()) {
            SignatureRefusedException e = assertThrows(SignatureRefusedException.class,
                    () -> service.sign(c, request("qa2", "qa1", "secret-qa1", SignatureMeaning.APPROVED, "analyst")));
            assertEquals(Reason.NOT_SESSION_USER, e.reason());
            assertEquals("qa2", e.refusalRecord().userId(), "the refusal is recorded against the session user");
        }
    }

    @Test
    void refusalRollsBackUncommittedWorkOfTheTransaction() throws Exception {
        try (TestDatabase db = TestDatabase.create("h2"); Connection c = db.openInstalled()) {
            AuditTrail.append(c, AuditEntry.builder("qa1", AuditAction.DECISION, "report", "rep-7").version(3).build());
            assertThrows(SignatureRefusedException.class,
                    () -> service.sign(c, request("qa1", "qa1", "wrong", SignatureMeaning.APPROVED, "analyst")));
            List<AuditRecord> all = AuditReview.review(c, AuditQuery.all().build()).records();
            assertEquals(List.of(AuditAction.REFUSED), all.stream().map(AuditRecord::action).toList());
        }
    }

    @Test
    void requestNamesMissingFields() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new SignatureRequest("a", "a",
                "p".toCharArray(), "A", SignatureMeaning.REVIEWED, "report", "r", 1, CONTENT, null, null));
        assertTrue(e.getMessage().startsWith("authorId:"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new SignatureRequest("a", "a", null, "A",
                SignatureMeaning.AUTHORED, "report", "r", 1, CONTENT, null, null));
        assertTrue(e.getMessage().startsWith("password:"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new SignatureRequest("a", "a", new char[0], " ",
                SignatureMeaning.AUTHORED, "report", "r", 1, CONTENT, null, null));
        assertTrue(e.getMessage().startsWith("printedName:"), e.getMessage());
        assertNull(new SignatureRequest("a", "a", new char[0], "A", SignatureMeaning.AUTHORED, "report", "r", 1, CONTENT,
                null, null).authorId());
    }
}
