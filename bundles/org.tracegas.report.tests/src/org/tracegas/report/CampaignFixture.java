package org.tracegas.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Random;

import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.qa.basis.Averaging;
import org.tracegas.qa.basis.DetectionLimitConvention;
import org.tracegas.qa.basis.EmissionLimit;
import org.tracegas.qa.basis.Exceedance;
import org.tracegas.qa.basis.GasReading;
import org.tracegas.qa.basis.LimitComparison;
import org.tracegas.qa.basis.LimitStatus;
import org.tracegas.qa.basis.OxygenCorrection;
import org.tracegas.qa.basis.PeriodAverage;
import org.tracegas.qa.basis.ReportingBasis;
import org.tracegas.qa.basis.StandardConditions;
import org.tracegas.qa.basis.TimedValue;
import org.tracegas.qa.basis.ValidityRule;
import org.tracegas.qa.checks.AbsorbanceRegion;
import org.tracegas.qa.checks.BackgroundAgeCheck;
import org.tracegas.qa.checks.CtsBand;
import org.tracegas.qa.checks.CtsDriftCheck;
import org.tracegas.qa.checks.DetectionLimit;
import org.tracegas.qa.checks.NoiseCheck;
import org.tracegas.qa.checks.PathLengthCheck;
import org.tracegas.qa.checks.SpikeGas;
import org.tracegas.qa.checks.SpikeRecoveryCheck;
import org.tracegas.qa.checks.SpikedSample;
import org.tracegas.qa.checks.ZeroSpanCheck;
import org.tracegas.qa.control.ChartEvaluation;
import org.tracegas.qa.control.ControlChartCheck;
import org.tracegas.qa.control.ShewhartChart;
import org.tracegas.qa.uncertainty.BasisConversion;
import org.tracegas.qa.uncertainty.FtirResultBudget;
import org.tracegas.qa.uncertainty.UncertaintyBudget;

/**
 * A realistic, invented campaign at a cement kiln: two days of synthetic one-minute FTIR results run
 * through the QA and reporting-basis code, with QA checks, limits, plots and a fitted spectrum. Random
 * numbers come from a fixed seed, so the same fixture is built every time.
 */
final class CampaignFixture {

    static final Instant START = Instant.parse("2026-03-02T00:00:00Z");
    static final String CLIENT = "Pellworth Minerals Ltd";
    static final String PLANT = "Cobbet Ridge Cement Works";
    static final double CO_HALF_HOUR_LIMIT = 150.0;

    private static final ReportingBasis BASIS = new ReportingBasis(StandardConditions.EU_EMISSIONS,
            new OxygenCorrection(10, 20));
    private static final Map<String, Double> MOLAR_MASS = Map.of("CO", 28.010, "HCl", 36.461, "SO2", 64.066,
            "NH3", 17.031);
    private static final FtirResultBudget BUDGET = new FtirResultBudget(0.02, 5.0, 0.05, 1.5, 0.3);

    private CampaignFixture() {
    }

    static Campaign campaign() {
        return new Campaign("PMR-2026-014", CLIENT, PLANT, "Kiln 2 main stack", LocalDate.of(2026, 3, 2),
                LocalDate.of(2026, 3, 3), Instant.parse("2026-03-09T14:30:00Z"), BASIS.describe());
    }

    /** The content without signatures. */
    static ReportContent.Builder unsigned() {
        ReportContent.Builder b = ReportContent.builder(campaign());
        b.method(new MethodVersion("Kiln stack CO/HCl/SO2/NH3 in H2O and CO2", "3", sha256("method kiln-stack v3")));
        b.method(new MethodVersion("CTS ethylene path check", "1", sha256("method cts v1")));
        b.library(new LibraryVersion("Tracegas Workbench", "0.1.0"));
        b.library(new LibraryVersion("Reference spectra set RS-7 (1 cm-1, 165 C)", "2025-11"));
        b.library(new LibraryVersion("Apache PDFBox", "3.0.5"));
        qaChecks(b);

        Random rnd = new Random(20260302L);
        List<GasReading> co = new ArrayList<>();
        List<GasReading> hcl = new ArrayList<>();
        List<GasReading> so2 = new ArrayList<>();
        List<GasReading> nh3 = new ArrayList<>();
        for (int m = 0; m < 2 * 24 * 60; m++) {
            if (m >= 615 && m < 627) {
                continue; // analyser purge at 10:15-10:27 on day 1: that half hour keeps 18 of 30 values
            }
            Instant t = START.plus(Duration.ofMinutes(m));
            double h2o = 0.11 + 0.01 * Math.sin(m / 300.0) + 0.002 * rnd.nextGaussian();
            double o2 = 8.5 + 0.6 * Math.sin(m / 170.0) + 0.15 * rnd.nextGaussian();
            double coUpset = m >= 1260 && m < 1300 ? 60 : 0; // firing upset on day 1, 21:00-21:40
            co.add(new GasReading(t, 70 + 12 * Math.sin(m / 90.0) + coUpset + 3 * rnd.nextGaussian(), h2o, o2));
            hcl.add(new GasReading(t, 4.2 + 0.8 * Math.sin(m / 240.0) + 0.25 * rnd.nextGaussian(), h2o, o2));
            so2.add(new GasReading(t, 9.0 + 2.0 * Math.sin(m / 400.0) + 0.4 * rnd.nextGaussian(), h2o, o2));
            nh3.add(new GasReading(t, 6.5 + 1.0 * Math.cos(m / 350.0) + 0.3 * rnd.nextGaussian(), h2o, o2));
        }
        Averaging halfHour = new Averaging(Duration.ofMinutes(30), Duration.ofMinutes(1),
                Averaging.COMMON_PRACTICE_MINIMUM_FRACTION, ZoneOffset.UTC);
        Averaging daily = new Averaging(Duration.ofDays(1), Duration.ofMinutes(30),
                ValidityRule.iedDailyFromHalfHours(), DetectionLimitConvention.AS_MEASURED, ZoneOffset.UTC);
        EmissionLimit coLimit = new EmissionLimit("CO", CO_HALF_HOUR_LIMIT, BASIS.describe(), Duration.ofMinutes(30));

        List<TimedValue> coBasis = BASIS.convertAll(co, MOLAR_MASS.get("CO"));
        List<PeriodAverage> coHalfHours = halfHour.average(coBasis);
        List<Exceedance> coExceeded = new LimitComparison(0).exceedances(coLimit, coHalfHours);
        addRows(b, "CO", "30 min", coHalfHours, co, OptionalDouble.of(CO_HALF_HOUR_LIMIT), coExceeded);
        List<TimedValue> hclBasis = BASIS.convertAll(hcl, MOLAR_MASS.get("HCl"));
        List<PeriodAverage> hclHalfHours = halfHour.average(hclBasis);
        addRows(b, "HCl", "30 min", hclHalfHours, hcl, OptionalDouble.empty(), List.of());

        Map<String, Double> dailyLimits = Map.of("CO", 300.0, "HCl", 10.0, "SO2", 50.0, "NH3", 30.0);
        for (String compound : List.of("CO", "HCl", "SO2", "NH3")) {
            List<GasReading> readings = switch (compound) {
                case "CO" -> co;
                case "HCl" -> hcl;
                case "SO2" -> so2;
                default -> nh3;
            };
            List<TimedValue> validHalfHours = halfHour.average(BASIS.convertAll(readings, MOLAR_MASS.get(compound)))
                    .stream().filter(PeriodAverage::valid).map(PeriodAverage::asTimedValue).toList();
            List<PeriodAverage> days = daily.average(validHalfHours);
            EmissionLimit limit = new EmissionLimit(compound, dailyLimits.get(compound), BASIS.describe(),
                    Duration.ofDays(1));
            addRows(b, compound, "day", days, readings, OptionalDouble.of(limit.value()),
                    new LimitComparison(0).exceedances(limit, days));
        }

        b.timeSeries(timePlot("CO, 1-minute values and 30-minute averages", coBasis, coHalfHours,
                CO_HALF_HOUR_LIMIT));
        b.timeSeries(timePlot("HCl, 1-minute values and 30-minute averages", hclBasis, hclHalfHours, 0));
        b.spectrum(hclSpectrum(new Random(7L)));
        b.controlChart(zeroChart(b));
        b.budget(UncertaintyTable.of("CO at 70 ppm wet, 11 % H2O, 8.5 % O2 dry", BUDGET.budgetOnBasis("CO", 70,
                2.8, 453.15, 101.3, new BasisConversion(0.11, 0.004, 8.5, 0.2, false, 10))));
        b.caution("Kiln 2 ran with a firing upset on 2026-03-02 from 21:00 to 21:40 UTC (plant log).");
        return b;
    }

    /** The content with a review signature over its own hash and no approval. */
    static ReportContent reviewed() {
        ReportContent c = unsigned().build();
        return c.withSignature(signature("Dr. Imogen Hartle", Instant.parse("2026-03-10T09:12:00Z"),
                SignatureMeaning.REVIEWED, c.contentHash()));
    }

    /** A signature as the audit trail returns it, on report PMR-2026-014's content of the given hash. */
    static Signature signature(String printedName, Instant signedAt, SignatureMeaning meaning, String contentSha256) {
        return new Signature(1, "rec-1", "signer", printedName, signedAt, meaning, "report", "PMR-2026-014", 0,
                contentSha256);
    }

    static final List<String> ZERO_ANALYTES = List.of("CO", "HCl", "SO2", "NH3", "NO", "N2O");
    /** Zero gas every 4 hours over the two days. */
    static final int ZERO_TIMES = 12;
    static final int CTS_TIMES = 5;
    /** The NH3 zero readings that lie outside their limits: the line was not fully purged of the span gas. */
    static final List<Integer> FAILED_NH3_ZEROS = List.of(5, 9);

    private static void qaChecks(ReportContent.Builder b) {
        CtsBand reference = new CtsBand(0.412, 100.0, 298.15, 101.325);
        PathLengthCheck path = new PathLengthCheck(5.0, PathLengthCheck.COMMON_PRACTICE_TOLERANCE_PERCENT);
        double[] ctsAreas = {0.419, 0.416, 0.421, 0.414, 0.408};
        for (double area : ctsAreas) {
            b.qa(QaLine.of(path.evaluate(new CtsBand(area, 100.0, 438.0, 101.1), reference, 3.39)));
        }
        b.qa(QaLine.of(new CtsDriftCheck(CtsDriftCheck.METHOD_320_TOLERANCE_PERCENT).evaluate(ctsAreas[0],
                ctsAreas[ctsAreas.length - 1])));
        b.qa(QaLine.of(new SpikeRecoveryCheck(SpikeRecoveryCheck.METHOD_320_LIMITS).evaluate("HCl",
                new SpikeGas(4.0, 98.0), List.of(new SpikedSample(0.41, 13.6, 4.3), new SpikedSample(0.40, 13.1, 4.2),
                        new SpikedSample(0.42, 13.9, 4.4)))));
        double[] wn = new double[400];
        double[] zero = new double[400];
        Random r = new Random(11L);
        NoiseCheck noise = new NoiseCheck(new AbsorbanceRegion(2550, 2650), 5e-4);
        Map<String, Double> detection = Map.of("HCl", 0.06, "SO2", 0.11, "NH3", 0.045, "NO", 0.12, "N2O", 0.011);
        for (int t = 0; t < ZERO_TIMES; t++) {
            for (String analyte : ZERO_ANALYTES) {
                if (analyte.equals("CO")) {
                    // the readings the CO zero chart shows, judged against the test plan's fixed ±1 ppm
                    b.qa(QaLine.of(new ZeroSpanCheck(1.0, 2.0).zero("CO", CO_ZERO_READINGS[t])));
                    continue;
                }
                // a zero within twice the 3-sigma detection limit of that spectrum passes, so limits differ
                double dl = detection.get(analyte) * (1 + 0.1 * r.nextGaussian());
                double reading = analyte.equals("NH3") && FAILED_NH3_ZEROS.contains(t + 1) ? 2.6 * dl
                        : 0.4 * dl * r.nextGaussian();
                b.qa(QaLine.of(new ZeroSpanCheck(2 * dl, 2.0).zero(analyte, reading)));
            }
            for (int i = 0; i < wn.length; i++) {
                wn[i] = 2500 + 0.5 * i;
                zero[i] = 1.2e-4 * r.nextGaussian();
            }
            b.qa(QaLine.of(noise.evaluate(wn, zero)));
        }
        b.qa(QaLine.of(DetectionLimit.fromNoise("HCl", noise.rmsNoise(wn, zero), 2.1e-3).check(0.5)));
        b.qa(QaLine.of(new BackgroundAgeCheck(Duration.ofHours(24)).evaluate(Instant.parse("2026-03-02T06:40:00Z"),
                Instant.parse("2026-03-02T23:59:00Z"))));
        ZeroSpanCheck zs = new ZeroSpanCheck(1.0, 2.0);
        b.qa(QaLine.of(zs.span("CO", 80.9, 80.2)));
        b.qa(QaLine.of(zs.span("NH3", 48.1, 49.7)));
    }

    /** The zero readings of the CO channel over this campaign, in ppm (invented: a slow upward drift). */
    private static final double[] CO_ZERO_READINGS = {0.03, 0.10, -0.04, 0.07, 0.12, 0.18, 0.22, 0.19, 0.26, 0.31,
        0.28, 0.35};

    /**
     * The zero readings of the CO channel over this campaign's 12 checks against the latest 10 of earlier
     * campaigns (invented readings), as a chart with its check line.
     */
    private static Plot zeroChart(ReportContent.Builder b) {
        double[] earlier = {0.12, -0.05, 0.08, 0.02, -0.10, 0.04, 0.15, -0.02, 0.06, -0.07};
        double[] readings = CO_ZERO_READINGS;
        ChartEvaluation e = new ControlChartCheck("Zero CO", "ppm", 10).evaluate(earlier, readings).orElseThrow();
        b.qa(QaLine.of(e.outcome()));
        double[] x = new double[readings.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = i + 1;
        }
        double[] sx = e.signals().stream().mapToDouble(s -> s.index() + 1).distinct().toArray();
        double[] sy = java.util.Arrays.stream(sx).map(v -> readings[(int) v - 1]).toArray();
        ShewhartChart c = e.chart();
        return new Plot("Zero CO, readings of this campaign", "Reading", "ppm", List.of(new Series("reading", x,
                readings), Series.points("signal", sx, sy)), false, List.of(new Level("centre", c.centre()),
                new Level("+3 sigma", c.upperActionLimit()), new Level("-3 sigma", c.lowerActionLimit()),
                new Level("+2 sigma", c.upperWarningLimit()), new Level("-2 sigma", c.lowerWarningLimit())));
    }

    private static void addRows(ReportContent.Builder b, String compound, String period, List<PeriodAverage> averages,
            List<GasReading> readings, OptionalDouble limit, List<Exceedance> exceeded) {
        double ppmMean = readings.stream().mapToDouble(GasReading::wetPpm).average().orElseThrow();
        UncertaintyBudget budget = BUDGET.budget(compound, ppmMean, 0.04 * ppmMean + 0.1, 453.15, 101.3);
        double relative = budget.expandedUncertainty() / budget.value();
        for (PeriodAverage a : averages) {
            List<String> flags = new ArrayList<>();
            if (!a.valid()) {
                flags.add(String.format(java.util.Locale.ROOT, "invalid: %.0f %% data", a.capturePercent()));
            }
            boolean over = exceeded.stream().anyMatch(e -> e.average().start().equals(a.start()));
            LimitStatus status = limit.isEmpty() ? LimitStatus.NO_LIMIT : !a.valid() ? LimitStatus.NOT_ASSESSED
                    : over ? LimitStatus.EXCEEDED : LimitStatus.WITHIN;
            b.result(new ResultRow(compound, period, a.start(), a.mean(), relative * a.mean(), "mg/m³", flags, limit,
                    status));
        }
    }

    private static Plot timePlot(String title, List<TimedValue> values, List<PeriodAverage> averages, double limit) {
        double[] x = values.stream().mapToDouble(v -> hours(v.time())).toArray();
        double[] y = values.stream().mapToDouble(TimedValue::value).toArray();
        double[] ax = averages.stream().mapToDouble(a -> hours(a.start()) + 0.25).toArray();
        double[] ay = averages.stream().mapToDouble(PeriodAverage::mean).toArray();
        List<Series> s = new ArrayList<>(List.of(new Series("1-minute", x, y),
                new Series("30-minute average", ax, ay)));
        if (limit > 0) {
            s.add(new Series("limit (30 min)", new double[] {0, 48}, new double[] {limit, limit}));
        }
        return new Plot(title, "Hours since 2026-03-02 00:00 UTC", "mg/m³ (basis)", s, false);
    }

    private static double hours(Instant t) {
        return Duration.between(START, t).toSeconds() / 3600.0;
    }

    /** Lorentzian lines near the HCl fundamental R-branch with noise; the fit misses a little of each line. */
    private static SpectrumFit hclSpectrum(Random r) {
        double[] centres = {2798.9, 2821.6, 2843.6, 2865.1, 2886.0, 2906.2, 2925.9, 2944.9, 2963.3, 2981.0};
        int n = 801;
        double[] wn = new double[n];
        double[] measured = new double[n];
        double[] fitted = new double[n];
        for (int i = 0; i < n; i++) {
            wn[i] = 2780 + 0.25 * i;
            double model = 0;
            for (int k = 0; k < centres.length; k++) {
                double d = (wn[i] - centres[k]) / 0.35;
                model += (0.02 + 0.012 * Math.sin(k * 0.7)) / (1 + d * d);
            }
            measured[i] = model + 0.002 + 4e-4 * r.nextGaussian();
            fitted[i] = 0.97 * model + 0.002;
        }
        return new SpectrumFit("HCl window 2780-2980 cm-1, 2026-03-02 21:14 UTC", wn, measured, fitted);
    }

    static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text.getBytes(
                    StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
