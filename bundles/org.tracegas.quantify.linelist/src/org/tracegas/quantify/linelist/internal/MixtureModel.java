package org.tracegas.quantify.linelist.internal;

import java.util.List;

import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.preprocess.FftEngine;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.preprocess.RealFft;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

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
 * work arrays and transform buffers kept per thread. The fine grid is as long as the transform, a power of two,
 * with at least {@value #GUARD_RESOLUTIONS} resolution elements of true spectrum beyond the margin at each end, so
 * that the circular convolution's wrap-around joins its ends far from any point read.
 */
public final class MixtureModel {

    /** Resolution elements beyond each end of the fit range that the fine grid covers, for the line shape's wings. */
    private static final int MARGIN_RESOLUTIONS = 10;
    /** Resolution elements beyond the margin, at each end, between the points read and the transform's wrap-around. */
    private static final int GUARD_RESOLUTIONS = 16;
    /** The amount of the nominal path whose optical depth is computed, ppm: small, so self-broadening is nil. */
    private static final double NOMINAL_PPM = 1.0;

    private final SpectralAxis fine;       // size a power of two: the transform length
    private final double[][] tauPerAmount; // [compound][fine point], optical depth of 1 ppm·m
    private final double[] transferRe;     // instrument's transfer function, k = 0 .. size / 2
    private final double[] transferIm;
    private final ThreadLocal<Transform> transforms;
    /** The observed transmittance with no absorber: every fit starts at zero amounts. */
    private final double[] observedAtZero;
    /** [compound][fine point], the derivatives by the amounts at zero amounts. */
    private final double[][] derivativeAtZero;

    /** One thread's transform and spectrum buffers: a transform holds work space and serves one thread. */
    private static final class Transform {
        final RealFft fft;
        final double[] re;
        final double[] im;

        Transform(int size) {
            this.fft = FftEngine.defaultEngine().create(size);
            this.re = new double[size / 2 + 1];
            this.im = new double[size / 2 + 1];
        }
    }

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
        double resolution = lineShape.nominalResolution();
        AbsorptionPath nominal = new AbsorptionPath(temperature, pressure, NOMINAL_PPM, pathMetres);
        double narrowest = Double.POSITIVE_INFINITY;
        for (LineByLineModel m : models) {
            narrowest = Math.min(narrowest, m.narrowestHalfWidth(low, high, nominal));
        }
        // a third of the narrowest line's half width and an eighth of the resolution, as the library's synthesis
        double step = Math.min(resolution / 8, narrowest / 3);
        double fieldWidth = 0.5 * (low + high) / 2 * fieldOfView * fieldOfView;
        // beyond the line shape's reach: also the field-of-view width and the largest wavenumber scale's shift
        double margin = MARGIN_RESOLUTIONS * resolution + fieldWidth + 1e-4 * high;
        int read = (int) Math.ceil((high - low + 2 * margin) / step) + 1;
        int guard = (int) Math.ceil(GUARD_RESOLUTIONS * resolution / step);
        int size = Integer.highestOneBit(read + 2 * guard - 1) << 1;
        this.fine = SpectralAxis.uniform(AxisUnit.WAVENUMBER, low - margin - (size - read) / 2 * step, step, size);
        double amount = nominal.concentrationPathLength();
        this.tauPerAmount = new double[models.size()][];
        for (int c = 0; c < models.size(); c++) {
            double[] tau = models.get(c).opticalDepth(fine, nominal).toArray();
            for (int i = 0; i < tau.length; i++) {
                tau[i] /= amount;
            }
            tauPerAmount[c] = tau;
        }
        this.transforms = ThreadLocal.withInitial(() -> new Transform(size));
        this.transferRe = new double[size / 2 + 1];
        this.transferIm = new double[size / 2 + 1];
        lineShapeTransfer(lineShape);
        fieldOfViewTransfer(fieldWidth / step);
        // the same numbers as observe and derivative compute at zero amounts, where exp(-0) = 1 exactly
        this.observedAtZero = new double[size];
        java.util.Arrays.fill(observedAtZero, 1.0);
        instrument(observedAtZero);
        this.derivativeAtZero = new double[models.size()][size];
        for (int c = 0; c < models.size(); c++) {
            double[] d = derivativeAtZero[c];
            for (int i = 0; i < size; i++) {
                d[i] = -tauPerAmount[c][i];
            }
            instrument(d);
        }
    }

    /**
     * The line shape's transfer function: the transform of its response to one fine point in the middle of the
     * grid, moved to index 0. The response reaches half the grid each way, beyond which the line shape of an
     * apodized spectrometer has long died away.
     */
    private void lineShapeTransfer(InstrumentLineShape lineShape) {
        int size = fine.size();
        double[] impulse = new double[size];
        impulse[size / 2] = 1;
        double[] response = lineShape.apply(new Spectrum(fine, impulse, Ordinate.ARBITRARY)).toArray();
        double[] centred = new double[size];
        for (int i = 0; i < size; i++) {
            centred[(i - size / 2 + size) % size] = response[i];
        }
        transforms.get().fft.forward(centred, transferRe, transferIm);
    }

    /** Multiplies the transfer function by that of the mean over [nu, nu + w], w being the given number of steps. */
    private void fieldOfViewTransfer(double cells) {
        if (cells == 0) {
            return;
        }
        int size = fine.size();
        for (int k = 1; k < transferRe.length; k++) {
            double theta = Math.PI * k * cells / size;
            double gain = Math.sin(theta) / theta;
            double hr = gain * Math.cos(theta);
            double hi = gain * Math.sin(theta);
            double re = transferRe[k];
            transferRe[k] = re * hr - transferIm[k] * hi;
            transferIm[k] = re * hi + transferIm[k] * hr;
        }
    }

    /** The fine grid on which {@link #observe} gives its values. */
    public SpectralAxis grid() {
        return fine;
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
        int n = fine.size();
        if (zero(amounts)) {
            java.util.Arrays.fill(monochromatic, 1.0);
            System.arraycopy(observedAtZero, 0, observed, 0, n);
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
        instrument(observed);
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
        instrument(out);
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
        double[] t = new double[fine.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.exp(-amount * tauPerAmount[compound][i]);
        }
        instrument(t);
        return t;
    }

    /** Replaces a monochromatic spectrum on the fine grid by the instrument's view of it. */
    private void instrument(double[] spectrum) {
        Transform t = transforms.get();
        t.fft.forward(spectrum, t.re, t.im);
        for (int k = 0; k < t.re.length; k++) {
            double re = t.re[k];
            t.re[k] = re * transferRe[k] - t.im[k] * transferIm[k];
            t.im[k] = re * transferIm[k] + t.im[k] * transferRe[k];
        }
        t.fft.inverse(t.re, t.im, spectrum);
    }
}
