package org.tracegas.report.campaign;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.DoubleSummaryStatistics;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;

import org.tracegas.model.ResultConditions;
import org.tracegas.model.ResultFlag;
import org.tracegas.qa.basis.Averaging;
import org.tracegas.qa.basis.ConditionsCorrection;
import org.tracegas.qa.basis.DetectionLimitConvention;
import org.tracegas.qa.basis.EmissionLimit;
import org.tracegas.qa.basis.GasReading;
import org.tracegas.qa.basis.LimitComparison;
import org.tracegas.qa.basis.PeriodAverage;
import org.tracegas.qa.basis.ReportingBasis;
import org.tracegas.qa.basis.TimedValue;
import org.tracegas.qa.basis.ValidityRule;
import org.tracegas.qa.campaign.QaControlCharts;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.MethodDetectionLimit;
import org.tracegas.qa.control.ChartEvaluation;
import org.tracegas.qa.uncertainty.BasisConversion;
import org.tracegas.qa.uncertainty.FtirResultBudget;
import org.tracegas.qa.uncertainty.UncertaintyBudget;
import org.tracegas.report.Campaign;
import org.tracegas.report.LibraryVersion;
import org.tracegas.report.MethodVersion;
import org.tracegas.report.PdfReportWriter;
import org.tracegas.report.Plot;
import org.tracegas.report.QaLine;
import org.tracegas.report.ReportContent;
import org.tracegas.report.ResultRow;
import org.tracegas.report.Series;
import org.tracegas.report.SpectrumFit;
import org.tracegas.report.UncertaintyTable;

/**
 * Assembles the report of a campaign from stored results: each compound converted to the reporting basis
 * (dry gas, reference O2, mg/m³ at standard conditions) minute by minute, averaged over the reporting periods
 * with flagged minutes left out and counted and the minimum-data rule, compared with the client's limits (a
 * period short of data is not assessed), with an expanded uncertainty (k = 2) whose random part (the fit of each
 * minute) averages down and whose systematic part (reference, path, cell conditions, H2O and O2 of the
 * conversion) does not; the report shows the GUM budget of the minute of largest relative uncertainty.
 */
public final class CampaignReportBuilder {

    /** A compound to report: its name and molar mass, and the client's limits for it. */
    public record Reported(String compound, double molarMass, List<EmissionLimit> limits) {
    }

    /** The water of a minute, measured or stated, ppm with its standard uncertainty. */
    private record Water(double ppm, double uncertaintyPpm) {
    }

    /** Fit flags that make a minute unusable for averages. */
    private static final Set<ResultFlag> EXCLUDING = EnumSet.of(ResultFlag.SATURATED, ResultFlag.NOT_CONVERGED,
            ResultFlag.HIGH_RESIDUAL, ResultFlag.BACKGROUND_TOO_OLD, ResultFlag.QA_FAILED);
    private static final String EXCLUSION_RULE = "Minutes flagged saturated, not converged, high residual, "
            + "background too old or QA failed, and minutes whose O2 lies at the guard of the reference-O2 "
            + "correction, are left out of the averages and counted in the availability (common practice, no "
            + "source).";
    private static final String UNCERTAINTY_RULE = "U of an average (k = 2) combines the random part of the minutes "
            + "(spectral fit), which averages down as sqrt(sum u^2)/n, with the systematic part (reference, path, "
            + "cell conditions, H2O and O2), which does not, taken fully correlated (JCGM 100:2008 5.2.2, r = 1).";

    private static final String CORRECTION_RULE = "Each result is corrected from its references' cell to the "
            + "sample cell: " + ConditionsCorrection.RULE + ". It is stated once for the results table: the range of "
            + "the factor applied, where the cell temperature, pressure and path came from, and the noise factor F of "
            + "the transform, whose square root widens the fit's uncertainty (F = 1 for absorbance imported as such, "
            + "whose transform is unknown); each row's own is in the export, column cell_correction.";

    private final ReportingBasis basis;
    private final FtirResultBudget budget;
    private final double cellTemperatureK;
    private final double cellPressureKPa;
    private final double o2UncertaintyPercent;

    /**
     * @param o2UncertaintyPercent standard uncertainty of the side channel's O2 reading, % vol
     */
    public CampaignReportBuilder(ReportingBasis basis, FtirResultBudget budget, double cellTemperatureK,
            double cellPressureKPa, double o2UncertaintyPercent) {
        this.basis = basis;
        this.budget = budget;
        this.cellTemperatureK = cellTemperatureK;
        this.cellPressureKPa = cellPressureKPa;
        if (!(o2UncertaintyPercent >= 0 && Double.isFinite(o2UncertaintyPercent))) {
            throw new IllegalArgumentException("o2UncertaintyPercent must be non-negative and finite, was "
                    + o2UncertaintyPercent);
        }
        this.o2UncertaintyPercent = o2UncertaintyPercent;
    }

    /**
     * @param qa            the campaign's QA check outcomes, the charts' own among them
     * @param charts        the control charts of repeated QA readings, drawn in the report
     * @param o2PercentWet  O2 of the side channel at a time, %vol on wet gas
     * @param moisture      the water result (the FTIR measures the moisture itself), or the moisture the plan
     *                      states where the method measures no water, which the report then states
     */
    public ReportContent build(Campaign campaign, MethodVersion method, LibraryVersion library,
            List<CheckOutcome> qa, List<ChartEvaluation> charts, MinuteSeries series, List<Reported> reported,
            Moisture moisture, Function<Instant, Double> o2PercentWet, List<Duration> periods,
            SpectrumFit exampleFit) {
        ReportContent.Builder b = ReportContent.builder(campaign).method(method).library(library);
        qa.forEach(o -> b.qa(QaLine.of(o)));
        Map<String, MethodDetectionLimit> mdl = new java.util.HashMap<>();
        for (MethodDetectionLimit l : MethodDetectionLimit.fromOutcomes(qa)) {
            b.detectionLimit(l);
            mdl.put(l.analyte(), l);
        }
        charts.forEach(c -> b.controlChart(QaControlCharts.plot(c)));
        // the water of each minute, ppm with its standard uncertainty
        Map<Instant, Water> water = new java.util.HashMap<>();
        List<MinuteSeries.Point> timeline = new ArrayList<>();
        if (moisture.isStated()) {
            b.averagingRule(moisture.statement());
            for (Reported r : reported) {
                for (MinuteSeries.Point p : series.compound(r.compound())) {
                    water.put(p.time(), new Water(moisture.statedPercent() * 1e4,
                            moisture.statedUncertaintyPercent() * 1e4));
                    timeline.add(p);
                }
            }
            timeline.sort(java.util.Comparator.comparing(MinuteSeries.Point::time));
        } else {
            timeline = series.compound(moisture.compound());
            for (MinuteSeries.Point p : timeline) {
                water.put(p.time(), new Water(p.ppm(), p.uncertainty()));
            }
        }
        Instant origin = timeline.isEmpty() ? campaign.issued() : timeline.get(0).time();
        List<MinuteSeries.Point> everyPoint = new ArrayList<>();
        Set<String> rowCorrections = new java.util.HashSet<>();
        for (Reported r : reported) {
            List<MinuteSeries.Point> points = series.compound(r.compound());
            everyPoint.addAll(points);
            List<TimedValue> converted = new ArrayList<>();
            Map<Instant, Double> perPpmOfMinute = new java.util.HashMap<>();
            double relativeU = 0;
            UncertaintyBudget worst = null;
            Instant worstTime = null;
            for (MinuteSeries.Point p : points) {
                Water w = water.get(p.time());
                if (w == null) {
                    continue;
                }
                double h2o = w.ppm() / 1e6;
                double o2Wet = o2PercentWet.apply(p.time());
                double o2Dry = o2Wet / (1 - h2o);
                GasReading reading = new GasReading(p.time(), p.ppm(), h2o, o2Dry);
                // the basis factor from a unit reading: exact, the same conversion applied to every minute
                Optional<TimedValue> perPpm = basis.convert(new GasReading(p.time(), 1.0, h2o, o2Dry), r.molarMass());
                if (perPpm.isEmpty()) {
                    converted.add(new TimedValue(p.time(), 0.0, 0, 0, 0, "O2 guard"));
                    continue;
                }
                double f = perPpm.get().value();
                perPpmOfMinute.put(p.time(), f);
                BasisConversion conversion = basis.oxygen().map(o -> new BasisConversion(h2o, w.uncertaintyPpm() / 1e6,
                        o2Wet, o2UncertaintyPercent, true, o.referencePercent()))
                        .orElseGet(() -> BasisConversion.dryOnly(h2o, w.uncertaintyPpm() / 1e6));
                // at the cell the result was corrected to, so that the budget's model is the correction's; a
                // result without conditions at the plan's cell and the method's path
                ResultConditions cell = p.conditions();
                UncertaintyBudget u = cell == null
                        ? budget.budgetOnBasis(r.compound(), p.ppm(), p.uncertainty(), cellTemperatureK,
                                cellPressureKPa, conversion)
                        : budget.budgetOnBasis(r.compound(), p.ppm(), p.uncertainty(), cell.pathM(),
                                cell.cellTemperatureK(), cell.cellPressureKPa(), conversion);
                // from ppm on the basis (the budget's unit) to mg/m³: the same exact factor as the value
                double toMass = f / conversion.factor();
                converted.add(new TimedValue(p.time(), basis.convert(reading, r.molarMass()).orElseThrow().value(),
                        toMass * u.combinedStandardUncertainty(FtirResultBudget::random),
                        toMass * u.combinedStandardUncertainty(c -> !FtirResultBudget.random(c)),
                        f * Math.max(0, p.detectionLimit()), exclusion(p.flags())));
                if (p.ppm() != 0 && u.relativeExpandedPercent() > relativeU) {
                    relativeU = u.relativeExpandedPercent();
                    worst = u;
                    worstTime = p.time();
                }
            }
            if (worst != null) {
                b.budget(UncertaintyTable.of(r.compound() + " at " + worstTime + ", the minute of largest relative U",
                        worst));
            }
            for (Duration period : periods) {
                Averaging averaging = new Averaging(period, Duration.ofMinutes(1), ValidityRule.commonPractice(),
                        DetectionLimitConvention.AS_MEASURED, ZoneOffset.UTC);
                b.averagingRule(averaging.validityRule().statement() + " (" + averaging.validityRule().source()
                        + ").");
                b.averagingRule("Values below the detection limit: " + averaging.convention().statement()
                        + " (common practice, no source).");
                b.averagingRule(EXCLUSION_RULE);
                b.averagingRule(UNCERTAINTY_RULE);
                b.averagingRule(CORRECTION_RULE);
                List<PeriodAverage> averages = averaging.average(converted);
                EmissionLimit limit = r.limits().stream().filter(l -> l.period().equals(period)).findFirst()
                        .orElse(null);
                LimitComparison comparison = new LimitComparison(0);
                for (PeriodAverage a : averages) {
                    if (a.count() == 0) {
                        continue; // nothing to average: the availability of the neighbours shows the gap
                    }
                    List<String> flags = new ArrayList<>();
                    flags.add(String.format(Locale.ROOT, "availability %.0f %% (%d of %d%s)", a.capturePercent(),
                            a.count(), a.expected(), a.excluded() > 0 ? ", " + a.excluded() + " excluded" : ""));
                    if (!a.valid()) {
                        flags.add("invalid: too few values");
                    }
                    if (a.belowDetectionLimit() > 0) {
                        flags.add(a.belowDetectionLimit() + " below detection limit");
                    }
                    MethodDetectionLimit limitOfDetection = mdl.get(r.compound());
                    if (limitOfDetection != null) {
                        b.averagingRule(PdfReportWriter.BELOW_MDL_CONVENTION);
                        belowMdl(limitOfDetection, perPpmOfMinute, a, period).ifPresent(flags::add);
                    }
                    String rowCorrection = corrections(points, a.start(), a.start().plus(period));
                    rowCorrections.add(rowCorrection);
                    b.result(new ResultRow(r.compound(), label(period), a.start(), a.mean(),
                            2.0 * a.combinedUncertainty(), "mg/m³", flags,
                            limit == null ? OptionalDouble.empty() : OptionalDouble.of(limit.value()),
                            comparison.status(limit, a), rowCorrection));
                }
            }
            List<TimedValue> used = converted.stream().filter(v -> !v.excluded()).toList();
            double[] hours = new double[used.size()];
            double[] values = new double[used.size()];
            for (int i = 0; i < hours.length; i++) {
                hours[i] = Duration.between(origin, used.get(i).time()).toSeconds() / 3600.0;
                values[i] = used.get(i).value();
            }
            b.timeSeries(new Plot(r.compound() + ", 1-minute values on the reporting basis", "hours since "
                    + origin, "mg/m³", List.of(new Series(r.compound(), hours, values)), false));
        }
        if (rowCorrections.size() > 1) {
            // the report says the rows differ; this gives their span in one line
            b.averagingRule("Cell correction over every row of the results table: " + corrections(everyPoint,
                    Instant.MIN, Instant.MAX) + ".");
        }
        if (exampleFit != null) {
            b.spectrum(exampleFit);
        }
        return b.build();
    }

    /**
     * The flag of an average below the MDL, which is converted to the reporting basis with the mean factor of the
     * period's converted minutes; empty when the average is not below it.
     */
    static Optional<String> belowMdl(MethodDetectionLimit mdl, Map<Instant, Double> perPpmOfMinute, PeriodAverage a,
            Duration period) {
        Instant end = a.start().plus(period);
        OptionalDouble factor = perPpmOfMinute.entrySet().stream()
                .filter(e -> !e.getKey().isBefore(a.start()) && e.getKey().isBefore(end))
                .mapToDouble(Map.Entry::getValue).average();
        if (factor.isEmpty()) {
            return Optional.empty();
        }
        double limit = mdl.ppm() * factor.getAsDouble();
        return a.mean() < limit ? Optional.of(String.format(Locale.ROOT, "%s %.3g mg/m³", ResultRow.BELOW_MDL,
                limit)) : Optional.empty();
    }

    /**
     * The corrections applied to the minutes of a period: the range of the factor, where the cell's temperature,
     * pressure and path came from, and the range of the noise factor F, for example "x1.0012 (T header, p header,
     * path nominal); F 2.378".
     */
    static String corrections(List<MinuteSeries.Point> points, Instant from, Instant to) {
        DoubleSummaryStatistics factor = new DoubleSummaryStatistics();
        DoubleSummaryStatistics noise = new DoubleSummaryStatistics();
        Set<String> origins = new java.util.TreeSet<>();
        int uncorrected = 0;
        for (MinuteSeries.Point p : points) {
            if (p.time().isBefore(from) || !p.time().isBefore(to)) {
                continue;
            }
            ResultConditions c = p.conditions();
            if (c == null) {
                uncorrected++;
                continue;
            }
            factor.accept(c.correctionFactor());
            noise.accept(c.noiseFactor());
            origins.add("T " + c.temperatureOrigin() + ", p " + c.pressureOrigin() + ", path " + c.pathOrigin());
        }
        if (factor.getCount() == 0) {
            return "not corrected to the sample cell";
        }
        return String.format(Locale.ROOT, "x%s (%s); F %s%s", range(factor, "%.4f"),
                String.join("; ", origins), range(noise, "%.3f"),
                uncorrected > 0 ? "; " + uncorrected + " not corrected" : "");
    }

    private static String range(DoubleSummaryStatistics s, String format) {
        String low = String.format(Locale.ROOT, format, s.getMin());
        String high = String.format(Locale.ROOT, format, s.getMax());
        return low.equals(high) ? low : low + ".." + high;
    }

    /** Why a stored minute is left out of the averages, from its flags; empty if it is used. */
    private static String exclusion(Set<ResultFlag> flags) {
        List<String> reasons = new ArrayList<>();
        for (ResultFlag f : flags) {
            if (EXCLUDING.contains(f)) {
                reasons.add(f.getLiteral().toLowerCase(Locale.ROOT).replace('_', ' '));
            }
        }
        return reasons.isEmpty() ? "" : "flagged: " + String.join(", ", reasons);
    }

    private static String label(Duration period) {
        long minutes = period.toMinutes();
        return minutes % 1440 == 0 ? (minutes / 1440) + " d" : minutes % 60 == 0 ? (minutes / 60) + " h" : minutes + " min";
    }
}
