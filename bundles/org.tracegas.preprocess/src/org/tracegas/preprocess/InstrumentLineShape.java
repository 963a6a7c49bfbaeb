package org.tracegas.preprocess;

import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Instrument line shape (ILS) of an ideal Fourier transform spectrometer: the Fourier transform of the
 * apodization function over the optical path difference range [-L, L],
 * ILS(s) = 2 * integral from 0 to L of A(x / L) cos(2 pi s x) dx, which has unit area because A(0) = 1.
 * <p>
 * Convention: L = 1 / nominal resolution (cm, with the resolution in cm-1). This is common practice for stating
 * an instrument's resolution; with it the unapodized ILS has a full width at half maximum of about 0.60 times
 * the nominal resolution.
 */
public final class InstrumentLineShape {

    /** Gauss-Legendre nodes and weights on [-1, 1], 5 points (exact to degree 9). */
    private static final double[] GL_NODES = {-0.9061798459386640, -0.5384693101056831, 0.0, 0.5384693101056831,
            0.9061798459386640};
    private static final double[] GL_WEIGHTS = {0.2369268850561891, 0.4786286704993665, 0.5688888888888889,
            0.4786286704993665, 0.2369268850561891};
    /** Resolution elements of constant end value added beyond each end before the circular convolution. */
    private static final int EDGE_RESOLUTION_ELEMENTS = 16;

    private final Apodization apodization;
    private final double maxOpd;

    private InstrumentLineShape(Apodization apodization, double maxOpd) {
        this.apodization = apodization;
        this.maxOpd = maxOpd;
    }

    /**
     * The ILS of an instrument with the given apodization and nominal resolution; maximum optical path difference
     * L = 1 / nominalResolution.
     *
     * @param nominalResolution in cm-1, positive and finite
     * @throws IllegalArgumentException if apodization is null or the resolution is not positive and finite
     */
    public static InstrumentLineShape forResolution(Apodization apodization, double nominalResolution) {
        if (apodization == null) {
            throw new IllegalArgumentException("apodization must not be null");
        }
        if (!(nominalResolution > 0 && Double.isFinite(nominalResolution))) {
            throw new IllegalArgumentException(
                    "nominalResolution must be positive and finite (cm-1), was " + nominalResolution);
        }
        return new InstrumentLineShape(apodization, 1.0 / nominalResolution);
    }

    public Apodization apodization() {
        return apodization;
    }

    /** Maximum optical path difference L in cm. */
    public double maxOpticalPathDifference() {
        return maxOpd;
    }

    /** Nominal resolution 1 / L in cm-1. */
    public double nominalResolution() {
        return 1.0 / maxOpd;
    }

    /**
     * ILS value at a wavenumber offset from the line centre, integrated numerically (composite 5-point
     * Gauss-Legendre with panels short against the period of the cosine).
     *
     * @param offset wavenumber offset in cm-1
     * @return the ILS in cm (unit area over the wavenumber)
     */
    public double value(double offset) {
        int panels = 16 + (int) Math.ceil(8.0 * Math.abs(offset) * maxOpd);
        double width = maxOpd / panels;
        double w = 2.0 * Math.PI * offset;
        double sum = 0.0;
        for (int p = 0; p < panels; p++) {
            double mid = (p + 0.5) * width;
            for (int q = 0; q < GL_NODES.length; q++) {
                double x = mid + 0.5 * width * GL_NODES[q];
                sum += GL_WEIGHTS[q] * apodization.weight(x / maxOpd) * Math.cos(w * x);
            }
        }
        return 2.0 * sum * 0.5 * width;
    }

    /**
     * Convolves a uniformly sampled high-resolution spectrum (transmittance, say) with this ILS and returns it on
     * the same axis with the same ordinate. The convolution is done as a product in the optical path difference
     * domain (convolution theorem), where the transform of the ILS is the apodization itself over [-L, L]: this is
     * exact for the circular convolution and costs O(n log n). Each end is extended by its end value over
     * several resolution elements so that the ends do not see each other or a step.
     * <p>
     * Absorbance is refused: the instrument convolves the transmitted light, and the logarithm of a convolution
     * is not the convolution of the logarithm, so a convolved absorbance underestimates narrow, strong lines.
     * Deresolve the transmittance (or truncate the interferogram) and take the absorbance afterwards.
     *
     * @throws IllegalArgumentException if the spectrum is null or absorbance, its axis is not uniform, it has
     *                                  fewer than 2 points, or its step is coarser than half the nominal
     *                                  resolution (the path difference range L would then not be reached)
     */
    public Spectrum apply(Spectrum highResolution) {
        if (highResolution == null) {
            throw new IllegalArgumentException("highResolution spectrum must not be null");
        }
        if (highResolution.ordinate() == Ordinate.ABSORBANCE) {
            throw new IllegalArgumentException("highResolution spectrum is absorbance: the line shape acts on the "
                    + "transmitted light, so deresolve the transmittance (or truncate the interferogram) and take the "
                    + "absorbance afterwards");
        }
        SpectralAxis axis = highResolution.axis();
        if (!axis.isUniform() || axis.size() < 2) {
            throw new IllegalArgumentException("highResolution spectrum must have a uniform axis of at least 2 points, was "
                    + axis);
        }
        double h = Math.abs(axis.step());
        if (h * maxOpd > 0.5) {
            throw new IllegalArgumentException("highResolution spectrum step " + h
                    + " cm-1 is too coarse for nominal resolution " + nominalResolution()
                    + " cm-1: it must be at most half the resolution");
        }
        int n = axis.size();
        int edge = (int) Math.ceil(EDGE_RESOLUTION_ELEMENTS / (maxOpd * h));
        int size = Integer.highestOneBit(Math.max(2, n + 3 * edge - 1)) << 1;
        double[] padded = new double[size];
        double[] values = highResolution.toArray();
        System.arraycopy(values, 0, padded, 0, n);
        fillWrapAround(padded, n, values[n - 1], values[0]);
        RealFft fft = FftEngine.defaultEngine().create(size);
        double[] re = new double[size / 2 + 1];
        double[] im = new double[size / 2 + 1];
        fft.forward(padded, re, im);
        double dx = 1.0 / (size * h); // path difference step of the transform
        for (int k = 0; k <= size / 2; k++) {
            double w = cellWeight(k * dx, dx);
            re[k] *= w;
            im[k] *= w;
        }
        fft.inverse(re, im, padded);
        double[] out = new double[n];
        System.arraycopy(padded, 0, out, 0, n);
        return highResolution.withValues(out, highResolution.ordinate());
    }

    /**
     * Fills padded[from ..] so that the periodic continuation is smooth: a third holds the last value, a third
     * blends with a raised cosine, a third holds the first value.
     */
    private static void fillWrapAround(double[] padded, int from, double last, double first) {
        int length = padded.length - from;
        int third = length / 3;
        for (int i = 0; i < length; i++) {
            double v;
            if (i < third) {
                v = last;
            } else if (i >= length - third) {
                v = first;
            } else {
                double t = (i - third + 0.5) / (length - 2 * third);
                v = last + (first - last) * 0.5 * (1.0 - Math.cos(Math.PI * t));
            }
            padded[from + i] = v;
        }
    }

    /** Mean apodization weight over the cell [x - dx/2, x + dx/2] cut at L (the cut matters for the boxcar). */
    private double cellWeight(double x, double dx) {
        double upper = x + 0.5 * dx;
        if (upper <= maxOpd) {
            return apodization.weight(x / maxOpd);
        }
        double lower = x - 0.5 * dx;
        if (lower >= maxOpd) {
            return 0.0;
        }
        double fraction = (maxOpd - lower) / dx;
        return fraction * apodization.weight(0.5 * (lower + maxOpd) / maxOpd);
    }

    @Override
    public String toString() {
        return "InstrumentLineShape[" + apodization + ", L = " + maxOpd + " cm]";
    }
}
