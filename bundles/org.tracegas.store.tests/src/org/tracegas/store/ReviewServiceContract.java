package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Client;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.model.Role;
import org.tracegas.model.User;
import org.tracegas.model.VersionKind;

/** Signing reports by their content, on each backend. */
abstract class ReviewServiceContract {

    private static final byte[] CONTENT = "report R-1 content, first issue".getBytes(StandardCharsets.UTF_8);

    private TestBackend backend;
    private WorkspaceStore store;
    private Session analyst;
    private Session reviewer;
    private Project project;

    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void setUp() throws Exception {
        backend = newBackend();
        store = backend.open();
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", "admin-pw-12".toCharArray());
        store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "ana-pw-1234".toCharArray());
        User rev = store.users().createUser(admin, "rev", "Dr. Rhea Viewer", Set.of(Role.REVIEWER),
                "rev-pw-1234".toCharArray());
        analyst = store.users().logIn("ana", "ana-pw-1234".toCharArray());
        reviewer = store.users().logIn("rev", "rev-pw-1234".toCharArray());
        project = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "R-1",
                "Report project");
        store.projects().grant(analyst, project.getId(), rev.getId(), AccessLevel.READ);
    }

    @AfterEach
    void tearDown() throws Exception {
        try (TestBackend b = backend) {
            store.close();
        }
    }

    private ReportSignatureRequest request(String login, String password, SignatureMeaning meaning, byte[] content) {
        return new ReportSignatureRequest(project.getId(), "R-1", content, analyst.userId(), login,
                password.toCharArray(), meaning, null);
    }

    @Test
    void aReviewerSignsTheContentHashAndTheSignatureIsFoundAgain() throws Exception {
        char[] password = "rev-pw-1234".toCharArray();
        Signature s = store.reviews().sign(reviewer, new ReportSignatureRequest(project.getId(), "R-1", CONTENT,
                analyst.userId(), "rev", password, SignatureMeaning.REVIEWED, "checked against the raw data"));
        // the stored hash is the SHA-256 of the signed bytes (FIPS 180-4 via the platform's MessageDigest)
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(CONTENT));
        assertEquals(sha, s.contentSha256());
        assertEquals("Dr. Rhea Viewer", s.printedName());
        assertArrayEquals(new char[password.length], password, "password cleared");
        store.reviews().sign(reviewer, request("rev", "rev-pw-1234", SignatureMeaning.APPROVED,
                "report R-1 content, second issue".getBytes(StandardCharsets.UTF_8)));

        List<Signature> found = store.reviews().signatures(analyst, project.getId(), "R-1");
        assertEquals(2, found.size());
        assertTrue(found.get(0).covers(CONTENT));
        assertTrue(!found.get(1).covers(CONTENT), "the approval was given on other content");
        assertEquals(List.of(), store.reviews().signatures(analyst, project.getId(), "R-2"));
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void selfApprovalIsRefusedAndRecorded() throws Exception {
        SignatureRefusedException e = assertThrows(SignatureRefusedException.class,
                () -> store.reviews().sign(analyst, request("ana", "ana-pw-1234", SignatureMeaning.APPROVED, CONTENT)));
        assertEquals(SignatureRefusedException.Reason.OWN_WORK, e.reason());
        assertEquals(List.of(), store.reviews().signatures(analyst, project.getId(), "R-1"));
        try (Connection c = backend.raw(); Statement st = c.createStatement(); ResultSet rs = st.executeQuery(
                "SELECT COUNT(*) FROM audit_record WHERE action = 'REFUSED' AND object_type = 'report'")) {
            rs.next();
            assertEquals(1, rs.getLong(1));
        }
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void aWrongPasswordIsRefusedAndAnotherUsersLoginToo() {
        SignatureRefusedException wrong = assertThrows(SignatureRefusedException.class,
                () -> store.reviews().sign(reviewer, request("rev", "not-the-password", SignatureMeaning.REVIEWED,
                        CONTENT)));
        assertEquals(SignatureRefusedException.Reason.WRONG_CREDENTIALS, wrong.reason());
        SignatureRefusedException other = assertThrows(SignatureRefusedException.class,
                () -> store.reviews().sign(reviewer, request("ana", "ana-pw-1234", SignatureMeaning.REVIEWED,
                        CONTENT)));
        assertEquals(SignatureRefusedException.Reason.NOT_SESSION_USER, other.reason());
    }

    @Test
    void aUserWithoutAccessToTheProjectCannotSignOrRead() throws Exception {
        Session admin = store.users().logIn("admin", "admin-pw-12".toCharArray());
        store.users().createUser(admin, "out", "Outsider", Set.of(Role.REVIEWER), "out-pw-1234".toCharArray());
        Session outsider = store.users().logIn("out", "out-pw-1234".toCharArray());
        assertThrows(AccessDeniedException.class, () -> store.reviews().sign(outsider,
                request("out", "out-pw-1234", SignatureMeaning.REVIEWED, CONTENT)));
        assertThrows(AccessDeniedException.class, () -> store.reviews().signatures(outsider, project.getId(), "R-1"));
    }

    /** A result the analyst recorded in the project. */
    private Result recordResult() {
        ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "CO in flue gas", "analyte=CO\n",
                "first");
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, "Kiln gases", "sha=abc\n",
                "first");
        return store.results().record(analyst, project.getId(), Results.of(null, "CO", 12.5, 0.8, 0.3, "ppm",
                Set.of(ResultFlag.HIGH_RESIDUAL),
                new Provenance(method.getId(), library.getId(), "0.1.0", "ab".repeat(32)), null));
    }

    private long count(String sql, String arg) throws Exception {
        try (Connection c = backend.raw(); PreparedStatement ps = c.prepareStatement(sql)) {
            ps.setString(1, arg);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        }
    }

    @Test
    void aReviewerSignsAStoredResultOverItsValuesAndWhatMadeThem() throws Exception {
        Result result = recordResult();
        char[] password = "rev-pw-1234".toCharArray();
        Signature s = store.reviews().signResult(reviewer, new ResultSignatureRequest(result.getId(), "rev", password,
                SignatureMeaning.REVIEWED, "fit residual checked"));
        assertArrayEquals(new char[password.length], password, "password cleared");
        // the signed text as ReviewService.signResult documents it, written out here
        String expected = "result=" + result.getId() + "\ncompound=CO\nconcentration=12.5\nuncertainty=0.8\n"
                + "detection_limit=0.3\nunit=ppm\nmethod_version=" + result.getProvenance().methodVersionId()
                + "\nlibrary_version=" + result.getProvenance().libraryVersionId() + "\ninput_sha256=" + "ab".repeat(32)
                + "\nrecorded_by=" + analyst.userId() + "\nrecorded=" + result.getRecorded() + "\n";
        byte[] content = expected.getBytes(StandardCharsets.UTF_8);
        // SHA-256 per FIPS 180-4 via the platform's MessageDigest
        assertEquals(HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(content)), s.contentSha256());
        assertEquals("Dr. Rhea Viewer", s.printedName());

        List<Signature> found = store.reviews().resultSignatures(analyst, result.getId());
        assertEquals(1, found.size());
        assertTrue(found.get(0).covers(content));
        assertEquals(SignatureMeaning.REVIEWED, found.get(0).meaning());
        assertEquals(List.of(), store.reviews().signatures(analyst, project.getId(), result.getId()),
                "a result's signature is not a report's");
        assertEquals(1, count("SELECT COUNT(*) FROM audit_record WHERE action = 'SIGNATURE' AND object_type = 'result'"
                + " AND object_id = ?", result.getId()));
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void approvingOnesOwnResultIsRefusedAndRecorded() throws Exception {
        Result result = recordResult();
        SignatureRefusedException e = assertThrows(SignatureRefusedException.class, () -> store.reviews().signResult(
                analyst, new ResultSignatureRequest(result.getId(), "ana", "ana-pw-1234".toCharArray(),
                        SignatureMeaning.APPROVED, null)));
        assertEquals(SignatureRefusedException.Reason.OWN_WORK, e.reason());
        assertEquals(List.of(), store.reviews().resultSignatures(reviewer, result.getId()));
        assertEquals(1, count("SELECT COUNT(*) FROM audit_record WHERE action = 'REFUSED' AND object_type = 'result'"
                + " AND object_id = ?", result.getId()));
        SignatureRefusedException wrong = assertThrows(SignatureRefusedException.class, () -> store.reviews()
                .signResult(reviewer, new ResultSignatureRequest(result.getId(), "rev", "not-the-password".toCharArray(),
                        SignatureMeaning.APPROVED, null)));
        assertEquals(SignatureRefusedException.Reason.WRONG_CREDENTIALS, wrong.reason());
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void aResultOutsideTheSignersProjectsOrNotStoredCannotBeSignedOrRead() throws Exception {
        Result result = recordResult();
        Session admin = store.users().logIn("admin", "admin-pw-12".toCharArray());
        store.users().createUser(admin, "out", "Outsider", Set.of(Role.REVIEWER), "out-pw-1234".toCharArray());
        Session outsider = store.users().logIn("out", "out-pw-1234".toCharArray());
        char[] password = "out-pw-1234".toCharArray();
        assertThrows(AccessDeniedException.class, () -> store.reviews().signResult(outsider,
                new ResultSignatureRequest(result.getId(), "out", password, SignatureMeaning.REVIEWED, null)));
        assertArrayEquals(new char[password.length], password, "password cleared on a refused access too");
        assertThrows(AccessDeniedException.class, () -> store.reviews().resultSignatures(outsider, result.getId()));
        assertEquals(0, count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'result' AND object_id = ?"
                + " AND action IN ('SIGNATURE', 'REFUSED')", result.getId()));
        NoSuchObjectException missing = assertThrows(NoSuchObjectException.class, () -> store.reviews().signResult(
                reviewer, new ResultSignatureRequest("no-such-result", "rev", "rev-pw-1234".toCharArray(),
                        SignatureMeaning.REVIEWED, null)));
        assertTrue(missing.getMessage().contains("no-such-result"), missing.getMessage());
        assertThrows(NoSuchObjectException.class, () -> store.reviews().resultSignatures(reviewer, "no-such-result"));
        assertThrows(IllegalArgumentException.class,
                () -> new ResultSignatureRequest(" ", "rev", new char[0], SignatureMeaning.REVIEWED, null));
    }
}
