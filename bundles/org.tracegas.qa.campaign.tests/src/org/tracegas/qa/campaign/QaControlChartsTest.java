package org.tracegas.qa.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.Role;
import org.tracegas.model.User;
import org.tracegas.model.VersionKind;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.ZeroSpanCheck;
import org.tracegas.qa.control.ChartEvaluation;
import org.tracegas.report.Campaign;
import org.tracegas.report.ReportContent;
import org.tracegas.report.campaign.ReportSignatures;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * Control charts from the QA checks of earlier campaigns and report signatures, on a real H2 workspace file.
 */
class QaControlChartsTest {

    @TempDir
    Path folder;

    private static List<CheckOutcome> zeros(double... readings) {
        List<CheckOutcome> out = new ArrayList<>();
        for (double r : readings) {
            out.add(new ZeroSpanCheck(1.0, 5.0).zero("CO", r));
        }
        return out;
    }

    /** 12 zero readings rising steadily from -0.07 to +0.08 ppm, as a zero drifting over a day. */
    private static double[] drift() {
        double[] x = new double[12];
        for (int i = 0; i < x.length; i++) {
            x[i] = -0.07 + i * 0.15 / 11;
        }
        return x;
    }

    @Test
    void aStatedSigmaChartsAZeroAroundNoneAndNamesItsSource() {
        List<CheckOutcome> day = zeros(drift());
        // limits from the day's first 8 readings: mean -0.0223, s = 0.15/11 * sqrt(6) = 0.0334 ppm, so the last
        // reading, 0.08 ppm, lies beyond mean + 3 s = 0.0779 ppm (Shewhart action limit, rule 1 of the Western
        // Electric handbook, from memory)
        ChartEvaluation own = new QaControlCharts(List.of("Zero CO"), 8).evaluate(List.of(), day).get(0);
        assertFalse(own.outcome().passed(), own.outcome().rule().statement());

        String source = "performance sheet PS-1, repeatability at zero";
        QaControlCharts stated = new QaControlCharts(List.of("Zero CO"), 8, Map.of("Zero CO", 0.05), source);
        ChartEvaluation e = stated.evaluate(List.of(), day).get(0);
        // around 0 with sigma 0.05 ppm: every reading within the 2-sigma warning limits of +-0.10 ppm (rule 1 and 2
        // silent), 6 readings each side of 0 (rule 4 needs 8), and the upper CUSUM of k = 0.025 ppm sums to
        // 0.139 ppm, below h = 0.25 ppm (Montgomery's tabular CUSUM, from memory): all 12 judged, none signals
        assertTrue(e.outcome().passed(), e.outcome().rule().statement());
        assertEquals(12, e.values().length);
        assertEquals(0, e.baseline().length);
        assertEquals(0.0, e.chart().centre());
        assertEquals(0.15, e.chart().upperActionLimit(), 1e-12);
        assertTrue(e.outcome().rule().statement().contains("none of the 12 readings judged")
                && e.outcome().rule().statement().contains(source), e.outcome().rule().statement());
        assertTrue(e.outcome().rule().source().contains(source), e.outcome().rule().source());
        assertTrue(QaControlCharts.plot(e).title().contains("stated sigma"), QaControlCharts.plot(e).title());

        // the same sigma still flags a zero beyond 3 sigma: 0.16 ppm > 0.15 ppm (rule 1)
        double[] upset = drift();
        upset[5] = 0.16;
        assertFalse(stated.evaluate(List.of(), zeros(upset)).get(0).outcome().passed());
    }

    @Test
    void earlierCampaignsSetTheLimitsAndSignaturesFollowTheContent() throws Exception {
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("db"))) {
            Session admin = store.users().createFirstAdministrator("admin", "Administrator", "admin-pw-12".toCharArray());
            store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "ana-pw-1234".toCharArray());
            User rev = store.users().createUser(admin, "rev", "Dr. Rhea Viewer", Set.of(Role.REVIEWER),
                    "rev-pw-1234".toCharArray());
            Session analyst = store.users().logIn("ana", "ana-pw-1234".toCharArray());
            String client = store.projects().createClient(analyst, "Client").getId();
            ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "stack CO", "co=1\n", "v1");
            Project earlier = store.projects().createProject(analyst, client, "P-1", "first campaign");
            StoredQaChecks.store(store, analyst, earlier.getId(), method.getId(),
                    zeros(0.10, -0.05, 0.08, 0.02, -0.10, 0.04, 0.12, -0.02, 0.06, -0.07));
            Project other = store.projects().createProject(analyst, client, "P-0", "another method");
            ContentVersion otherMethod = store.versions().create(analyst, VersionKind.METHOD, "other", "x=1\n", "v1");
            StoredQaChecks.store(store, analyst, other.getId(), otherMethod.getId(), zeros(5, 5.5, 6, 7));
            Project now = store.projects().createProject(analyst, client, "P-2", "this campaign");
            StoredQaChecks.store(store, analyst, now.getId(), method.getId(), zeros(0.05, 0.9, 0.0));
            // a campaign stored after this one is not part of its history
            Project later = store.projects().createProject(analyst, client, "P-3", "later campaign");
            StoredQaChecks.store(store, analyst, later.getId(), method.getId(), zeros(3, 3, 3, 3, 3, 3, 3, 3, 3, 4));

            List<CheckOutcome> history = StoredQaChecks.history(store, analyst, now.getId(), "stack CO");
            assertEquals(10, history.size());
            List<CheckOutcome> current = StoredQaChecks.load(store, analyst, now.getId(), method.getId());
            List<ChartEvaluation> charts = new QaControlCharts(List.of("Zero CO", "Zero NO"), 8).evaluate(history,
                    current);
            assertEquals(1, charts.size(), "no NO readings: no chart");
            ChartEvaluation e = charts.get(0);
            assertTrue(e.baselineFromHistory());
            // 0.9 ppm lies far beyond mean + 3 s of the latest 8 earlier readings (s about 0.07 ppm)
            assertFalse(e.outcome().passed());
            assertEquals(2, QaControlCharts.plot(e).series().size(), "readings and the signalling one");

            Campaign campaign = new Campaign("R-7", "Client", "Plant", "Stack", LocalDate.of(2026, 3, 17),
                    LocalDate.of(2026, 3, 17), Instant.parse("2026-03-19T00:00:00Z"), "mg/m³ dry");
            ReportContent first = ReportContent.builder(campaign).controlChart(QaControlCharts.plot(e)).build();
            store.projects().grant(analyst, now.getId(), rev.getId(), AccessLevel.READ);
            Session reviewer = store.users().logIn("rev", "rev-pw-1234".toCharArray());
            ReportSignatures.sign(store, reviewer, now.getId(), first, analyst.userId(), "rev",
                    "rev-pw-1234".toCharArray(), SignatureMeaning.REVIEWED, null);

            ReportContent again = ReportSignatures.attach(store, analyst, now.getId(),
                    ReportContent.builder(campaign).controlChart(QaControlCharts.plot(e)).build(),
                    store.audit().verifyWorkspace(List.of()).requireIntact("attach the signatures"));
            assertEquals(first.contentHash(), again.signatures().get(0).contentSha256(), "applies");
            assertTrue(again.auditAnchor().orElseThrow().sequence() > 0);
            ReportContent changed = ReportSignatures.attach(store, analyst, now.getId(),
                    ReportContent.builder(campaign).caution("a changed report").build(),
                    store.audit().verifyWorkspace(List.of()).requireIntact("attach the signatures"));
            assertEquals(1, changed.signatures().size());
            assertFalse(changed.signatures().get(0).contentSha256().equals(changed.contentHash()),
                    "signed an earlier version");
        }
    }
}
