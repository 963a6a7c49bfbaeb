package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.sql.Connection;
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
import org.tracegas.model.Role;

/** Signing reports by their content, on each backend. */
abstract class ReviewServiceContract {

    private static final byte[] CONTENT = "report R-1 content, first issue".getBytes(StandardCharsets.UTF_8);

    private TestBackend backend;
    private WorkspaceStore store;
    private Session analyst;
    private Session reviewer;
    private ProjectInfo project;

    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void setUp() throws Exception {
        backend = newBackend();
        store = backend.open();
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", "admin-pw-12".toCharArray());
        store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "ana-pw-1234".toCharArray());
        UserInfo rev = store.users().createUser(admin, "rev", "Dr. Rhea Viewer", Set.of(Role.REVIEWER),
                "rev-pw-1234".toCharArray());
        analyst = store.users().logIn("ana", "ana-pw-1234".toCharArray());
        reviewer = store.users().logIn("rev", "rev-pw-1234".toCharArray());
        project = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client"), "R-1",
                "Report project");
        store.projects().grant(analyst, project.id(), rev.id(), AccessLevel.READ);
    }

    @AfterEach
    void tearDown() throws Exception {
        try (TestBackend b = backend) {
            store.close();
        }
    }

    private ReportSignatureRequest request(String login, String password, SignatureMeaning meaning, byte[] content) {
        return new ReportSignatureRequest(project.id(), "R-1", content, analyst.userId(), login,
                password.toCharArray(), meaning, null);
    }

    @Test
    void aReviewerSignsTheContentHashAndTheSignatureIsFoundAgain() throws Exception {
        char[] password = "rev-pw-1234".toCharArray();
        Signature s = store.reviews().sign(reviewer, new ReportSignatureRequest(project.id(), "R-1", CONTENT,
                analyst.userId(), "rev", password, SignatureMeaning.REVIEWED, "checked against the raw data"));
        // the stored hash is the SHA-256 of the signed bytes (FIPS 180-4 via the platform's MessageDigest)
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(CONTENT));
        assertEquals(sha, s.contentSha256());
        assertEquals("Dr. Rhea Viewer", s.printedName());
        assertArrayEquals(new char[password.length], password, "password cleared");
        store.reviews().sign(reviewer, request("rev", "rev-pw-1234", SignatureMeaning.APPROVED,
                "report R-1 content, second issue".getBytes(StandardCharsets.UTF_8)));

        List<Signature> found = store.reviews().signatures(analyst, project.id(), "R-1");
        assertEquals(2, found.size());
        assertTrue(found.get(0).covers(CONTENT));
        assertTrue(!found.get(1).covers(CONTENT), "the approval was given on other content");
        assertEquals(List.of(), store.reviews().signatures(analyst, project.id(), "R-2"));
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void selfApprovalIsRefusedAndRecorded() throws Exception {
        SignatureRefusedException e = assertThrows(SignatureRefusedException.class,
                () -> store.reviews().sign(analyst, request("ana", "ana-pw-1234", SignatureMeaning.APPROVED, CONTENT)));
        assertEquals(SignatureRefusedException.Reason.OWN_WORK, e.reason());
        assertEquals(List.of(), store.reviews().signatures(analyst, project.id(), "R-1"));
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
        assertThrows(AccessDeniedException.class, () -> store.reviews().signatures(outsider, project.id(), "R-1"));
    }
}
