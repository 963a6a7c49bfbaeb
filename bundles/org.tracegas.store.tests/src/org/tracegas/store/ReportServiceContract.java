package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;

import org.junit.jupiter.api.Test;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.model.Report;
import org.tracegas.model.Role;
import org.tracegas.model.WorkspaceFactory;

/**
 * The reports issued from a project, on each backend: a QA manager finds, years later, which reports were issued,
 * by whom, with which versions and content hash, and the signatures given on that content.
 */
abstract class ReportServiceContract extends AnalysisFixtureContract {

    /** The canonical content of the invented Tarnbeck line 2 report, as a reviewer signs it. */
    private static final byte[] CONTENT = "report TB-2026-07 content, first issue".getBytes(StandardCharsets.UTF_8);


    private Report report(String sha256) {
        Report r = WorkspaceFactory.eINSTANCE.createReport();
        r.setReportId("TB-2026-07");
        r.setTitle("Tarnbeck Waste Energy, Tarnbeck plant, line 2 stack, 2026-07-14");
        r.setContentSha256(sha256);
        r.setFileName("tarnbeck-line2-report.pdf");
        r.setMethodVersionId(f.method.getId());
        r.setLibraryVersionId(f.library.getId());
        return r;
    }

    /** SHA-256, lower-case hex, by the JDK's provider (FIPS 180-4), not the store's code. */
    private static String sha256(byte[] bytes) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    }

    @Test
    void anIssuedReportIsFoundWithItsIssuerVersionsAndTheSignaturesOnItsContent() throws Exception {
        String sha = sha256(CONTENT);
        Report given = report(sha);
        Report first = f.store.reports().record(f.analyst, f.project.getId(), given);
        given.setPageCount(7);
        // a reader writes the report out too, to review it: that is an issue of its own
        Report second = f.store.reports().record(f.reader, f.project.getId(), given);

        assertEquals(null, given.getId(), "the report given stays as it was: the store records a copy");
        assertNotNull(first.getId());
        assertEquals(f.analyst.userId(), first.getIssuedBy());
        assertNotNull(first.getIssued());
        List<Report> read = f.store.reports().reports(f.reader, f.project.getId());
        assertEquals(List.of(first.getId(), second.getId()), read.stream().map(Report::getId).toList(),
                "each issue is a record of its own, in the order issued");
        Report back = read.get(0);
        assertEquals(List.of("TB-2026-07", "Tarnbeck Waste Energy, Tarnbeck plant, line 2 stack, 2026-07-14", sha,
                "tarnbeck-line2-report.pdf", f.method.getId(), f.library.getId(), f.analyst.userId()),
                List.of(back.getReportId(), back.getTitle(), back.getContentSha256(), back.getFileName(),
                        back.getMethodVersionId(), back.getLibraryVersionId(), back.getIssuedBy()));
        assertEquals(first.getIssued(), back.getIssued());
        assertFalse(back.isSetPageCount(), "a page count not known stays unknown, not 0");
        assertEquals(7, read.get(1).getPageCount());
        assertEquals(f.reader.userId(), read.get(1).getIssuedBy());
        assertEquals(2, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'report-issue'"));
        assertTrue(f.store.audit().verifyWorkspace(List.of()).intact());

        // a reviewer's signature on the content is found by the stored report's id and content hash
        Session admin = f.store.users().logIn("admin", "admin-pw-12".toCharArray());
        f.store.users().changeRoles(admin, f.reader.userId(), 0, Set.of(Role.ANALYST, Role.REVIEWER));
        Session reviewer = f.store.users().logIn("rita", "rita-pw-1234".toCharArray());
        f.store.reviews().sign(reviewer, new ReportSignatureRequest(f.project.getId(), back.getReportId(), CONTENT,
                back.getIssuedBy(), "rita", "rita-pw-1234".toCharArray(), SignatureMeaning.REVIEWED, null));
        List<Signature> signatures = f.store.reviews().signatures(f.reader, f.project.getId(), back.getReportId());
        assertEquals(1, signatures.size());
        assertEquals(back.getContentSha256(), signatures.get(0).contentSha256());
    }

    @Test
    void aWrongReportIsRefusedNamingTheFieldAndNothingIsStored() throws Exception {
        String sha = sha256(CONTENT);
        Session admin = f.store.users().logIn("admin", "admin-pw-12".toCharArray());
        f.store.users().createUser(admin, "olaf", "Olaf Outside", Set.of(Role.ANALYST), "olaf-pw-1234".toCharArray());
        Session outsider = f.store.users().logIn("olaf", "olaf-pw-1234".toCharArray());
        long before = f.count("SELECT COUNT(*) FROM audit_record");
        refused("reportId", r -> r.setReportId(" "));
        refused("title", r -> r.setTitle(null));
        refused("fileName", r -> r.setFileName(""));
        refused("contentSha256", r -> r.setContentSha256(sha.toUpperCase(java.util.Locale.ROOT)));
        refused("contentSha256", r -> r.setContentSha256(sha.substring(1)));
        refused("pageCount", r -> r.setPageCount(0));
        refused("methodVersionId", r -> r.setMethodVersionId(f.library.getId()));
        refused("libraryVersionId", r -> r.setLibraryVersionId(f.method.getId()));
        refused("reportId", r -> r.setReportId("R".repeat(201)));
        assertThrows(NoSuchObjectException.class, () -> f.store.reports().record(f.analyst, f.project.getId(),
                withChange(r -> r.setMethodVersionId("no-such-version"))));
        assertThrows(AccessDeniedException.class,
                () -> f.store.reports().record(outsider, f.project.getId(), report(sha)),
                "without a grant on the project a user issues none of its reports");
        assertEquals(0, f.count("SELECT COUNT(*) FROM report"));
        assertEquals(before, f.count("SELECT COUNT(*) FROM audit_record"));
    }

    private Report withChange(Consumer<Report> change) throws Exception {
        Report r = report(sha256(CONTENT));
        change.accept(r);
        return r;
    }

    private void refused(String field, Consumer<Report> change) throws Exception {
        Report r = withChange(change);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> f.store.reports().record(f.analyst, f.project.getId(), r));
        assertTrue(e.getMessage().startsWith(field + " "), e.getMessage());
    }

    @Test
    void aReportIdIssuedOnOneProjectIsTakenForEveryOtherProjectButNotForItsOwn() throws Exception {
        f.store.reports().record(f.analyst, f.project.getId(), report(sha256(CONTENT)));
        String other = f.store.projects().createProject(f.analyst, f.project.getClient().getId(), "TB-2026-08",
                "Line 2 stack, August").getId();

        // issued only, not yet signed: the id still names that one report
        assertEquals(Optional.of(f.project.getCode()), f.store.reviews().otherProjectWithReport(other, "TB-2026-07"));
        assertEquals(Optional.empty(), f.store.reviews().otherProjectWithReport(f.project.getId(), "TB-2026-07"));
        assertEquals(Optional.empty(), f.store.reviews().otherProjectWithReport(other, "TB-2026-08"));
    }
}
