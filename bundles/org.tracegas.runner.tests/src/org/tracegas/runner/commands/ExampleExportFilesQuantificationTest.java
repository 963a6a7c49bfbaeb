package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.importer.StandaloneExtensions;
import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The lab's day of {@link LabJcampQuantificationTest} with the files of the example instrument (its
 * spectrum export: acquisition time, absorbance or transmittance, no cell conditions), read by the reader
 * that bundle contributes through the readers' extension point. The export states no cell conditions, so the lab
 * gives them on the command line. The concentrations recovered are checked against the amounts the spectra were
 * made with by {@link LabSpectra}.
 */
class ExampleExportFilesQuantificationTest {

    private static final int SAMPLES = 20;

    @TempDir
    Path folder;

    @Test
    void labQuantifiesTheExampleInstrumentsExports() throws Exception {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        IExtensionRegistry extensions = running != null ? running
                : StandaloneExtensions.fromSourceTree(getClass().getClassLoader(), "org.tracegas.importer",
                        "org.tracegas.importer.example");
        LabJcampQuantificationTest.Lab lab = new LabJcampQuantificationTest.Lab(folder,
                List.of("--workspace", folder.resolve("ws").toString()), SAMPLES);
        lab.readers = ReaderRegistry.fromExtensionRegistry(extensions);
        lab.setUpWorkspace();
        Random r = new Random(1130);
        Map<String, Map<String, Double>> truth = new HashMap<>();
        List<String> args = new ArrayList<>(List.of("quantify", "--project", "LBK-5", "--method",
                "Kiln stack CO and N2O", "--cell-temperature", "313.15", "--cell-pressure", "1009"));
        for (int i = 0; i < SAMPLES; i++) {
            double co = 30 + 270 * r.nextDouble();
            double n2o = 8 + 55 * r.nextDouble();
            // made with the absorbers the cell at the given 313.15 K and 1009 hPa holds (ideal gas, p/T), which
            // the results are corrected for
            double perPpm = LabJcampQuantificationTest.PATH_M * LabJcampQuantificationTest.CELL_DENSITY;
            Spectrum a = lab.spectra.absorbance(Map.of("CO", co * perPpm, "N2O", n2o * perPpm), 0.003, 1e-5, 2e-4,
                    r);
            boolean transmittance = i % 4 == 3;
            StringBuilder b = new StringBuilder("EXAMPLE FTIR EXPORT 1\nserial: EX-0107\nacquired: ")
                    .append(Instant.parse("2026-11-30T06:00:00Z").plusSeconds(900L * i)).append("\nquantity: ")
                    .append(transmittance ? "transmittance" : "absorbance").append("\npoints: ").append(a.size())
                    .append("\ndata:\n");
            for (int k = 0; k < a.size(); k++) {
                double v = transmittance ? Math.pow(10, -a.get(k)) : a.get(k);
                b.append(a.axis().get(k)).append(' ').append(String.format(Locale.ROOT, "%.7g", v)).append('\n');
            }
            Path f = folder.resolve(String.format(Locale.ROOT, "example-export-%02d.txt", i + 1));
            Files.writeString(f, b.append("end\n"));
            truth.put(f.getFileName().toString(), Map.of("CO", co, "N2O", n2o));
            args.addAll(List.of("--file", f.toString()));
        }
        String out = lab.ok(args.toArray(String[]::new));
        assertTrue(out.contains("Quantified " + SAMPLES + " measurement(s)"), out);
        assertTrue(out.contains("as Example FTIR export"), "the contributed reader read the files: " + out);

        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "lab-pw-12".toCharArray());
            String project = store.projects().findByCode(ana, "LBK-5").orElseThrow().getId();
            Map<String, Measurement> byId = new HashMap<>();
            for (Measurement m : store.imports().measurements(ana, project)) {
                byId.put(m.getId(), m);
                assertEquals(313.15, m.getCellTemperature(), "the conditions the lab gave");
            }
            List<Result> results = store.results().results(ana, project);
            assertEquals(2 * SAMPLES, results.size());
            double worst = 0;
            for (Result res : results) {
                Measurement m = byId.get(res.getMeasurementId());
                double t = truth.get(m.getSourceFile()).get(res.getCompound());
                double error = Math.abs(res.getConcentration() - t);
                worst = Math.max(worst, error / t);
                // the tolerance of LabJcampQuantificationTest, for the same generator and method
                assertTrue(error <= 0.03 * t + 0.3, () -> m.getSourceFile() + " " + res.getCompound() + ": "
                        + res.getConcentration() + " ppm, made with " + t + " ppm");
            }
            System.out.printf(Locale.ROOT, "Example FTIR exports: worst relative error %.4f over %d results%n",
                    worst, results.size());
            assertTrue(store.verifyAuditTrail().intact());
        }
    }
}
