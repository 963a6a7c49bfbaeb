package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracegas.runner.commands.InventedBandSystem.header;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditQuery;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.runner.ExitCode;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * batch-split of a method whose path source is CTS-derived honours --qa-plan as quantify does, on an H2 workspace
 * and on the PostgreSQL lab server (system properties tracegas.test.pg.url, .user and .password; a fresh schema):
 * without the plan nothing is recorded, a method of nominal path refuses it, and with it the batch's runners
 * store, bit for bit, what quantify stores with the same plan: every result corrected to the path the CTS
 * readings measured. The CTS readings were made with 3 % more CTS gas in the cell than the plan states, which to
 * Beer-Lambert (absorbance proportional to concentration times path) is the absorbance of a path 3 % longer than
 * the nominal.
 */
class BatchCtsPathTest {

    private static final double LONGER = 1.03;
    private static final String CTS_METHOD = "Stack CTS path";

    @TempDir
    Path folder;

    /** Opens the campaign's workspace. */
    interface Opener {
        WorkspaceStore open() throws Exception;
    }

    @Test
    void batchSplitHonoursTheQaPlanOnTheEmbeddedWorkspace() throws Exception {
        Path ws = folder.resolve("ws");
        campaignOfTheCtsPath(List.of("--workspace", ws.toString()), () -> Workspaces.openH2(ws.resolve("db")));
    }

    @Test
    void batchSplitHonoursTheQaPlanOnTheLabServer() throws Exception {
        LabJcampQuantificationTest.onLabServer((schemaUrl, user, password) -> campaignOfTheCtsPath(
                List.of("--server", schemaUrl, "--user", user), () -> Workspaces.openPostgres(schemaUrl, user,
                        password)));
    }

    private void campaignOfTheCtsPath(List<String> workspace, Opener opener) throws Exception {
        BatchCampaign campaign = new BatchCampaign(folder, workspace, List.of("Q", "B", "N"), 2, 2);
        InventedBandSystem bands = new InventedBandSystem(folder);
        Random noise = new Random(41);
        Path qa = folder.resolve("qa-cts.tgc");
        try (ContainerWriter w = ContainerWriter.create(qa)) {
            w.append(header(SampleKind.BACKGROUND, BatchCampaign.T0.minusSeconds(3600), null),
                    bands.interferogram(Map.of(), noise));
            w.append(header(SampleKind.SAMPLE, BatchCampaign.T0.minusSeconds(3000), MeasurementRole.CTS),
                    bands.interferogram(Map.of("CO", LONGER * LabJcampQaTest.CTS_PPM), noise));
            w.append(header(SampleKind.SAMPLE, BatchCampaign.T0.plusSeconds(3000), MeasurementRole.CTS),
                    bands.interferogram(Map.of("CO", LONGER * LabJcampQaTest.CTS_PPM), noise));
            w.commit();
        }
        // the lab's plan: CO at 100 ppm, its band 2060..2195 cm-1 inside the invented CO band's region
        Path plan = Files.writeString(folder.resolve("qa-cts.plan"), LabJcampQaTest.PLAN);
        Path method = Files.writeString(folder.resolve("cts.method"), InventedBandSystem.methodFile(CTS_METHOD)
                .replace("path-length = 4.85\n", "path-length = 4.85\npath-source = cts-derived\n"));
        campaign.ok("method-define", "--as", "ana", "--method", method.toString());

        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(new ByteArrayOutputStream(), err, "batch-split",
                arguments(campaign, "B", CTS_METHOD, qa)), "the CTS path needs the QA plan");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--qa-plan"), err::toString);
        err.reset();
        assertEquals(ExitCode.USAGE, campaign.run(new ByteArrayOutputStream(), err, "batch-split",
                with(arguments(campaign, "N", BatchCampaign.METHOD, qa), "--qa-plan", plan.toString())),
                "a method of nominal path does not use the QA plan");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("nominal path"), err::toString);
        try (WorkspaceStore store = opener.open()) {
            Session root = store.users().logIn("root", BatchCampaign.PASSWORD.toCharArray());
            assertEquals(0, store.audit().review(root, AuditQuery.all().objectType("work-batch").build()).records()
                    .size(), "no batch recorded");
        }

        String quantified = campaign.ok("quantify", with(arguments(campaign, "Q", CTS_METHOD, qa), "--qa-plan",
                plan.toString()));
        assertTrue(quantified.contains("derived from the CTS readings"), quantified);
        String batchId = campaign.ok("batch-split", with(arguments(campaign, "B", CTS_METHOD, qa), "--qa-plan",
                plan.toString())).strip();
        assertTrue(campaign.ok("batch-work", "--as", "ana", "--batch", batchId, "--lease", "30", "--idle-poll",
                "0.2").contains("complete"));

        try (WorkspaceStore store = opener.open()) {
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            Map<String, Result> single = results(store, ana, "Q");
            Map<String, Result> batched = results(store, ana, "B");
            assertEquals(2 * 2 * 3, single.size(), "2 files of 2 samples, CO, N2O and H2O");
            assertEquals(single.keySet(), batched.keySet());
            double path = single.values().iterator().next().getConditions().pathM();
            // 3 % more CO is, to Beer-Lambert, a 3 % longer path; the band of the strong CO lines grows slower
            // than the amount (curve of growth, from memory), so the CTS band reads between 1.5 and 3 % more
            assertTrue(path > 1.015 * InventedBandSystem.PATH && path <= LONGER * InventedBandSystem.PATH,
                    "CTS path " + path);
            single.forEach((key, q) -> {
                Result b = batched.get(key);
                assertEquals("cts-derived", q.getConditions().pathOrigin(), key);
                assertEquals("cts-derived", b.getConditions().pathOrigin(), key);
                // the same CTS readings and plan give the same path, and the same chain the same numbers
                assertEquals(path, b.getConditions().pathM(), 0.0, key);
                assertEquals(q.getConditions().correctionFactor(), b.getConditions().correctionFactor(), 0.0, key);
                assertEquals(q.getConcentration(), b.getConcentration(), 0.0, key);
                assertEquals(q.getStandardUncertainty(), b.getStandardUncertainty(), 0.0, key);
                assertEquals(q.getProvenance().inputHash(), b.getProvenance().inputHash(), key);
            });
            assertTrue(store.verifyAuditTrail().intact());
        }
    }

    private static String[] arguments(BatchCampaign campaign, String project, String method, Path qa) {
        String[] a = campaign.quantification(project, campaign.stackFiles);
        for (int i = 0; i < a.length; i++) {
            if (a[i].equals("--method")) {
                a[i + 1] = method;
            }
        }
        return with(a, "--backgrounds", qa.toString());
    }

    private static String[] with(String[] a, String... more) {
        String[] all = java.util.Arrays.copyOf(a, a.length + more.length);
        System.arraycopy(more, 0, all, a.length, more.length);
        return all;
    }

    /** A project's results by measurement time and compound. */
    private static Map<String, Result> results(WorkspaceStore store, Session actor, String code) {
        String projectId = store.projects().findByCode(actor, code).orElseThrow().getId();
        Map<String, java.time.Instant> times = store.projects().measurements(actor, projectId).stream()
                .collect(Collectors.toMap(Measurement::getId, Measurement::getTime));
        Map<String, Result> byKey = new TreeMap<>();
        for (Result r : store.results().results(actor, projectId)) {
            byKey.put(times.get(r.getMeasurementId()) + " " + r.getCompound(), r);
        }
        return byKey;
    }
}
