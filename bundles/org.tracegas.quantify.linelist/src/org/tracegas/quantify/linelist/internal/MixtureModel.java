package org.tracegas.quantify.linelist.internal;

import java.util.List;

import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.spectrum.SpectralAxis;

/**
 * The transmittance a spectrometer reports for a mixture in the cell, on a fine grid: the monochromatic
 * transmittance T = exp(-sum_c x_c tau_c) of all compounds together (x_c in ppm·m, tau_c the optical depth of one
 * ppm·m computed line by line at the cell's temperature and pressure), convolved with the instrument line shape
 * and then with the field-of-view broadening, and the derivatives of that observed transmittance with respect to
 * each amount. Immutable.
 * <p>
 * The optical depth is taken as proportional to the amount: the self-broadening a compound's own amount adds to
 * its lines is left out, which at trace amounts (below 1 % of the gas) changes line widths by less than 1 % of the
 * air-broadened width (common practice, no source).
 * <p>
 * Field of view: a ray at angle theta to the axis sees the path difference x cos(theta), so a line at nu0 appears
 * at nu0 cos(theta); over a uniformly lit circular beam of half angle alpha it is spread evenly over
 * [nu0 (1 - alpha^2 / 2), nu0] (small angles; from memory, the self-apodization of a finite aperture, as in
 * Fourier transform spectroscopy textbooks). The width is taken at the middle of the fit range.
 * <p>
 * Why it is fast: everything the sample does not change is prepared once, when the method is prepared: each
 * compound's optical depth on the fine grid, and the instrument as one transfer function, the transform of the line
 * shape (taken from the line shape's own convolution of a single fine point) times that of the field-of-view boxcar
 * (mean over [nu, nu + w]: exp(i theta) sin(theta) / theta with theta = pi k w / (n step), exact for the
 * band-limited spectrum the line shape leaves), and the observed spectra at zero amounts, where every fit starts.
 * Per spectrum remain the exponential and one forward and one inverse transform per observed vector, on the fit's
 * work arrays and transform buffers kept per thread. The fine grid ({@link FineGridSpectrometer}) is as long as the
 * transform, a power of two, with at least {@value FineGridSpectrometer#GUARD_RESOLUTIONS} resolution elements of true
 * spectrum beyond the margin at each end, so that the circular convolution's wrap-around joins its ends far from
 * any point read.
 */
public final class MixtureModel {

    /** The amount of the nominal path whose optical depth is computed, ppm: small, so self-broadening is nil. */
    private static final double NOMINAL_PPM = 1.0;

    private final FineGridSpectrometer instrument;
    private final double[][] tauPerAmount; // [compound][fine point], optical depth of 1 ppm·m
    /** [compound][fine point], the derivatives by the amounts at zero amounts. */
    private final double[][] derivativeAtZero;

    /**
     * @param models      line-by-line model of each compound
     * @param temperature K
     * @param pressure    kPa
     * @param pathMetres  optical path of the cell, m
     * @param lineShape   instrument line shape
     * @param fieldOfView beam half angle, rad
     * @param low         lowest wavenumber at which the model is read, cm-1
     * @param high        highest wavenumber at which the model is read, cm-1
     */
    public MixtureModel(List<LineByLineModel> models, double temperature, double pressure, double pathMetres,
            InstrumentLineShape lineShape, double fieldOfView, double low, double high) {
        this(models, nominal(temperature, pressure, pathMetres), lineShape, fieldOfView, low, high);
    }

    private MixtureModel(List<LineByLineModel> models, AbsorptionPath nominal, InstrumentLineShape lineShape,
            double fieldOfView, double low, double high) {
        this(new FineGridSpectrometer(models, nominal, lineShape, fieldOfView, low, high), models, nominal);
    }

    private MixtureModel(FineGridSpectrometer instrument, List<LineByLineModel> models, AbsorptionPath nominal) {
        this(instrument, opticalDepthPerAmount(models, instrument.grid(), nominal));
    }

    /**
     * @param instrument   the spectrometer on the fine grid
     * @param tauPerAmount [compound][fine point], optical depth of 1 ppm·m on the instrument's grid; kept
     */
    MixtureModel(FineGridSpectrometer instrument, double[][] tauPerAmount) {
        this(instrument, tauPerAmount, derivativesAtZero(instrument, tauPerAmount));
    }

    private MixtureModel(FineGridSpectrometer instrument, double[][] tauPerAmount, double[][] derivativeAtZero) {
        this.instrument = instrument;
        this.tauPerAmount = tauPerAmount;
        this.derivativeAtZero = derivativeAtZero;
    }

    /** The same numbers as derivative computes at zero amounts, where exp(-0) = 1 exactly. */
    private static double[][] derivativesAtZero(FineGridSpectrometer instrument, double[][] tauPerAmount) {
        int size = instrument.grid().size();
        double[][] derivatives = new double[tauPerAmount.length][size];
        for (int c = 0; c < tauPerAmount.length; c++) {
            double[] d = derivatives[c];
            for (int i = 0; i < size; i++) {
                d[i] = -tauPerAmount[c][i];
            }
            instrument.apply(d);
        }
        return derivatives;
    }

    /**
     * The model whose optical depths are a weighted sum of those of models on one instrument. Its derivatives at
     * zero amounts are the same weighted sum of theirs, as the instrument's view is linear in the optical depth
     * there: equal to computing them anew but for rounding, and two convolutions per compound fewer.
     *
     * @param models  models sharing one instrument
     * @param weights one per model
     */
    static MixtureModel weighted(List<MixtureModel> models, double[] weights) {
        double[][][] tau = new double[models.size()][][];
        double[][][] derivatives = new double[models.size()][][];
        for (int k = 0; k < tau.length; k++) {
            tau[k] = models.get(k).tauPerAmount;
            derivatives[k] = models.get(k).derivativeAtZero;
        }
        return new MixtureModel(models.get(0).instrument, sum(tau, weights), sum(derivatives, weights));
    }

    /** sum over k of weights[k] arrays[k], [compound][fine point]. */
    private static double[][] sum(double[][][] arrays, double[] weights) {
        double[][] out = new double[arrays[0].length][arrays[0][0].length];
        for (int c = 0; c < out.length; c++) {
            double[] o = out[c];
            for (int k = 0; k < arrays.length; k++) {
                double[] a = arrays[k][c];
                double w = weights[k];
                for (int i = 0; i < o.length; i++) {
                    o[i] += w * a[i];
                }
            }
        }
        return out;
    }

    /** The gas of 1 ppm over the path at the cell's conditions, whose optical depth is computed. */
    static AbsorptionPath nominal(double temperature, double pressure, double pathMetres) {
        return new AbsorptionPath(temperature, pressure, NOMINAL_PPM, pathMetres);
    }

    /** Each compound's optical depth of 1 ppm·m on the grid, line by line at the path's conditions. */
    static double[][] opticalDepthPerAmount(List<LineByLineModel> models, SpectralAxis grid,
            AbsorptionPath nominal) {
        double amount = nominal.concentrationPathLength();
        double[][] perAmount = new double[models.size()][];
        for (int c = 0; c < models.size(); c++) {
            double[] tau = models.get(c).opticalDepth(grid, nominal).toArray();
            for (int i = 0; i < tau.length; i++) {
                tau[i] /= amount;
            }
            perAmount[c] = tau;
        }
        return perAmount;
    }

    /** The fine grid on which {@link #observe} gives its values. */
    public SpectralAxis grid() {
        return instrument.grid();
    }

    public int compounds() {
        return tauPerAmount.length;
    }

    /**
     * The observed transmittance of a mixture on the fine grid, keeping the monochromatic transmittance from which
     * {@link #derivative} takes the derivatives at the same amounts.
     *
     * @param amounts       ppm·m of each compound
     * @param monochromatic receives the monochromatic transmittance, {@link #grid()} long
     * @param observed      receives the observed transmittance, {@link #grid()} long
     */
    public void observe(double[] amounts, double[] monochromatic, double[] observed) {
        int n = instrument.grid().size();
        if (zero(amounts)) {
            java.util.Arrays.fill(monochromatic, 1.0);
            System.arraycopy(instrument.observedAtZero(), 0, observed, 0, n);
            return;
        }
        for (int i = 0; i < n; i++) {
            double tau = 0;
            for (int c = 0; c < amounts.length; c++) {
                tau += amounts[c] * tauPerAmount[c][i];
            }
            monochromatic[i] = Math.exp(-tau);
        }
        System.arraycopy(monochromatic, 0, observed, 0, n);
        instrument.apply(observed);
    }

    /**
     * The derivative of the observed transmittance with respect to one compound's amount: the instrument's view of
     * -tau_c T, T the monochromatic transmittance.
     *
     * @param compound      the compound's index
     * @param amounts       ppm·m of each compound
     * @param monochromatic the monochromatic transmittance that {@link #observe} gave at the amounts
     * @param out           receives d T_observed / d amount, {@link #grid()} long
     */
    public void derivative(int compound, double[] amounts, double[] monochromatic, double[] out) {
        if (zero(amounts)) {
            System.arraycopy(derivativeAtZero[compound], 0, out, 0, out.length);
            return;
        }
        double[] tau = tauPerAmount[compound];
        for (int i = 0; i < out.length; i++) {
            out[i] = -tau[i] * monochromatic[i];
        }
        instrument.apply(out);
    }

    private static boolean zero(double[] amounts) {
        for (double a : amounts) {
            if (a != 0) {
                return false;
            }
        }
        return true;
    }

    /** The observed transmittance of one compound alone at an amount. */
    public double[] observeAlone(int compound, double amount) {
        double[] t = new double[instrument.grid().size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.exp(-amount * tauPerAmount[compound][i]);
        }
        instrument.apply(t);
        return t;
    }

}
