package org.tracegas.runner.commands;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Locale;
import java.util.Map;
import java.util.Random;

import org.tracegas.method.KeyValueFile;
import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.method.TransformText;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.HitranLineListReader;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.SpectralAxis;

/**
 * A small invented band system for the runner's end-to-end tests (CO-like, an N2O-like tracer and a few
 * water-like lines near 2200 cm-1, at 7.7 cm-1): its line lists in a folder, interferograms of a hot cell, the
 * library plan and the method file in the runner's formats.
 */
final class InventedBandSystem {

    static final double LASER = 15798.0;
    static final int HALF = 1024;
    static final double PATH = 4.85;
    static final double CELL_T = 438.15;
    static final double CELL_P = 101.3;

    private final Path folder;
    private final Map<String, LineByLineModel> gases;

    /** Writes the line lists into the folder. */
    InventedBandSystem(Path folder) throws IOException {
        this.folder = folder;
        HitranLineListReader reader = new HitranLineListReader();
        gases = Map.of("CO", new LineByLineModel(reader.read(coLines()), 28.010,
                PowerLawPartitionFunction.linearMolecule()),
                "N2O", new LineByLineModel(reader.read(lineList("n2o.par", 4, 2205, 5, 7, 6e-20, 0.42)), 44.013,
                        PowerLawPartitionFunction.linearMolecule()),
                "H2O", new LineByLineModel(reader.read(lineList("h2o.par", 1, 2250, 8, 5, 2e-23, 14.5)), 18.015,
                        PowerLawPartitionFunction.nonLinearMolecule()));
    }

    /**
     * Invented lines (numbers plausible, not real molecular data) in the HITRAN 160-character record: n lines
     * from a first wavenumber at a spacing, intensities (cm/molecule at 296 K) shaped like a rotational branch.
     */
    private Path lineList(String file, int molecule, double first, double spacing, int n, double strongest,
            double rotational) throws IOException {
        StringBuilder s = new StringBuilder();
        for (int j = 0; j < n; j++) {
            double lower = rotational * j * (j + 1);
            double intensity = strongest * (j + 1) * Math.exp(-lower * 1.4388 / 296.0);
            StringBuilder r = new StringBuilder(String.format(Locale.ROOT, "%2d%1d%12.6f%10.3E%10.3E", molecule, 1,
                    first + spacing * j, intensity, 1.0));
            r.append(".0600 .070").append(String.format(Locale.ROOT, "%10.4f%4.2f", lower, 0.72)).append("-.002500");
            while (r.length() < 160) {
                r.append(' ');
            }
            s.append(r).append('\n');
        }
        Path path = folder.resolve(file);
        Files.writeString(path, s);
        return path;
    }

    /**
     * CO-like P and R branches of 12 lines each, 3.86 cm-1 apart around 2143 cm-1. The strengths give a band
     * of about 1.0e-17 cm/molecule at 296 K, the integrated intensity of the CO fundamental (HITRAN, from
     * memory), so the band saturates at stack levels as a real one does and not more.
     */
    private Path coLines() throws IOException {
        StringBuilder s = new StringBuilder();
        for (int sign : new int[] { -1, 1 }) {
            for (int j = 0; j < 12; j++) {
                double lower = 1.93 * j * (j + 1);
                double intensity = 1.07e-19 * (j + 1) * Math.exp(-lower * 1.4388 / 296.0);
                StringBuilder r = new StringBuilder(String.format(Locale.ROOT, "%2d%1d%12.6f%10.3E%10.3E", 5, 1,
                        2143.0 + sign * 3.86 * (j + 0.5), intensity, 1.0));
                r.append(".0600 .070").append(String.format(Locale.ROOT, "%10.4f%4.2f", lower, 0.72))
                        .append("-.002500");
                while (r.length() < 160) {
                    r.append(' ');
                }
                s.append(r).append('\n');
            }
        }
        Path file = folder.resolve("co.par");
        Files.writeString(file, s);
        return file;
    }

    /**
     * The interferogram of the cell in front of a smooth source, by a direct cosine sum (double-sided) over a
     * grid of 0.02 cm-1, half the Lorentz half width of the lines at the cell's conditions, with detector noise.
     */
    Interferogram interferogram(Map<String, Double> ppm, Random noise) {
        double step = 0.02;
        SpectralAxis fine = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1800, step, 35_001);
        double[] t = new double[fine.size()];
        java.util.Arrays.fill(t, 1.0);
        ppm.forEach((gas, c) -> {
            if (c > 0) {
                double[] g = gases.get(gas).transmittance(fine, new AbsorptionPath(CELL_T, CELL_P, c, PATH))
                        .toArray();
                for (int k = 0; k < t.length; k++) {
                    t[k] *= g[k];
                }
            }
        });
        double[] samples = new double[2 * HALF];
        for (int k = 0; k < fine.size(); k++) {
            double sigma = fine.get(k);
            double b = Math.min(1.0, Math.min(sigma - 1800, 2500 - sigma) / 100.0) * t[k] * step / 0.1;
            // cos(j theta) for j = |i - HALF| by the Chebyshev recurrence
            double theta = 2 * Math.PI * sigma * 2 / LASER;
            double twoCos = 2 * Math.cos(theta);
            double previous = Math.cos(theta);
            double current = 1.0;
            samples[HALF] += b;
            for (int j = 1; j <= HALF; j++) {
                double next = twoCos * current - previous;
                previous = current;
                current = next;
                samples[HALF - j] += b * current;
                if (j < HALF) {
                    samples[HALF + j] += b * current;
                }
            }
        }
        // detector noise of 4e-6 of the centre burst (about 7000 here), as the demo instrument's
        for (int i = 0; i < samples.length; i++) {
            samples[i] += 2000.0 + 0.028 * noise.nextGaussian();
        }
        return new Interferogram(samples, LASER, 2);
    }

    /** A record of the cell at its conditions; role as {@link MeasurementRole} names it, or null. */
    static AcquisitionHeader header(SampleKind kind, Instant time, String role) {
        return new AcquisitionHeader(HALF, kind, time, CELL_T, CELL_P * 10, PATH,
                role == null ? Map.of() : Map.of(MeasurementRole.KEY, role));
    }

    static final String TRANSFORM = """
            [transform]
            apodization = norton-beer-medium
            phase-correction = mertz
            sidedness = double-sided
            zero-fill = 2
            range = 2000..2300
            """;

    static String methodFile(String name) {
        return "method = " + name + """

                library = lib/library.manifest
                path-length = 4.85
                nonlinearity = yes
                tolerance = 1e-6
                """ + TRANSFORM + """

                [analyte]
                compound = CO
                interferents = N2O
                region = 2050..2200 baseline 1

                [analyte]
                compound = N2O
                interferents = CO
                region = 2200..2240 baseline 1

                [analyte]
                compound = H2O
                region = 2245..2295 baseline 1
                """;
    }

    /** Writes library.plan into the folder (references on the levels the runner tests quantify) and returns it. */
    Path libraryPlan() throws IOException {
        SpectralAxis axis = new InterferogramTransform(TransformText.read(KeyValueFile.parse(TRANSFORM,
                folder.resolve("t")).blocks("transform").get(0))).singleBeam(interferogram(Map.of(), new Random(1)))
                .axis();
        // references at most a factor 1.5 apart over the stack and QA levels; the CTS (485 ppm·m) and the first
        // sample (97 ppm·m) sit on references, the spike's tracer (24.25 ppm·m) too
        return Files.writeString(folder.resolve("library.plan"), String.format(Locale.ROOT, """
                library = Invented references
                temperature = %s
                pressure = %s
                path-length = %s
                resolution = %s
                apodization = norton-beer-medium
                first-wavenumber = %s
                step = %s
                points = %d
                uncertainty = 0.02

                [compound]
                name = CO
                cas = 630-08-0
                formula = CO
                molar-mass = 28.010
                line-list = co.par
                partition = linear
                ppm-m = 72.75, 97, 145.5, 218.25, 327.375, 485, 727.5

                [compound]
                name = N2O
                cas = 10024-97-2
                formula = N2O
                molar-mass = 44.013
                line-list = n2o.par
                partition = linear
                ppm-m = 24.25, 36.375

                [compound]
                name = H2O
                cas = 7732-18-5
                formula = H2O
                molar-mass = 18.015
                line-list = h2o.par
                partition = non-linear
                ppm-m = 363750, 606250
                """, CELL_T, CELL_P, PATH, LASER / 2 / HALF, axis.first(), axis.step(), axis.size()));
    }
}
