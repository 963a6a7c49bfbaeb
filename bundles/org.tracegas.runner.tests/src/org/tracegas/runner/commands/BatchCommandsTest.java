package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.Collectors;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditQuery;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.ExitCode;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.WorkspaceVerification;
import org.tracegas.store.Workspaces;

/**
 * batch-split, batch-work and batch-status on a real H2 workspace: a batch worked by one runner stores what
 * quantify stores for the same files, bad input to batch-split records no batch, and an unfinished batch of a
 * project and method version refuses a second split and quantify, a file that cannot be processed fails its
 * unit without stopping the batch, and the analyzer named at the split is the one every stored measurement names.
 */
class BatchCommandsTest {

    private static final int FILES = 3;
    private static final int SAMPLES_PER_FILE = 2;
    /** CO, N2O and H2O: the analytes of the method. */
    private static final int COMPOUNDS = 3;

    @TempDir
    static Path folder;
    private static BatchCampaign campaign;
    private static Path ws;

    @BeforeAll
    static void workspaceAndFiles() throws Exception {
        ws = folder.resolve("ws");
        campaign = new BatchCampaign(folder, List.of("--workspace", ws.toString()), List.of("Q", "B", "X", "S", "D", "F", "I"), FILES,
                SAMPLES_PER_FILE);
    }

    @Test
    void batchWorkedByOneRunnerStoresWhatQuantifyStores() throws Exception {
        campaign.ok("quantify", campaign.quantification("Q", campaign.stackFiles));
        String batchId = campaign.ok("batch-split", campaign.quantification("B", campaign.stackFiles)).strip();

        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertEquals(ExitCode.CHECK_FAILED, campaign.run(out, new ByteArrayOutputStream(), "batch-status", "--as",
                "ana", "--batch", batchId), "nothing done yet");
        assertTrue(out.toString(StandardCharsets.UTF_8).contains(FILES + " units, " + FILES + " open, 0 claimed, "
                + "0 done"), out::toString);
        String worked = campaign.ok("batch-work", "--as", "ana", "--batch", batchId, "--lease", "30", "--idle-poll",
                "0.2");
        assertTrue(worked.contains("complete: " + FILES + " units") && worked.contains("completed " + FILES),
                worked);
        String status = campaign.ok("batch-status", "--as", "ana", "--batch", batchId);
        assertTrue(status.contains(FILES + " done, 0 failed: complete"), status);
        try (WorkspaceStore store = Workspaces.openH2(ws.resolve("db"))) {
            // who started the batch and the version its results name, as a reviewer traces them
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            String projectId = store.projects().findByCode(ana, "B").orElseThrow().getId();
            String version = store.results().results(ana, projectId).get(0).getProvenance().methodVersionId();
            Instant created = store.workUnits().batch(ana, batchId).getCreatedAt();
            assertTrue(status.contains("created " + created + " by user " + ana.userId() + ", method version "
                    + version), status);
            // split without --instrument: the measurements name no instrument, as the files name none
            for (Measurement m : store.projects().measurements(ana, projectId)) {
                assertNull(m.getInstrument(), m.getKind() + " at " + m.getTime());
            }
        }
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(new ByteArrayOutputStream(), err, "batch-split",
                campaign.quantification("B", campaign.stackFiles)), "a second batch would repeat the results");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("holds results of method version"), err::toString);

        try (WorkspaceStore store = Workspaces.openH2(ws.resolve("db"))) {
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            Map<String, Result> quantified = resultsByTimeAndCompound(store, ana, "Q");
            Map<String, Result> batched = resultsByTimeAndCompound(store, ana, "B");
            assertEquals(FILES * SAMPLES_PER_FILE * COMPOUNDS, quantified.size());
            assertEquals(quantified.keySet(), batched.keySet());
            // the same chain and fit on the same input: the same numbers, bit for bit, and the same input hashes
            quantified.forEach((key, q) -> {
                Result b = batched.get(key);
                assertEquals(q.getConcentration(), b.getConcentration(), 0.0, key);
                assertEquals(q.getStandardUncertainty(), b.getStandardUncertainty(), 0.0, key);
                assertEquals(q.getFlags(), b.getFlags(), key);
                assertEquals(q.getProvenance().inputHash(), b.getProvenance().inputHash(), key);
                assertEquals(q.getProvenance().methodVersionId(), b.getProvenance().methodVersionId(), key);
                assertEquals(q.getProvenance().libraryVersionId(), b.getProvenance().libraryVersionId(), key);
            });
            for (int unit = 0; unit < FILES; unit++) {
                List<Instant> times = store.workUnits().measurementsOf(ana, batchId, unit).stream()
                        .map(id -> measurementTime(store, ana, "B", id)).toList();
                final int f = unit;
                assertEquals(List.of(campaign.time(f, 0), campaign.time(f, 1)), times, "unit " + unit + " holds "
                        + "the samples of " + campaign.stackFiles.get(unit));
            }
            assertTrue(store.verifyAuditTrail().intact());
        }
    }

    /**
     * The analyzer named at the split is recorded once every input is checked, with the figures the containers
     * were written with, and every measurement the batch's runner stores names it; a name without its serial
     * number, or files of two set-ups, record neither batch nor instrument.
     */
    @Test
    void batchSplitWithTheInstrumentStoresEveryMeasurementNamingIt() throws Exception {
        String name = "Bench FTIR 3";
        String serial = "QM-0311";
        long before = batchesRecorded();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.USAGE, campaign.run(new ByteArrayOutputStream(), err, "batch-split",
                campaign.quantification("I", campaign.stackFiles, "--instrument", name)),
                "a name without its serial number");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--instrument-serial"), err::toString);

        // the records of the first stack file as a cell of twice the path would give them: another set-up
        Path longCell = folder.resolve("long-cell.tgc");
        try (ContainerReader in = ContainerReader.open(campaign.stackFiles.get(0));
                ContainerWriter out = ContainerWriter.create(longCell)) {
            for (ContainerRecord r = in.readNext(); r != null; r = in.readNext()) {
                AcquisitionHeader h = r.header();
                out.append(new AcquisitionHeader(h.zpdIndex(), h.kind(), h.time(), h.cellTemperatureK(),
                        h.cellPressureHpa(), 2 * h.pathLengthM(), h.extra()), r.interferogram());
            }
            out.commit();
        }
        err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(new ByteArrayOutputStream(), err, "batch-split",
                campaign.quantification("I", List.of(campaign.stackFiles.get(1), longCell), "--instrument", name,
                        "--instrument-serial", serial)), err::toString);
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains(longCell.toString()) && message.contains("path.length.m"), message);
        assertEquals(before, batchesRecorded(), "no batch recorded");
        try (WorkspaceStore store = Workspaces.openH2(ws.resolve("db"))) {
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            assertEquals(Optional.empty(), store.instruments().find(ana, name, serial), "no instrument recorded");
        }

        String batchId = campaign.ok("batch-split", campaign.quantification("I", campaign.stackFiles,
                "--instrument", name, "--instrument-serial", serial)).strip();
        campaign.ok("batch-work", "--as", "ana", "--batch", batchId, "--lease", "30", "--idle-poll", "0.2");
        try (WorkspaceStore store = Workspaces.openH2(ws.resolve("db"))) {
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            Instrument bench = store.instruments().find(ana, name, serial).orElseThrow();
            BatchCampaign.assertWrittenFigures(bench);
            String projectId = store.projects().findByCode(ana, "I").orElseThrow().getId();
            List<Measurement> measured = store.projects().measurements(ana, projectId);
            assertEquals(FILES * SAMPLES_PER_FILE, measured.size());
            for (Measurement m : measured) {
                assertEquals(bench.getId(), m.getInstrument() == null ? null : m.getInstrument().getId(),
                        m.getKind() + " at " + m.getTime());
            }
            // the chain and every row it vouches for, the measurements' links to the instrument among them
            WorkspaceVerification verified = store.audit().verifyWorkspace(List.of());
            assertTrue(verified.intact(), verified.statement());
        }
    }

    @Test
    void badInputToBatchSplitRecordsNoBatch() throws Exception {
        Path truncated = folder.resolve("truncated.tgc");
        byte[] whole = Files.readAllBytes(campaign.stackFiles.get(0));
        Files.write(truncated, java.util.Arrays.copyOf(whole, whole.length / 2));
        long before = batchesRecorded();
        Path sample = campaign.stackFiles.get(0);
        expectBadInput(List.of("--file", folder.resolve("missing.tgc").toString()), "missing.tgc");
        expectBadInput(List.of("--file", sample.toString(), "--file", sample.toString()), "given twice");
        expectBadInput(List.of("--file", truncated.toString()), "truncated.tgc");
        expectBadInput(List.of("--file", campaign.backgrounds.toString()), "a background among the samples");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(new ByteArrayOutputStream(), err, "batch-split", "--as", "ana",
                "--project", "X", "--method", BatchCampaign.METHOD, "--backgrounds", sample.toString(), "--file",
                sample.toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("hold no background record"), err::toString);
        assertEquals(ExitCode.USAGE, campaign.run(new ByteArrayOutputStream(), new ByteArrayOutputStream(),
                "batch-split", "--as", "ana", "--project", "X", "--method", BatchCampaign.METHOD, "--method-version",
                "9", "--backgrounds", campaign.backgrounds.toString(), "--file", sample.toString()), "no version 9");
        assertEquals(ExitCode.USAGE, campaign.run(new ByteArrayOutputStream(), new ByteArrayOutputStream(),
                "batch-split", "--as", "ana", "--project", "X", "--method", "Unknown", "--backgrounds",
                campaign.backgrounds.toString(), "--file", sample.toString()), "no such method");
        assertEquals(before, batchesRecorded(), "no batch recorded");
    }

    @Test
    void unfinishedBatchRefusesASecondSplitAndQuantifyUntilItIsWorked() throws Exception {
        String first = campaign.ok("batch-split", campaign.quantification("D", campaign.stackFiles)).strip();
        long recorded = batchesRecorded();
        expectUnfinished("batch-split", campaign.stackFiles, first);
        expectUnfinished("batch-split", campaign.stackFiles.subList(0, 1), first);
        expectUnfinished("quantify", campaign.stackFiles, first);
        assertEquals(recorded, batchesRecorded(), "no second batch recorded");
        try (WorkspaceStore store = Workspaces.openH2(ws.resolve("db"))) {
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            assertEquals(Map.of(), resultsByTimeAndCompound(store, ana, "D"), "quantify stored nothing");
        }

        campaign.ok("batch-work", "--as", "ana", "--batch", first, "--lease", "30", "--idle-poll", "0.2");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(new ByteArrayOutputStream(), err, "batch-split",
                campaign.quantification("D", campaign.stackFiles)), "the finished batch stored the results");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("holds results of method version"), err::toString);
        assertEquals(recorded, batchesRecorded());
    }

    @Test
    void fileCutShortAfterTheSplitFailsItsUnitAndTheBatchFinishesTheOthers() throws Exception {
        List<Path> files = new java.util.ArrayList<>();
        for (int f = 0; f < FILES; f++) {
            files.add(Files.copy(campaign.stackFiles.get(f), folder.resolve("f-" + f + ".tgc")));
        }
        String batchId = campaign.ok("batch-split", campaign.quantification("F", files)).strip();
        byte[] whole = Files.readAllBytes(files.get(1));
        Files.write(files.get(1), java.util.Arrays.copyOf(whole, whole.length / 2));

        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(new ByteArrayOutputStream(), err, "batch-work", "--as", "ana",
                "--batch", batchId, "--lease", "30", "--idle-poll", "0.2"), err::toString);
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("finished with 1 of " + FILES + " files failed")
                && message.contains("failed: " + files.get(1)), message);
        assertTrue(!message.contains("f-0.tgc") && !message.contains("f-2.tgc"), message);

        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(out, new ByteArrayOutputStream(), "batch-status", "--as", "ana",
                "--batch", batchId));
        String status = out.toString(StandardCharsets.UTF_8);
        assertTrue(status.contains("0 open, 0 claimed, " + (FILES - 1) + " done, 1 failed: finished with failures")
                && status.contains("failed: " + files.get(1)), status);
        try (WorkspaceStore store = Workspaces.openH2(ws.resolve("db"))) {
            Session ana = store.users().logIn("ana", BatchCampaign.PASSWORD.toCharArray());
            assertEquals((FILES - 1) * SAMPLES_PER_FILE * COMPOUNDS, resultsByTimeAndCompound(store, ana, "F").size(),
                    "the good files' results are stored");
            assertEquals(List.of(), store.workUnits().measurementsOf(ana, batchId, 1));
            assertTrue(store.verifyAuditTrail().intact());
        }
    }

    @Test
    void stoppedRunnerEndsCancelledAndLeavesItsUnitsOpen() {
        String batchId = campaign.ok("batch-split", campaign.quantification("S", campaign.stackFiles)).strip();
        CancellationFlag stopped = new CancellationFlag();
        stopped.cancel();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.CANCELLED, campaign.run(stopped, new ByteArrayOutputStream(), err, "batch-work",
                "--as", "ana", "--batch", batchId), err::toString);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertEquals(ExitCode.CHECK_FAILED, campaign.run(out, new ByteArrayOutputStream(), "batch-status", "--as",
                "ana", "--batch", batchId));
        assertTrue(out.toString(StandardCharsets.UTF_8).contains(FILES + " open, 0 claimed, 0 done"), out::toString);
    }

    @Test
    void unknownBatchAndWrongLeaseAreUsageErrors() {
        for (String command : List.of("batch-work", "batch-status")) {
            ByteArrayOutputStream err = new ByteArrayOutputStream();
            assertEquals(ExitCode.USAGE, campaign.run(new ByteArrayOutputStream(), err, command, "--as", "ana",
                    "--batch", "no-such-batch"), command);
            assertTrue(err.toString(StandardCharsets.UTF_8).contains("no work batch with id no-such-batch"),
                    err::toString);
        }
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.USAGE, campaign.run(new ByteArrayOutputStream(), err, "batch-work", "--as", "ana",
                "--batch", "b", "--lease", "0"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("option --lease needs a number of seconds"),
                err::toString);
    }

    @Test
    void batchCommandsExplainThemselves() {
        String work = campaign.ok("batch-work", "--help");
        assertTrue(work.contains("--lease <seconds>") && work.contains("--idle-poll <seconds>")
                && work.contains("4 cancelled"), work);
        assertTrue(campaign.ok("batch-split", "--help").contains("Prints the batch id"));
        assertTrue(campaign.ok("batch-status", "--help").contains("0 every unit done, 1 units remain"));
    }

    private void expectBadInput(List<String> files, String named) throws Exception {
        List<String> args = new java.util.ArrayList<>(List.of("--as", "ana", "--project", "X", "--method",
                BatchCampaign.METHOD, "--backgrounds", campaign.backgrounds.toString()));
        args.addAll(files);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(out, err, "batch-split", args.toArray(String[]::new)),
                () -> files + ": " + err);
        assertTrue(err.toString(StandardCharsets.UTF_8).contains(named), () -> named + " in " + err);
        assertEquals("", out.toString(StandardCharsets.UTF_8), "no batch id printed");
    }

    /** A quantification of project D that must be refused, naming its unfinished batch. */
    private void expectUnfinished(String command, List<Path> files, String batchId) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, campaign.run(out, err, command, campaign.quantification("D", files)),
                () -> command + ": " + err);
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("project D has the unfinished work batch " + batchId + " of method version 1 ("
                + FILES + " open and 0 claimed of " + FILES + " units); finish it with batch-work --batch " + batchId),
                message);
        assertEquals("", out.toString(StandardCharsets.UTF_8), command + " printed nothing on standard output");
    }

    /** Batches ever recorded in the workspace, as the audit trail has them (read as the administrator). */
    private static long batchesRecorded() {
        try (WorkspaceStore store = Workspaces.openH2(ws.resolve("db"))) {
            Session root = store.users().logIn("root", BatchCampaign.PASSWORD.toCharArray());
            return store.audit().review(root, AuditQuery.all().objectType("work-batch").build()).records().size();
        }
    }

    /** The project's results keyed by measurement time and compound; fails on a key seen twice. */
    private static Map<String, Result> resultsByTimeAndCompound(WorkspaceStore store, Session actor,
            String project) {
        String projectId = store.projects().findByCode(actor, project).orElseThrow().getId();
        Map<String, Instant> times = store.projects().measurements(actor, projectId).stream()
                .collect(Collectors.toMap(Measurement::getId, Measurement::getTime));
        Map<String, Result> byKey = new TreeMap<>();
        for (Result r : store.results().results(actor, projectId)) {
            String key = times.get(r.getMeasurementId()) + " " + r.getCompound();
            assertEquals(null, byKey.put(key, r), "one result per measurement time and compound: " + key);
        }
        return byKey;
    }

    private static Instant measurementTime(WorkspaceStore store, Session actor, String project, String id) {
        String projectId = store.projects().findByCode(actor, project).orElseThrow().getId();
        return store.projects().measurements(actor, projectId).stream().filter(m -> m.getId().equals(id)).findFirst()
                .orElseThrow().getTime();
    }
}
