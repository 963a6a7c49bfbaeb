package org.tracegas.ui.flows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

import org.tracegas.importer.jcamp.JcampWriter;
import org.tracegas.method.MethodDefinition;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Project;
import org.tracegas.model.QaOutcomes;
import org.tracegas.model.Role;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * An invented lab's day in real files: the Quarrymoor lime works measure their kiln stack with a 2 m heated cell.
 * The workspace has its users and project, and a CO method over a one-reference library recorded as the runner's
 * {@code method-define} records it ({@link MethodDefinition#record}); the samples are JCAMP-DX files written by
 * the importer's {@link JcampWriter}. Each sample's absorbance is the reference's scaled by the number of CO
 * molecules in the beam: mixing ratio × path × (p / p_ref) × (T_ref / T), the ideal gas law (any physics
 * textbook); the fit assumes the same linear law, so the amounts recovered check the desk's plumbing (files,
 * conditions, path, units, flags), not the fit.
 */
final class LimeKilnLab {

    static final String ADMIN = "admin";
    static final String ANALYST = "t.nakamura";
    static final String REVIEWER = "e.lindqvist";
    static final String QA_MANAGER = "a.moreau";
    static final String PASSWORD = "quarrymoor-pw-7";
    static final String CODE = "QLW-2026-12";
    static final String METHOD = "Kiln stack CO";
    static final double PATH_M = 2.0;
    static final double REFERENCE_PPM_M = 200;
    /** The references' conditions, K and hPa. */
    static final double T_REF = 296.0;
    static final double P_REF = 1013.25;
    /** The heated cell's conditions, K and hPa (an invented operating point). */
    static final double T_CELL = 318.0;
    static final double P_CELL = 1002.0;
    static final Instant T0 = Instant.parse("2026-12-03T07:00:00Z");
    /** Absorbance noise of the samples (one standard deviation), so that the fit has an uncertainty. */
    static final double NOISE = 2e-4;
    static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 601);

    /** The invented moisture band's centre and half width, cm⁻¹, and its reference amount, ppm·m. */
    static final double WATER_CENTRE = 2030;
    static final double WATER_WIDTH = 3;
    static final double WATER_REFERENCE_PPM_M = 100_000;

    final Path folder;
    final WorkspaceStore store;
    /** The stack's moisture in the samples, ppm; 0 when the method does not measure moisture. */
    final double waterPpm;
    final Project project;
    final Session analyst;
    final Session reviewer;

    LimeKilnLab(WorkspaceStore store, Path folder) throws IOException {
        this(store, folder, 0);
    }

    /**
     * @param waterPpm the moisture of the stack; above 0 the library has a water reference (an invented band, as
     *                 the CO one) and the method measures water as well, as a report on dry gas needs
     */
    LimeKilnLab(WorkspaceStore store, Path folder, double waterPpm) throws IOException {
        this.folder = folder;
        this.store = store;
        this.waterPpm = waterPpm;
        Session admin = store.users().createFirstAdministrator(ADMIN, "Administrator", PASSWORD.toCharArray());
        String analystId = store.users().createUser(admin, ANALYST, "Taro Nakamura", Set.of(Role.ANALYST),
                PASSWORD.toCharArray()).getId();
        String reviewerId = store.users().createUser(admin, REVIEWER, "Elin Lindqvist", Set.of(Role.REVIEWER),
                PASSWORD.toCharArray()).getId();
        String client = store.projects().createClient(admin, "Quarrymoor Lime Works").getId();
        project = store.projects().createProject(admin, client, CODE, "Kiln 2 stack, December");
        store.projects().grant(admin, project.getId(), analystId, AccessLevel.WRITE);
        store.projects().grant(admin, project.getId(), reviewerId, AccessLevel.READ);
        String managerId = store.users().createUser(admin, QA_MANAGER, "Amara Moreau", Set.of(Role.QUALITY_MANAGER),
                PASSWORD.toCharArray()).getId();
        store.projects().grant(admin, project.getId(), managerId, AccessLevel.READ);
        analyst = store.users().logIn(ANALYST, PASSWORD.toCharArray());
        reviewer = store.users().logIn(REVIEWER, PASSWORD.toCharArray());
        defineMethod();
    }

    /** The library folder (one JCAMP-DX reference) and the method file, recorded as versions. */
    private void defineMethod() throws IOException {
        Path lib = Files.createDirectories(folder.resolve("lib"));
        Files.writeString(lib.resolve("co-200.jdx"), JcampWriter.defaultPrecision().write(
                new Spectrum(AXIS, band(REFERENCE_PPM_M / REFERENCE_PPM_M), Ordinate.ABSORBANCE), "CO 200 ppm m",
                Map.of("COMPOUND", "CO", "PPM-M", Double.toString(REFERENCE_PPM_M))));
        // CAS number and molar mass of CO: NIST Chemistry WebBook (from memory)
        Files.writeString(lib.resolve("library.manifest"), """
                library = Quarrymoor references
                [reference]
                file = co-200.jdx
                cas = 630-08-0
                formula = CO
                molar-mass = 28.010
                temperature = 296
                pressure = 101.325
                resolution = 0.5
                apodization = Norton-Beer medium
                origin = synthetic
                origin-text = one invented band
                uncertainty = 0.02
                """ + (waterPpm > 0 ? """
                [reference]
                file = h2o.jdx
                cas = 7732-18-5
                formula = H2O
                molar-mass = 18.015
                temperature = 296
                pressure = 101.325
                resolution = 0.5
                apodization = Norton-Beer medium
                origin = synthetic
                origin-text = one invented band
                uncertainty = 0.02
                """ : ""));
        if (waterPpm > 0) {
            Files.writeString(lib.resolve("h2o.jdx"), JcampWriter.defaultPrecision().write(new Spectrum(AXIS,
                    waterBand(1), Ordinate.ABSORBANCE), "H2O 100000 ppm m", Map.of("COMPOUND", "H2O", "PPM-M",
                            Double.toString(WATER_REFERENCE_PPM_M))));
        }
        Path method = Files.writeString(folder.resolve("kiln.method"), """
                method = %s
                library = lib/library.manifest
                path-length = %s

                [transform]
                apodization = norton-beer-medium
                phase-correction = mertz
                sidedness = double-sided
                zero-fill = 2
                range = 2000..2300

                [analyte]
                compound = CO
                region = 2060..2240 baseline 1
                """.formatted(METHOD, PATH_M) + (waterPpm > 0 ? """

                [analyte]
                compound = H2O
                region = 2010..2050 baseline 1
                """ : ""));
        MethodDefinition.read(method).record(store, analyst);
    }

    /**
     * An invented CO-like band (Lorentzian at 2143 cm⁻¹, the CO fundamental's centre, NIST Chemistry WebBook, from
     * memory) whose peak absorbance is 0.5 per reference amount.
     */
    static double[] band(double perReference) {
        return lorentzian(2143, 12, perReference);
    }

    /** An invented narrow water band whose peak absorbance is 0.5 per reference amount. */
    static double[] waterBand(double perReference) {
        return lorentzian(WATER_CENTRE, WATER_WIDTH, perReference);
    }

    private static double[] lorentzian(double centre, double halfWidth, double perReference) {
        double[] a = new double[AXIS.size()];
        for (int k = 0; k < a.length; k++) {
            double x = (AXIS.get(k) - centre) / halfWidth;
            a[k] = 0.5 * perReference / (1 + x * x);
        }
        return a;
    }

    /**
     * The sample absorbance of {@code ppm} CO (and the lab's moisture) in the heated cell, with the noise of seed
     * {@code seed}.
     */
    Spectrum sample(double ppm, long seed) {
        double inBeam = PATH_M * (P_CELL / P_REF) * (T_REF / T_CELL);
        double[] a = band(ppm * inBeam / REFERENCE_PPM_M);
        double[] water = waterBand(waterPpm * inBeam / WATER_REFERENCE_PPM_M);
        for (int k = 0; k < a.length; k++) {
            a[k] += water[k];
        }
        Random r = new Random(seed);
        for (int k = 0; k < a.length; k++) {
            a[k] += NOISE * r.nextGaussian();
        }
        return new Spectrum(AXIS, a, Ordinate.ABSORBANCE);
    }

    /**
     * Writes one JCAMP-DX sample file.
     *
     * @param statesConditions whether the file carries its time and cell conditions as labels; a file without
     *                         takes those the user gives at import
     */
    Path writeSample(String name, double ppm, int minute, boolean statesConditions) throws IOException {
        Map<String, String> labels = new LinkedHashMap<>();
        if (statesConditions) {
            // ##LONGDATE as JCAMP-DX 5.01 writes it, yyyy/MM/dd HH:mm:ss (from memory)
            labels.put("LONGDATE", LONGDATE.format(T0.plusSeconds(60L * minute)));
            labels.put("CELL TEMPERATURE", Double.toString(T_CELL));
            labels.put("CELL PRESSURE", Double.toString(P_CELL));
        }
        Path file = Files.createDirectories(folder.resolve("day")).resolve(name);
        JcampWriter.save(JcampWriter.defaultPrecision().write(sample(ppm, minute), "Kiln 2 stack " + name, labels),
                file);
        return file;
    }

    /**
     * The lab's QA evaluation of the morning as the runner's qa command stores it (invented readings and
     * acceptance ranges of the Quarrymoor lab), recorded by the analyst: the zero passed, the calibration transfer
     * standard did not.
     */
    void recordQaChecks(String methodVersionId) {
        store.qa().recordAll(analyst, project.getId(), methodVersionId, List.of(
                QaOutcomes.of("Zero CO", true, 0.4, "ppm", -2, 2, "zero gas reads within ±2 ppm",
                        "Quarrymoor lab procedure (invented)"),
                QaOutcomes.of("CTS path length", false, 2.31, "m", 1.9, 2.1, "path from the CTS within ±5 %",
                        "Quarrymoor lab procedure (invented)")));
    }

    /**
     * The report plan of the morning's report QLW-R-01 on dry gas at 11 % reference O2 (the lab's moisture must be
     * measured: see {@link #LimeKilnLab(WorkspaceStore, Path, double)}), with its O2 side channel file beside it.
     */
    Path reportPlan() throws IOException {
        StringBuilder o2 = new StringBuilder("time,O2\nUTC,%vol\n");
        for (int minute = 0; minute < 4; minute++) {
            o2.append(T0.plusSeconds(60L * minute)).append(",11.5\n");
        }
        Files.writeString(folder.resolve("o2.csv"), o2);
        return Files.writeString(folder.resolve("kiln.plan"), """
                report-id = QLW-R-01
                client = Quarrymoor Lime Works
                plant = Quarrymoor kiln 2
                source = Kiln 2 stack
                first-day = 2026-12-03
                last-day = 2026-12-03
                issued = 2026-12-04T09:00:00Z
                standard-temperature = 273.15
                standard-pressure = 101.3
                reference-o2 = 11
                o2-guard = 20
                o2-file = o2.csv
                o2-channel = O2
                o2-uncertainty = 0.2
                water = H2O
                cell-temperature = 318
                cell-pressure = 100.2
                reference-uncertainty = 0.02
                path-uncertainty = 0.05
                temperature-uncertainty = 2
                pressure-uncertainty = 0.5
                periods = 2 min

                [compound]
                name = CO
                molar-mass = 28.010
                limit = 100 per 2 min
                """);
    }

    static final DateTimeFormatter LONGDATE = DateTimeFormatter.ofPattern("yyyy/MM/dd HH:mm:ss")
            .withZone(ZoneOffset.UTC);

    /** The samples of the morning: three stating their conditions, the last one none. */
    List<Path> morning() throws IOException {
        return List.of(writeSample("s01.jdx", 40, 0, true), writeSample("s02.jdx", 0, 1, true),
                writeSample("s03.jdx", 150, 2, true), writeSample("s04.jdx", 60, 3, false));
    }
}
