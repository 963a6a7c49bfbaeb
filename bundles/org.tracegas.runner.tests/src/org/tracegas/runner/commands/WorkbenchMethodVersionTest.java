package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracegas.runner.commands.InventedBandSystem.header;
import static org.tracegas.runner.commands.InventedBandSystem.methodFile;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.method.MethodVersions;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspacePackage.Literals;
import org.tracegas.model.edit.ModelEditor;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ResultRow;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * A method version saved the way the workbench's method editor saves it (the workspace model edited through the
 * editor's command stack: a region's span and its analyte's interferents, another region's baseline order, a region
 * removed; then {@link MethodVersions#save}) into a real embedded workspace, and run by the
 * runner's quantify command on real container files of interferograms: the front ends share one method text.
 * That version edited on (a maximum absorbance, a tolerance and a processing step) is run again on the same files:
 * the step is the recipe recorded with the results, and the maximum flags the one sample whose stored absorbance
 * exceeds it.
 */
class WorkbenchMethodVersionTest {

    private static final Instant T0 = Instant.parse("2026-03-18T08:00:00Z");
    /** CO of the stack samples, ppm, with 10 % water vapour. */
    private static final double[] CO_PPM = { 20, 60 };
    /** A processing step as the editor's recipe field takes it, in a method file's {@code step = } form. */
    private static final String BASELINE_STEP = "baseline degree=0;regions=2000.0:2030.0";
    /** The CO window of the edited version, cm⁻¹. */
    private static final double CO_LOW = 2060;
    private static final double CO_HIGH = 2200;
    private static final Map<String, String> ENV = Map.of("TRACEGAS_PASSWORD", "analyst-pw-1",
            "TRACEGAS_NEW_PASSWORD", "analyst-pw-1");

    @TempDir
    Path folder;

    private int run(ByteArrayOutputStream err, String... argv) {
        CancellationFlag cancel = new CancellationFlag();
        CommandTable table = new CommandTable("test", List.of(new WorkspaceInitCommand(), new UserAddCommand(),
                new ProjectAddCommand(), new LibraryBuildCommand(cancel), new MethodDefineCommand(),
                new QuantifyCommand(cancel)));
        return table.dispatch(argv, new RunnerContext(new PrintStream(new ByteArrayOutputStream(), true,
                StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8), ENV));
    }

    private void ok(String... argv) {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.OK, run(err, argv), () -> String.join(" ", argv) + ": " + err);
    }

    /** The highest value of a spectrum between two wavenumbers. */
    private static double highest(Spectrum s, double low, double high) {
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < s.size(); i++) {
            double x = s.axis().get(i);
            if (x >= low && x <= high) {
                max = Math.max(max, s.get(i));
            }
        }
        return max;
    }

    @Test
    void aVersionSavedFromTheEditorIsRunByTheRunner() throws Exception {
        String ws = folder.resolve("ws").toString();
        ok("workspace-init", "--workspace", ws, "--admin", "root", "--name", "Admin");
        ok("user-add", "--workspace", ws, "--as", "root", "--login", "ana", "--name", "Ana Lyst", "--roles",
                "analyst");
        ok("project-add", "--workspace", ws, "--as", "ana", "--client", "Client W", "--code", "P-W", "--name",
                "Kiln survey");
        InventedBandSystem bands = new InventedBandSystem(folder);
        ok("library-build", "--workspace", ws, "--as", "ana", "--plan", bands.libraryPlan().toString(), "--out",
                folder.resolve("lib").toString());
        Files.writeString(folder.resolve("stack.method"), methodFile("Stack"));
        ok("method-define", "--workspace", ws, "--as", "ana", "--method", folder.resolve("stack.method").toString());

        Random noise = new Random(23);
        Path backgrounds = folder.resolve("background.tgc");
        try (ContainerWriter w = ContainerWriter.create(backgrounds)) {
            w.append(header(SampleKind.BACKGROUND, T0.minusSeconds(600), null), bands.interferogram(Map.of(), noise));
            w.commit();
        }
        Path stack = folder.resolve("stack.tgc");
        try (ContainerWriter w = ContainerWriter.create(stack)) {
            for (int i = 0; i < CO_PPM.length; i++) {
                w.append(header(SampleKind.SAMPLE, T0.plusSeconds(60L * i), null),
                        bands.interferogram(Map.of("CO", CO_PPM[i], "H2O", 100_000.0), noise));
            }
            w.commit();
        }

        ContentVersion saved;
        double limit;
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "analyst-pw-1".toCharArray());
            ContentVersion first = store.versions().latest(VersionKind.METHOD, "Stack").orElseThrow();
            // what the workbench does: the version in the model, edited through the editor's command stack
            AnalysisMethod method = MethodVersions.read(store, first);
            ModelEditor editor = new ModelEditor();
            editor.createResource("desk:/workspace").getContents().add(method);
            MethodVersion draft = method.getVersions().get(0);
            AnalysisRegion co = draft.getRegions().get(0);
            assertEquals("CO", co.getCompound());
            assertEquals(2050, co.getLowerWavenumber());
            editor.set(co, Literals.ANALYSIS_REGION__LOWER_WAVENUMBER, CO_LOW);
            // the analyte's interferents, as the editor's Interferents field sets them on its one region
            assertEquals(List.of("N2O"), co.getInterferents());
            editor.set(co, Literals.ANALYSIS_REGION__INTERFERENTS, List.of("N2O", "H2O"));
            AnalysisRegion n2o = draft.getRegions().get(1);
            editor.set(n2o, Literals.ANALYSIS_REGION__BASELINE_ORDER, 0);
            // water is fitted with CO as an interferent and no longer reported of its own
            AnalysisRegion water = draft.getRegions().get(2);
            assertEquals("H2O", water.getCompound());
            editor.remove(draft, Literals.METHOD_VERSION__REGIONS, water);
            saved = MethodVersions.save(store, ana, method, draft, "CO window starts above the band's far wing;"
                    + " water fitted with CO only");
            assertEquals(2, saved.getNumber());
            assertEquals(first.getId(), saved.getParentId());
            StoredMethod stored = StoredMethod.parse(store.versions().content(saved.getId()), "saved");
            assertEquals(2060, stored.method().analytes().get(0).regions().get(0).low());
            assertEquals(List.of("N2O", "H2O"), stored.method().analytes().get(0).interferents());
            assertEquals(List.of("CO", "N2O"), stored.method().analytes().stream().map(a -> a.compound()).toList());
            assertEquals(0, stored.method().analytes().get(1).regions().get(0).baselineOrder());
            assertEquals(StoredMethod.parse(store.versions().content(first.getId()), "first").transform(),
                    stored.transform());
        }

        ok("quantify", "--workspace", ws, "--as", "ana", "--project", "P-W", "--method", "Stack",
                "--method-version", "2", "--backgrounds", backgrounds.toString(), "--file", stack.toString());

        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "analyst-pw-1".toCharArray());
            String project = store.projects().findByCode(ana, "P-W").orElseThrow().getId();
            List<Result> results = store.results().results(ana, project);
            assertEquals(2 * CO_PPM.length, results.size(), "CO and N2O of each sample, no longer H2O");
            assertTrue(results.stream().allMatch(r -> r.getProvenance().methodVersionId().equals(saved.getId())),
                    "every result names the version saved from the editor");
            assertTrue(store.versions().version(saved.getId()).isFrozen(), "a version with results is frozen");
            Map<String, Instant> times = new java.util.HashMap<>();
            store.projects().measurements(ana, project).forEach(m -> times.put(m.getId(), m.getTime()));
            List<Double> co = results.stream().filter(r -> r.getCompound().equals("CO"))
                    .sorted(java.util.Comparator.comparing(r -> times.get(r.getMeasurementId())))
                    .map(r -> r.getConcentration()).toList();
            for (int i = 0; i < CO_PPM.length; i++) {
                // the truth is the mixture the interferograms were synthesised from; 4 % as in the runner's
                // analysis test (interpolation between references 1.5 apart plus the detector noise)
                assertEquals(CO_PPM[i], co.get(i), 0.04 * CO_PPM[i], "sample " + i);
            }
            // the highest absorbance of each sample in the CO window, read from the absorbance stored with the
            // results: the second sample (three times the CO) absorbs more
            Map<String, Double> highest = new java.util.HashMap<>();
            store.spectra().stream(ana, project).filter(s -> s.getContent() == SpectralContent.ABSORBANCE
                    && s.getMeasurementId() != null).forEach(s -> highest.merge(s.getMeasurementId(), highest(s
                            .getSpectrum(), CO_LOW, CO_HIGH), Math::max));
            List<Double> peaks = results.stream().filter(r -> r.getCompound().equals("CO"))
                    .sorted(java.util.Comparator.comparing(r -> times.get(r.getMeasurementId())))
                    .map(r -> highest.get(r.getMeasurementId())).toList();
            assertTrue(peaks.get(1) > 1.5 * peaks.get(0), "highest absorbances " + peaks);
            limit = Math.sqrt(peaks.get(0) * peaks.get(1));
        }

        // version 2 edited on: a maximum absorbance between the two samples', a tighter tolerance, and a
        // processing step before the fit
        ContentVersion third;
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "analyst-pw-1".toCharArray());
            AnalysisMethod method = MethodVersions.read(store, saved);
            ModelEditor editor = new ModelEditor();
            editor.createResource("desk:/workspace").getContents().add(method);
            MethodVersion draft = method.getVersions().get(0);
            assertEquals(1.0, draft.getMaxAbsorbance(), "the method file's default");
            assertEquals(1e-6, draft.getTolerance(), "as the method file states it");
            editor.set(draft, Literals.METHOD_VERSION__MAX_ABSORBANCE, limit);
            editor.set(draft, Literals.METHOD_VERSION__TOLERANCE, 1e-7);
            // an offset taken out over 2000..2030 cm⁻¹, where none of the synthesised bands absorbs (their lines
            // lie from 2097 cm⁻¹ up, see InventedBandSystem): the step must leave the amounts as they were
            editor.set(draft, Literals.METHOD_VERSION__RECIPE_STEPS, List.of(BASELINE_STEP));
            third = MethodVersions.save(store, ana, method, draft, "strong CO absorbance flagged; tighter"
                    + " convergence; zero offset taken out before the fit");
            assertEquals(3, third.getNumber());
            assertEquals(saved.getId(), third.getParentId());
            assertEquals(ana.userId(), third.getAuthorId());
        }

        // the same files imported into a second project and quantified there through the lab's file route, which
        // puts every absorbance through the method's recipe; the stream of containers runs no recipe, so it refuses
        // the version rather than store results that name a recipe which did not run
        ok("project-add", "--workspace", ws, "--as", "ana", "--client", "Client W", "--code", "P-W3", "--name",
                "Kiln survey, method version 3");
        ByteArrayOutputStream refused = new ByteArrayOutputStream();
        assertEquals(ExitCode.BAD_INPUT, run(refused, "quantify", "--workspace", ws, "--as", "ana", "--project",
                "P-W3", "--method", "Stack", "--method-version", "3", "--backgrounds", backgrounds.toString(),
                "--file", stack.toString()));
        assertTrue(refused.toString(StandardCharsets.UTF_8).contains("method version 3: method Stack has [recipe]"
                + " steps [" + BASELINE_STEP + "]"), refused.toString(StandardCharsets.UTF_8));
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "analyst-pw-1".toCharArray());
            String project = store.projects().findByCode(ana, "P-W3").orElseThrow().getId();
            assertEquals(List.of(), store.results().results(ana, project), "nothing stored by the refused run");
        }
        ok("quantify", "--workspace", ws, "--as", "ana", "--project", "P-W3", "--method", "Stack",
                "--method-version", "3", "--background-file", backgrounds.toString(), "--file", stack.toString());

        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "analyst-pw-1".toCharArray());
            String project = store.projects().findByCode(ana, "P-W3").orElseThrow().getId();
            List<ResultRow> rows = store.analyses().rows(ana, project).stream().filter(r -> r.result()
                    .getProvenance().methodVersionId().equals(third.getId())
                    && r.result().getCompound().equals("CO")).toList();
            assertEquals(CO_PPM.length, rows.size());
            for (int i = 0; i < CO_PPM.length; i++) {
                ResultRow r = rows.get(i);
                // a result whose sample absorbs more than the method's maximum inside the fit windows is flagged
                // (MethodDefinition's max-absorbance): the second sample only
                assertEquals(i == 1, r.result().getFlags().contains(ResultFlag.SATURATED), "sample " + i
                        + ": " + r.result().getFlags());
                // the offset step leaves the amounts as they were: the truth is the synthesised mixture, within
                // the 4 % above
                assertEquals(CO_PPM[i], r.result().getConcentration(), 0.04 * CO_PPM[i], "sample " + i);
                assertTrue(store.analyses().recipe(ana, r.recipeSha256()).contains(BASELINE_STEP),
                        "the recipe that ran is the one edited: " + store.analyses().recipe(ana, r.recipeSha256()));
            }
        }
    }
}
