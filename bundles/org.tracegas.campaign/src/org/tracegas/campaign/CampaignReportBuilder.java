package org.tracegas.campaign;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.tracegas.qa.basis.Averaging;
import org.tracegas.qa.basis.EmissionLimit;
import org.tracegas.qa.basis.GasReading;
import org.tracegas.qa.basis.LimitComparison;
import org.tracegas.qa.basis.PeriodAverage;
import org.tracegas.qa.basis.ReportingBasis;
import org.tracegas.qa.basis.TimedValue;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.control.ChartEvaluation;
import org.tracegas.qa.uncertainty.BasisConversion;
import org.tracegas.qa.uncertainty.FtirResultBudget;
import org.tracegas.qa.uncertainty.UncertaintyBudget;
import org.tracegas.report.Campaign;
import org.tracegas.report.LibraryVersion;
import org.tracegas.report.MethodVersion;
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
 * with the minimum-data rule, compared with the client's limits, with an expanded uncertainty (k = 2) from
 * the result's GUM budget on the reporting basis (fit, reference, path, cell conditions, and the H2O and O2 of
 * the conversion), whose table the report shows for the minute of largest relative uncertainty.
 */
public final class CampaignReportBuilder {

    /** A compound to report: its name and molar mass, and the client's limits for it. */
    public record Reported(String compound, double molarMass, List<EmissionLimit> limits) {
    }

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
     * @param waterCompound name of the water result (the FTIR measures the moisture itself)
     */
    public ReportContent build(Campaign campaign, MethodVersion method, LibraryVersion library,
            List<CheckOutcome> qa, List<ChartEvaluation> charts, MinuteSeries series, List<Reported> reported,
            String waterCompound, Function<Instant, Double> o2PercentWet, List<Duration> periods,
            SpectrumFit exampleFit) {
        ReportContent.Builder b = ReportContent.builder(campaign).method(method).library(library);
        qa.forEach(o -> b.qa(QaLine.of(o)));
        charts.forEach(c -> b.controlChart(QaControlCharts.plot(c)));
        Map<Instant, MinuteSeries.Point> water = new java.util.HashMap<>();
        for (MinuteSeries.Point p : series.compound(waterCompound)) {
            water.put(p.time(), p);
        }
        Instant origin = series.compound(waterCompound).isEmpty() ? campaign.issued()
                : series.compound(waterCompound).get(0).time();
        for (Reported r : reported) {
            List<MinuteSeries.Point> points = series.compound(r.compound());
            List<GasReading> readings = new ArrayList<>();
            double relativeU = 0;
            UncertaintyBudget worst = null;
            Instant worstTime = null;
            for (MinuteSeries.Point p : points) {
                MinuteSeries.Point w = water.get(p.time());
                if (w == null) {
                    continue;
                }
                double h2o = w.ppm() / 1e6;
                double o2Wet = o2PercentWet.apply(p.time());
                readings.add(new GasReading(p.time(), p.ppm(), h2o, o2Wet / (1 - h2o)));
                if (p.ppm() != 0 && (basis.oxygen().isEmpty() || basis.oxygen().get().canCorrect(o2Wet / (1 - h2o)))) {
                    BasisConversion conversion = basis.oxygen().map(o -> new BasisConversion(h2o,
                            w.uncertainty() / 1e6, o2Wet, o2UncertaintyPercent, true, o.referencePercent()))
                            .orElseGet(() -> BasisConversion.dryOnly(h2o, w.uncertainty() / 1e6));
                    UncertaintyBudget u = budget.budgetOnBasis(r.compound(), p.ppm(), p.uncertainty(),
                            cellTemperatureK, cellPressureKPa, conversion);
                    if (u.relativeExpandedPercent() > relativeU) {
                        relativeU = u.relativeExpandedPercent();
                        worst = u;
                        worstTime = p.time();
                    }
                }
            }
            if (worst != null) {
                // the minute with the largest relative U sets the U of every average, so its budget is shown
                b.budget(UncertaintyTable.of(r.compound() + " at " + worstTime + ", the minute of largest relative U",
                        worst));
            }
            List<TimedValue> converted = basis.convertAll(readings, r.molarMass());
            for (Duration period : periods) {
                Averaging averaging = new Averaging(period, Duration.ofMinutes(1),
                        Averaging.COMMON_PRACTICE_MINIMUM_FRACTION, ZoneOffset.UTC);
                List<PeriodAverage> averages = averaging.average(converted);
                EmissionLimit limit = r.limits().stream().filter(l -> l.period().equals(period)).findFirst()
                        .orElse(null);
                LimitComparison comparison = new LimitComparison(0);
                for (PeriodAverage a : averages) {
                    boolean exceeded = limit != null && a.valid() && comparison.validatedValue(limit, a.mean()) > limit.value();
                    List<String> flags = new ArrayList<>();
                    if (!a.valid()) {
                        flags.add(String.format(java.util.Locale.ROOT, "invalid: %.0f %% data", a.capturePercent()));
                    }
                    b.result(new ResultRow(r.compound(), label(period), a.start(), a.mean(),
                            Math.abs(a.mean()) * relativeU / 100.0, "mg/m³", flags,
                            limit == null ? OptionalDouble.empty() : OptionalDouble.of(limit.value()), exceeded));
                }
            }
            double[] hours = new double[converted.size()];
            double[] values = new double[converted.size()];
            for (int i = 0; i < hours.length; i++) {
                hours[i] = Duration.between(origin, converted.get(i).time()).toSeconds() / 3600.0;
                values[i] = converted.get(i).value();
            }
            b.timeSeries(new Plot(r.compound() + ", 1-minute values on the reporting basis", "hours since "
                    + origin, "mg/m³", List.of(new Series(r.compound(), hours, values)), false));
        }
        if (exampleFit != null) {
            b.spectrum(exampleFit);
        }
        return b.build();
    }

    private static String label(Duration period) {
        long minutes = period.toMinutes();
        return minutes % 1440 == 0 ? (minutes / 1440) + " d" : minutes % 60 == 0 ? (minutes / 60) + " h" : minutes + " min";
    }
}
