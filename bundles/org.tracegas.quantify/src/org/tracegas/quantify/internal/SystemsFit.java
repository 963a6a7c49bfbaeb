package org.tracegas.quantify.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;

import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.BackgroundAge;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.FitSpectra;
import org.tracegas.quantify.PreparedFit;
import org.tracegas.quantify.QualityFlag;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.RegionResidual;
import org.tracegas.quantify.Sample;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * A method prepared as one {@link SystemSolver} per distinct fit: analytes whose fits share the same compounds and
 * regions share one system, solved once per sample. Turns each system's fit into the analytes' results with their
 * quality flags, whichever algorithm built the systems. Immutable and safe to share between threads.
 */
public final class SystemsFit implements PreparedFit {

    /** Builds the solver of one fit: the compounds of an analyte's fit over its points. */
    @FunctionalInterface
    public interface SystemFactory {
        /**
         * @param label       names the fit in messages, for example "fit of CO"
         * @param compounds   the compounds fitted together, analyte first
         * @param points      the fit points, regions and baselines
         * @param wavenumbers the sample axis
         * @throws IllegalArgumentException if the compounds cannot be fitted over the points; the message starts
         *                                  with the label
         */
        SystemSolver create(String label, List<String> compounds, FitPoints points, double[] wavenumbers);
    }

    private final QuantificationMethod method;
    private final List<SystemSolver> systems;
    private final int[] systemOfAnalyte;
    private final int[] columnOfAnalyte;

    /**
     * @throws IllegalArgumentException if the weights do not cover a region, a region holds too few points or the
     *                                  factory refuses a fit; the message names the analyte
     */
    public SystemsFit(QuantificationMethod method, SpectralAxis axis, SystemFactory factory) {
        this.method = method;
        double[] wavenumbers = axis.toArray();
        double[] weights = method.weights().map(w -> resample(w, wavenumbers)).orElse(null);
        Map<List<Object>, Integer> systemIndex = new LinkedHashMap<>();
        List<SystemSolver> built = new ArrayList<>();
        List<Analyte> analytes = method.analytes();
        this.systemOfAnalyte = new int[analytes.size()];
        this.columnOfAnalyte = new int[analytes.size()];
        for (int a = 0; a < analytes.size(); a++) {
            Analyte analyte = analytes.get(a);
            List<Object> key = List.of(new TreeSet<>(analyte.fittedCompounds()), analyte.regions());
            Integer index = systemIndex.get(key);
            if (index == null) {
                String label = "fit of " + analyte.compound();
                FitPoints points = new FitPoints(label, analyte.regions(), wavenumbers, weights);
                built.add(factory.create(label, analyte.fittedCompounds(), points, wavenumbers));
                index = built.size() - 1;
                systemIndex.put(key, index);
            }
            systemOfAnalyte[a] = index;
            SystemSolver system = built.get(index);
            for (int c = 0; c < system.compounds(); c++) {
                if (system.compound(c).equals(analyte.compound())) {
                    columnOfAnalyte[a] = c;
                }
            }
        }
        this.systems = List.copyOf(built);
    }

    private static double[] resample(Spectrum weights, double[] wavenumbers) {
        Resampler r = new Resampler(weights.axis().toArray(), weights.toArray());
        double[] out = new double[wavenumbers.length];
        for (int i = 0; i < out.length; i++) {
            // NaN where the weights end: a fit point there is refused by the fit system
            out[i] = r.covers(wavenumbers[i]) ? r.at(wavenumbers[i]) : Double.NaN;
        }
        return out;
    }

    @Override
    public int systemCount() {
        return systems.size();
    }

    @Override
    public List<CompoundResult> fit(Sample sample, boolean keepSpectra) {
        Spectrum spectrum = sample.absorbance();
        double[] y = spectrum.toArray();
        SystemFit[] fits = new SystemFit[systems.size()];
        RegionStatistics[] statistics = new RegionStatistics[fits.length];
        List<CompoundResult> results = new ArrayList<>(method.analytes().size());
        for (int a = 0; a < method.analytes().size(); a++) {
            int s = systemOfAnalyte[a];
            SystemSolver system = systems.get(s);
            if (fits[s] == null) {
                fits[s] = system.fit(y);
                statistics[s] = new RegionStatistics(system.points(), fits[s], y);
            }
            results.add(result(method.analytes().get(a), system, fits[s], statistics[s], columnOfAnalyte[a], y,
                    spectrum, sample, keepSpectra));
        }
        return results;
    }

    /** Residual RMS per region and highest sample absorbance of one system's fit, shared by its analytes. */
    private static final class RegionStatistics {
        final double[] rms;
        final double highest;
        final int[] rows;

        RegionStatistics(FitPoints points, SystemFit fit, double[] y) {
            this.rows = points.rows();
            double[] residual = fit.residual();
            this.rms = new double[points.regions()];
            double max = Double.NEGATIVE_INFINITY;
            for (int r = 0; r < rms.length; r++) {
                double sum = 0;
                int used = 0;
                for (int j = points.regionStart(r); j < points.regionStart(r + 1); j++) {
                    // a masked point (not finite in the sample) has a NaN residual and takes no part
                    if (Double.isFinite(residual[j])) {
                        sum += residual[j] * residual[j];
                        max = Math.max(max, y[rows[j]]);
                        used++;
                    }
                }
                rms[r] = Math.sqrt(sum / used);
            }
            this.highest = max;
        }
    }

    private CompoundResult result(Analyte analyte, SystemSolver system, SystemFit fit, RegionStatistics statistics,
            int column, double[] y, Spectrum spectrum, Sample sample, boolean keepSpectra) {
        double path = method.pathLengthMetres();
        double amount = fit.amounts()[column];
        double concentration = amount / path;
        double uncertainty = fit.amountSd()[column] / path * sample.noiseCorrelation();
        double detectionLimit = 3 * uncertainty;
        EnumSet<QualityFlag> flags = EnumSet.noneOf(QualityFlag.class);
        if (amount > system.highestAmount(column)) {
            flags.add(QualityFlag.OUTSIDE_CALIBRATED_RANGE);
        }
        if (concentration < -detectionLimit) {
            flags.add(QualityFlag.NEGATIVE_BEYOND_DETECTION_LIMIT);
        }
        if (!fit.converged()) {
            flags.add(QualityFlag.NOT_CONVERGED);
        }
        if (fit.masked() > 0) {
            flags.add(QualityFlag.POINTS_MASKED);
        }
        BackgroundAge background = sample.background();
        if (background != null && background.tooOld()) {
            flags.add(QualityFlag.BACKGROUND_TOO_OLD);
        }
        List<RegionResidual> residuals = new ArrayList<>(statistics.rms.length);
        for (int r = 0; r < statistics.rms.length; r++) {
            RegionResidual rr = new RegionResidual(analyte.regions().get(r), statistics.rms[r]);
            if (rr.aboveLimit()) {
                flags.add(QualityFlag.RESIDUAL_ABOVE_LIMIT);
            }
            residuals.add(rr);
        }
        if (statistics.highest > method.maxAbsorbance()) {
            flags.add(QualityFlag.ABSORBANCE_TOO_HIGH);
        }
        Optional<FitSpectra> spectra = keepSpectra ? Optional.of(spectra(spectrum, statistics.rows, fit, column, y))
                : Optional.empty();
        return new CompoundResult(analyte.compound(), concentration, uncertainty, detectionLimit,
                method.reportingUnit(), residuals, flags, fit.iterations(), fit.shift(), fit.width(), fit.scale(),
                spectra);
    }

    private static FitSpectra spectra(Spectrum spectrum, int[] rows, SystemFit fit, int column, double[] y) {
        int n = y.length;
        double[] contribution = new double[n];
        double[] model = new double[n];
        double[] residual = new double[n];
        Arrays.fill(contribution, Double.NaN);
        Arrays.fill(model, Double.NaN);
        Arrays.fill(residual, Double.NaN);
        double[] own = fit.contribution(column);
        double[] r = fit.residual();
        for (int j = 0; j < rows.length; j++) {
            contribution[rows[j]] = own[j];
            residual[rows[j]] = r[j];
            model[rows[j]] = y[rows[j]] - r[j];
        }
        return new FitSpectra(spectrum.withValues(contribution, Ordinate.ABSORBANCE),
                spectrum.withValues(model, Ordinate.ABSORBANCE), spectrum.withValues(residual, Ordinate.ABSORBANCE));
    }
}
