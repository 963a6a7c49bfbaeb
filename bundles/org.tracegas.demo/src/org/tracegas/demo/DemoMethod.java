package org.tracegas.demo;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.Locale;

import org.tracegas.method.LibraryPlan;
import org.tracegas.method.LibrarySynthesis;
import org.tracegas.method.MethodDefinition;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.spectrum.SpectralAxis;

/**
 * The demo's analysis as a lab writes it down, in the plan formats of the runner's commands: the library plan of
 * its synthetic references, the method file (transform, analytes with their interferents and regions), and the
 * QA and report plans of the campaign. The demo runs the same jobs over these texts as the commands do over
 * files.
 */
public final class DemoMethod {

    public static final String METHOD_NAME = "Tarnbeck hot-wet stack gas, 9 analytes with the SF6 tracer";
    public static final String LIBRARY_NAME = "Demo synthetic references, Tarnbeck hot cell, NB medium";
    public static final Apodization APODIZATION = Apodization.NORTON_BEER_MEDIUM;
    /** Folder of the library, relative to the plans. */
    static final String LIBRARY_FOLDER = "library";

    private DemoMethod() {
    }

    /**
     * Reference amounts relative to the nominal level: at least two per gas, so the curve of growth bends with
     * the gas's nonlinearity; CO reaches higher because its upsets do, NH3 because its slip rises in the
     * afternoon. Water's strong lines are saturated over the cell's path, so its absorbance bends most between
     * references and it gets one at its nominal level as well.
     */
    private static double[] referenceFactors(Gas gas) {
        if (gas == DemoScenario.CO) {
            return new double[] { 0.5, 1.5, 8.0 };
        }
        if (gas == DemoScenario.H2O) {
            return new double[] { 0.5, 1.0, 1.5 };
        }
        return gas == DemoScenario.NH3 ? new double[] { 0.5, 2.0 } : new double[] { 0.5, 1.5 };
    }

    /** The method file; its library is the folder {@value #LIBRARY_FOLDER} beside it. */
    static String methodText() {
        // a part in a million of the amount is far below the noise; a tighter tolerance only costs iterations.
        // SF6 is fitted over its whole band, P to R branch (outside 918..978 its lines stay below half a percent
        // of the Q branch at the cell temperature): a window over the Q branch alone leaves much of the band's
        // signal unused, so the noise of a background, shared by every sample of its period, reads as a
        // negative tracer level. Water has no line there, only a smooth wing the baseline takes up.
        // The curves of growth through each gas's references follow the saturated lines of water and CO2 as the
        // interpolation between references did, all analytes in one joint fit at a fraction of its cost.
        return "method = " + METHOD_NAME + "\n" + """
                library = library/library.manifest
                path-length = %s
                resolution = %s
                tolerance = 1e-6
                reporting-unit = ppm
                algorithm = curve-of-growth

                [transform]
                apodization = norton-beer-medium
                phase-correction = mertz
                sidedness = double-sided
                zero-fill = 1
                range = %s..%s

                [analyte]
                compound = CO
                interferents = CO2, N2O
                region = 2040..2140 baseline 1

                [analyte]
                compound = CO2
                interferents = H2O
                region = 3560..3660 baseline 1

                [analyte]
                compound = NO
                interferents = H2O
                region = 1840..1940 baseline 1

                [analyte]
                compound = N2O
                interferents = CO, CO2
                region = 2190..2260 baseline 1

                [analyte]
                compound = NH3
                interferents = H2O, SF6
                region = 900..1020 baseline 1

                [analyte]
                compound = HCl
                interferents = CH4, H2O
                region = 2700..2960 baseline 1

                [analyte]
                compound = CH4
                interferents = HCl, H2O
                region = 2960..3100 baseline 1

                [analyte]
                compound = H2O
                interferents = NO
                region = 1700..1800 baseline 1

                [analyte]
                compound = SF6
                interferents = NH3
                region = 918..978 baseline 1
                """.formatted(number(DemoScenario.PATH_LENGTH), number(DemoScenario.RESOLUTION),
                        number(DemoScenario.RANGE_LOW),
                        number(DemoScenario.RANGE_HIGH));
    }

    /**
     * The library plan: every demo gas from its invented line list in a folder beside the plan at the cell's
     * conditions and the instrument's resolution and apodization, on the axis of the processed spectra.
     */
    static String libraryPlanText(SpectralAxis axis, String lineLists) {
        StringBuilder s = new StringBuilder();
        s.append("library = ").append(LIBRARY_NAME).append('\n');
        s.append("temperature = ").append(number(DemoScenario.CELL_TEMPERATURE)).append('\n');
        s.append("pressure = ").append(number(DemoScenario.CELL_PRESSURE)).append('\n');
        s.append("path-length = ").append(number(DemoScenario.PATH_LENGTH)).append('\n');
        s.append("resolution = ").append(number(DemoScenario.RESOLUTION)).append('\n');
        s.append("apodization = norton-beer-medium\n");
        s.append("first-wavenumber = ").append(number(axis.first())).append('\n');
        s.append("step = ").append(number(axis.step())).append('\n');
        s.append("points = ").append(axis.size()).append('\n');
        s.append("uncertainty = 0.02\n");
        for (Gas gas : DemoScenario.GASES) {
            double nominal = gas == DemoScenario.SF6 ? 0.2 : gas.nominalPpm();
            StringBuilder amounts = new StringBuilder();
            for (double factor : referenceFactors(gas)) {
                amounts.append(amounts.length() == 0 ? "" : ", ")
                        .append(amount(nominal * factor * DemoScenario.PATH_LENGTH));
            }
            s.append("\n[compound]\nname = ").append(gas.name()).append("\ncas = ").append(gas.casNumber())
                    .append("\nformula = ").append(gas.formula()).append("\nmolar-mass = ")
                    .append(number(gas.molarMass())).append("\nline-list = ").append(lineLists).append('/')
                    .append(InventedLineLists.fileName(gas)).append("\npartition = table\npartition-table = ")
                    .append(lineLists).append('/').append(DemoPhysics.partitionTableName(gas)).append("\nppm-m = ")
                    .append(amounts)
                    .append('\n');
        }
        return s.toString();
    }

    /**
     * The QA plan: CTS of CO, spike of HCl with SF6 as tracer, zero gas for every analyte but the majors; the
     * zero readings of the analytes the client reports against limits, and NO, of the 12 zero-gas measurements
     * charted with the σ the demo instrument's performance sheet states (invented figures, as the instrument is),
     * their noise with limits from 8 readings, the path length of the 5 CTS measurements with limits from 3.
     * Limits from 8 readings of one day are tight: they flag a zero that drifts by a few hundredths of a ppm over
     * the day (the invented source sag), far inside its zero acceptance, which is why the zeros are charted with
     * the stated σ, as EN 14181:2014 QAL3 charts with S from QAL1 data (its table of contents).
     */
    static String qaPlanText() {
        return """
                library = library/library.manifest
                cts-compound = CO
                cts-ppm = %s
                cts-band = 2040..2240
                spike-analyte = HCl
                tracer = SF6
                spike-analyte-ppm = %s
                spike-tracer-ppm = %s
                analytes = CO, NO, N2O, NH3, HCl, CH4
                noise-region = 2450..2600
                maximum-noise = 2e-3
                background-age-limit = 24 h

                [chart]
                readings = Zero CO, Zero NO, Zero NH3, Zero HCl, Noise level
                baseline = 8
                stated-sigma = Zero CO 0.03 ppm, Zero NO 0.05 ppm, Zero NH3 0.03 ppm, Zero HCl 0.05 ppm
                sigma-source = the demo instrument's stated figures (invented performance sheet TG-PS-12 of the \
                demo analyser, repeatability standard deviation at zero)

                [chart]
                readings = CTS path length
                baseline = 3
                """.formatted(number(DemoCampaignFiles.CTS_CO_PPM), number(DemoCampaignFiles.SPIKE_HCL_PPM),
                number(DemoCampaignFiles.SPIKE_SF6_PPM));
    }

    /**
     * The report plan: the invented client's campaign, the EU emission basis (273.15 K, 101.3 kPa, 11 % O2 dry),
     * the O2 analyser's file, the budget, the limits, and the fit of the sample in the middle of the morning CO
     * upset as the example.
     *
     * @param o2File the O2 analyser's file, relative to the plans
     * @param qaPlan the QA plan, whose control charts the report draws, relative to the plans
     */
    static String reportPlanText(String o2File, String qaPlan) {
        return """
                report-id = FRR-2026-031
                client = %s
                first-day = 2026-03-17
                last-day = 2026-03-17
                issued = 2026-03-19T00:00:00Z
                standard-temperature = 273.15
                standard-pressure = 101.3
                reference-o2 = 11
                o2-guard = 20
                o2-file = %s
                o2-channel = O2
                o2-uncertainty = 0.2
                water = H2O
                cell-temperature = %s
                cell-pressure = %s
                reference-uncertainty = 0.02
                path-uncertainty = 0.05
                temperature-uncertainty = 2
                pressure-uncertainty = 0.5
                periods = 30 min, 1 d
                example-fit = 2026-03-17T07:10:30Z CO morning upset
                qa-plan = %s

                [compound]
                name = CO
                molar-mass = 28.010
                limit = 100 per 30 min
                limit = 50 per 1 d

                [compound]
                name = HCl
                molar-mass = 36.461
                limit = 60 per 30 min
                limit = 10 per 1 d

                [compound]
                name = NH3
                molar-mass = 17.031
                limit = 10 per 1 d

                [compound]
                name = NO
                molar-mass = 30.006

                [compound]
                name = N2O
                molar-mass = 44.013

                [compound]
                name = CH4
                molar-mass = 16.043
                """.formatted(DemoScenario.CLIENT, o2File,
                number(DemoScenario.CELL_TEMPERATURE), number(DemoScenario.CELL_PRESSURE), qaPlan);
    }

    /** The transform of the demo instrument's double-sided interferograms, as the method file states it. */
    public static TransformSettings transform() {
        try {
            return MethodDefinition.parse(methodText(), Path.of("demo.method")).transform();
        } catch (FileFormatException e) {
            throw new IllegalStateException("the demo method text is malformed: " + e.getMessage(), e);
        }
    }

    /**
     * Synthetic references of every demo gas on the axis of the processed spectra, made by the library synthesis
     * of the demo's library plan from the line lists the physics was read from.
     */
    public static ReferenceLibrary library(DemoPhysics physics, SpectralAxis axis) {
        try {
            return LibrarySynthesis.run(plan(physics.lineListFolder(), axis), ProgressListener.NONE,
                    new CancellationFlag());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The library plan as it lies beside the folder of line lists. */
    static LibraryPlan plan(Path lineLists, SpectralAxis axis) throws FileFormatException {
        Path folder = lineLists.toAbsolutePath();
        return LibraryPlan.parse(libraryPlanText(axis, folder.getFileName().toString()),
                folder.resolveSibling("library.plan"));
    }

    /** The quantification method of the method file over a library made by {@link #library}. */
    public static QuantificationMethod method(ReferenceLibrary library) {
        try {
            return MethodDefinition.parse(methodText(), Path.of("demo.method")).build(library);
        } catch (FileFormatException e) {
            throw new IllegalStateException("the demo method does not fit its library: " + e.getMessage(), e);
        }
    }

    /**
     * An amount as the lab writes it in a plan, to six significant digits: 12 ppm x 0.5 x 6.4 m is 38.4, not the
     * 38.400000000000006 of double arithmetic. The plan's amount is the reference's amount from then on.
     */
    static String amount(double value) {
        return new BigDecimal(value).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }

    /** Plain decimal with every digit a double needs, so that a plan read back gives the same numbers. */
    static String number(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? String.format(Locale.ROOT, "%.1f", value)
                : Double.toString(value);
    }
}
