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
 * The spectrometer on a {@link MixtureModel}'s fine grid: the grid itself, chosen fine enough for the narrowest
 * line at given cell conditions, and the instrument's transfer function on it (see {@link MixtureModel} for why
 * so). Shared by the mixture models at all conditions of one {@link ConditionCell}. Immutable; the transform
 * buffers are kept per thread.
 */
final class FineGridSpectrometer {

    /** Resolution elements beyond each end of the fit range that the fine grid covers, for the line shape's wings. */
    static final int MARGIN_RESOLUTIONS = 10;
    /** Resolution elements beyond the margin, at each end, between the points read and the transform's wrap-around. */
    static final int GUARD_RESOLUTIONS = 16;

    private final SpectralAxis fine;       // size a power of two: the transform length
    private final double[] transferRe;     // instrument's transfer function, k = 0 .. size / 2
    private final double[] transferIm;
    private final ThreadLocal<Transform> transforms;
    /** The observed transmittance with no absorber: every fit starts at zero amounts. */
    private final double[] observedAtZero;

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
     * @param conditions  the cell conditions whose narrowest line the grid resolves (the path's amount does not
     *                    matter)
     * @param lineShape   instrument line shape
     * @param fieldOfView beam half angle, rad
     * @param low         lowest wavenumber at which the model is read, cm-1
     * @param high        highest wavenumber at which the model is read, cm-1
     */
    FineGridSpectrometer(List<LineByLineModel> models, AbsorptionPath conditions, InstrumentLineShape lineShape,
            double fieldOfView, double low, double high) {
        double resolution = lineShape.nominalResolution();
        double narrowest = Double.POSITIVE_INFINITY;
        for (LineByLineModel m : models) {
            narrowest = Math.min(narrowest, m.narrowestHalfWidth(low, high, conditions));
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
        this.transforms = ThreadLocal.withInitial(() -> new Transform(size));
        this.transferRe = new double[size / 2 + 1];
        this.transferIm = new double[size / 2 + 1];
        lineShapeTransfer(lineShape);
        fieldOfViewTransfer(fieldWidth / step);
        // the same numbers as observing exp(-0) = 1 exactly at every fine point
        this.observedAtZero = new double[size];
        java.util.Arrays.fill(observedAtZero, 1.0);
        apply(observedAtZero);
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

    SpectralAxis grid() {
        return fine;
    }

    /** The observed transmittance with no absorber; not to be modified. */
    double[] observedAtZero() {
        return observedAtZero;
    }

    /** Replaces a monochromatic spectrum on the fine grid by the instrument's view of it. */
    void apply(double[] spectrum) {
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
