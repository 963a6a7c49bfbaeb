package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.AuditReview;
import org.tracegas.model.Client;
import org.tracegas.model.Project;
import org.tracegas.model.Role;
import org.tracegas.store.internal.JdbcWorkspaceStore;

/** Reading and exporting the audit trail through the store, on each backend. */
abstract class AuditServiceContract {

    private TestBackend backend;
    private WorkspaceStore store;
    private Session admin;
    private Session analyst;
    private Session reviewer;
    private Session qualityManager;
    private Project project;

    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void setUp() throws Exception {
        backend = newBackend();
        store = backend.open();
        admin = store.users().createFirstAdministrator("admin", "Administrator", "admin-pw-12".toCharArray());
        store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "ana-pw-1234".toCharArray());
        store.users().createUser(admin, "rev", "Rhea Viewer", Set.of(Role.REVIEWER), "rev-pw-1234".toCharArray());
        store.users().createUser(admin, "qm", "Quinn Manager", Set.of(Role.QUALITY_MANAGER),
                "qm-pw-12345".toCharArray());
        analyst = store.users().logIn("ana", "ana-pw-1234".toCharArray());
        reviewer = store.users().logIn("rev", "rev-pw-1234".toCharArray());
        qualityManager = store.users().logIn("qm", "qm-pw-12345".toCharArray());
        project = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "A-1",
                "Audit project");
    }

    @AfterEach
    void tearDown() throws Exception {
        try (TestBackend b = backend) {
            store.close();
        }
    }

    @Test
    void reviewersQualityManagersAndAdministratorsReadTheTrailWithTheChainOfTheSameMoment() throws Exception {
        long stored = count("SELECT COUNT(*) FROM audit_record", List.of());
        long head = count("SELECT MAX(seq) FROM audit_record", List.of());
        for (Session reader : List.of(reviewer, qualityManager, admin)) {
            AuditReview.Result all = store.audit().review(reader, AuditQuery.all().build());
            // each read adds nothing to the trail: the count stays that of the setup's changes
            assertEquals(stored, all.records().size(), reader.login());
            assertTrue(all.chain().intact(), all.chain().findings().toString());
            assertEquals(stored, all.chain().recordsChecked(), "records verified in the same snapshot");
            assertEquals(head, all.chain().headSequence());
            assertEquals(head, all.records().get(all.records().size() - 1).sequence(), "sequence order");
        }
        assertEquals(store.audit().verify(), store.verifyAuditTrail());
    }

    @Test
    void theSoftwareOfAnInstallationIsRecordedOnceEachTimeItChanges() {
        String folder = "/opt/tracegas";
        String before = "Tracegas Workbench 0.1.0.1";
        String after = before + " with org.example.lab.reader.feature 1.0.0.2";
        assertTrue(store.audit().recordSoftware(analyst, folder, before, "first opening"));
        assertEquals(false, store.audit().recordSoftware(analyst, folder, before, "opened again"), "unchanged");
        assertTrue(store.audit().recordSoftware(analyst, folder, after, "2026-12-01T08:00:00Z lab install"));
        assertTrue(store.audit().recordSoftware(analyst, "/srv/other", before, "another installation"));

        List<AuditRecord> records = store.audit().review(reviewer,
                AuditQuery.all().object(AuditService.SOFTWARE_OBJECT, folder).build()).records();
        assertEquals(2, records.size());
        assertEquals(AuditAction.CREATE, records.get(0).action());
        AuditRecord change = records.get(1);
        assertEquals(AuditAction.CHANGE, change.action());
        // prior values are kept beside the new ones (21 CFR 11.10(e), from memory)
        assertEquals(before, change.oldValue());
        assertEquals(after, change.newValue());
        assertEquals("2026-12-01T08:00:00Z lab install", change.reason());
        assertEquals(analyst.userId(), change.userId());
        assertThrows(IllegalArgumentException.class, () -> store.audit().recordSoftware(analyst, folder, " ", "x"));
    }

    @Test
    void anExportOfResultsIsRecordedWithItsFileAndHashByThoseWhoMayReadTheProject() {
        String sha = "ab".repeat(32);
        store.audit().recordExport(analyst, project.getId(), "a-1-results.csv", 12, sha);
        List<AuditRecord> records = store.audit().review(reviewer,
                AuditQuery.all().object(AuditService.EXPORT_OBJECT, project.getId()).build()).records();
        assertEquals(1, records.size());
        AuditRecord export = records.get(0);
        assertEquals(AuditAction.EXPORT, export.action());
        assertEquals(analyst.userId(), export.userId());
        assertTrue(export.newValue().contains("a-1-results.csv") && export.newValue().contains(sha)
                && export.newValue().contains("12"), export.newValue());
        assertTrue(store.audit().verify().intact());
        // the reviewer holds no grant on the project, so may not have read its results to export them
        assertThrows(AccessDeniedException.class,
                () -> store.audit().recordExport(reviewer, project.getId(), "a-1-results.csv", 12, sha));
        assertThrows(IllegalArgumentException.class,
                () -> store.audit().recordExport(analyst, project.getId(), "a-1-results.csv", 12, "not a hash"));
        assertThrows(IllegalArgumentException.class,
                () -> store.audit().recordExport(analyst, project.getId(), "a-1-results.csv", -1, sha));
    }

    @Test
    void theFilterNarrowsToTheAnalystsRecordsOfOneAction() throws Exception {
        AuditReview.Result mine = store.audit().review(reviewer,
                AuditQuery.all().user(analyst.userId()).actions(AuditAction.CREATE).build());
        long expected = count("SELECT COUNT(*) FROM audit_record WHERE user_id = ? AND action = 'CREATE'",
                List.of(analyst.userId()));
        assertTrue(expected >= 2, "the client and the project were created by the analyst");
        assertEquals(expected, mine.records().size());
        for (AuditRecord r : mine.records()) {
            assertEquals(analyst.userId(), r.userId());
            assertEquals(AuditAction.CREATE, r.action());
        }
    }

    @Test
    void anAnalystMayNeitherReadNorExportTheTrail() {
        AccessDeniedException read = assertThrows(AccessDeniedException.class,
                () -> store.audit().review(analyst, AuditQuery.all().build()));
        assertTrue(read.getMessage().contains("'ana'") && read.getMessage().contains("read the audit trail"),
                read.getMessage());
        StringWriter out = new StringWriter();
        assertThrows(AccessDeniedException.class, () -> store.audit().exportCsv(analyst, AuditQuery.all().build(), out));
        assertEquals("", out.toString(), "nothing is written before the role is checked");
        assertThrows(IllegalArgumentException.class, () -> store.audit().review(null, AuditQuery.all().build()));
        assertThrows(IllegalArgumentException.class, () -> store.audit().review(reviewer, null));
    }

    @Test
    void aLockedReviewerIsRefused() {
        for (int i = 0; i < JdbcWorkspaceStore.DEFAULT_MAX_FAILED_LOGINS; i++) {
            assertThrows(LoginFailedException.class, () -> store.users().logIn("rev", "wrong-pw-000".toCharArray()));
        }
        assertThrows(AccessDeniedException.class, () -> store.audit().review(reviewer, AuditQuery.all().build()));
    }

    @Test
    void theExportWritesTheFilteredRecordsAsCsvInSequenceOrder() throws Exception {
        AuditQuery query = AuditQuery.all().object("project", project.getId()).build();
        StringWriter out = new StringWriter();
        long written = store.audit().exportCsv(qualityManager, query, out);
        long expected = count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'project' AND object_id = ?",
                List.of(project.getId()));
        assertTrue(expected >= 1, "creating the project is recorded");
        assertEquals(expected, written);
        // RFC 4180 section 2: records end in CRLF, the first line is the header
        String[] lines = out.toString().split("\r\n");
        assertEquals(written + 1, lines.length);
        assertEquals(String.join(",", AuditReview.CSV_HEADER), lines[0]);
        List<Long> sequences = new ArrayList<>();
        for (int i = 1; i < lines.length; i++) {
            sequences.add(Long.parseLong(lines[i].substring(0, lines[i].indexOf(','))));
        }
        assertEquals(sequences.stream().sorted().toList(), sequences, "sequence order");
        assertEquals(store.audit().review(qualityManager, query).records().stream().map(AuditRecord::sequence)
                .toList(), sequences, "the export holds the records the review shows");
    }

    @Test
    void aFailingWriterIsReportedAsTheWritersFailure() {
        Writer broken = new Writer() {
            @Override
            public void write(char[] buf, int off, int len) throws IOException {
                throw new IOException("disk full");
            }

            @Override
            public void flush() {
            }

            @Override
            public void close() {
            }
        };
        IOException e = assertThrows(IOException.class,
                () -> store.audit().exportCsv(admin, AuditQuery.all().build(), broken));
        assertEquals("disk full", e.getMessage());
    }

    private long count(String sql, List<Object> args) throws Exception {
        try (Connection c = backend.raw(); PreparedStatement ps = c.prepareStatement(sql)) {
            for (int i = 0; i < args.size(); i++) {
                ps.setObject(i + 1, args.get(i));
            }
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        }
    }
}
