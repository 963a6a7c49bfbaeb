package org.tracegas.quantify;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;

import org.tracegas.quantify.internal.FitPoints;
import org.tracegas.quantify.internal.Sha256;
import org.tracegas.quantify.internal.SystemFit;
import org.tracegas.quantify.internal.SystemSolver;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * Quantifies sample spectra with a prepared method. Stateless apart from its settings, so one instance serves
 * any number of threads; each spectrum is fitted on its own, which makes the numbers independent of how work is
 * spread over threads.
 */
public final class Quantifier {

    private final PreparedMethod prepared;
    private final String libraryHash;
    private final String softwareVersion;
    private final boolean keepSpectra;
    private final Sha256.SpectrumHasher hasher;

    /**
     * @param prepared        the prepared method
     * @param libraryHash     identity of the reference library version, recorded with each result
     * @param softwareVersion software version, recorded with each result
     * @param keepSpectra     whether results carry the fitted spectra and residuals for plots
     */
    public Quantifier(PreparedMethod prepared, String libraryHash, String softwareVersion, boolean keepSpectra) {
        if (prepared == null) {
            throw new IllegalArgumentException("prepared must not be null");
        }
        if (libraryHash == null || libraryHash.isBlank()) {
            throw new IllegalArgumentException("libraryHash must not be blank");
        }
        if (softwareVersion == null || softwareVersion.isBlank()) {
            throw new IllegalArgumentException("softwareVersion must not be blank");
        }
        this.prepared = prepared;
        this.libraryHash = libraryHash;
        this.softwareVersion = softwareVersion;
        this.keepSpectra = keepSpectra;
        this.hasher = new Sha256.SpectrumHasher(prepared.axis());
    }

    public PreparedMethod prepared() {
        return prepared;
    }

    /**
     * Fits a sample and records what the result was computed from.
     *
     * @throws IllegalArgumentException if the spectrum is not absorbance or not on the prepared axis, or if the
     *                                  method's algorithm cannot fit a point that is not finite (the message names
     *                                  the index)
     */
    public SpectrumResult quantify(Sample sample) {
        List<CompoundResult> results = fit(sample);
        ReprocessingRecord record = new ReprocessingRecord(prepared.method().contentHash(), libraryHash,
                softwareVersion, hasher.hash(sample.absorbance()));
        return new SpectrumResult(results, record);
    }

    /**
     * Fits a sample: one result per analyte in the method's order, without the reprocessing record.
     *
     * @throws IllegalArgumentException as {@link #quantify(Sample)}
     */
    public List<CompoundResult> fit(Sample sample) {
        if (sample == null) {
            throw new IllegalArgumentException("sample must not be null");
        }
        Spectrum spectrum = sample.absorbance();
        if (spectrum.ordinate() != Ordinate.ABSORBANCE) {
            throw new IllegalArgumentException("sample ordinate must be ABSORBANCE, was " + spectrum.ordinate());
        }
        if (!spectrum.axis().equals(prepared.axis())) {
            throw new IllegalArgumentException("sample axis " + spectrum.axis() + " differs from the prepared axis "
                    + prepared.axis());
        }
        double[] y = spectrum.toArray();
        QuantificationMethod method = prepared.method();
        SystemFit[] fits = new SystemFit[prepared.systemCount()];
        RegionStatistics[] statistics = new RegionStatistics[fits.length];
        List<CompoundResult> results = new ArrayList<>(method.analytes().size());
        for (int a = 0; a < method.analytes().size(); a++) {
            int s = prepared.systemOfAnalyte(a);
            SystemSolver system = prepared.system(s);
            if (fits[s] == null) {
                fits[s] = system.fit(y);
                statistics[s] = new RegionStatistics(system.points(), fits[s], y);
            }
            results.add(result(method, method.analytes().get(a), system, fits[s], statistics[s],
                    prepared.columnOfAnalyte(a), y, spectrum, sample));
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

    private CompoundResult result(QuantificationMethod method, Analyte analyte, SystemSolver system, SystemFit fit,
            RegionStatistics statistics, int column, double[] y, Spectrum spectrum, Sample sample) {
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
