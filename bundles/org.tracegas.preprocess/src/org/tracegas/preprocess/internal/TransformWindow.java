package org.tracegas.preprocess.internal;

import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.Sidedness;
import org.tracegas.spectrum.Interferogram;

/**
 * Weights applied to the interferogram samples at offsets -shortSide .. longSide from ZPD: apodization over the
 * long side, the Mertz ramp over the double-sided part of a single-sided recording (so that each path difference
 * counts once; doubled so both recording modes give the same spectrum scale), and the sample spacing, so that
 * the transform approximates the continuous Fourier integral.
 */
public final class TransformWindow {

    private final int shortSide;
    private final int longSide;
    private final double spacing;
    private final double[] weights;

    public TransformWindow(Apodization apodization, Sidedness sidedness, int shortSide, int longSide,
            double spacing) {
        this.shortSide = shortSide;
        this.longSide = longSide;
        this.spacing = spacing;
        this.weights = new double[shortSide + longSide + 1];
        boolean ramp = sidedness == Sidedness.SINGLE_SIDED && longSide > shortSide;
        for (int j = -shortSide; j <= longSide; j++) {
            double w = apodization.weight((double) j / longSide) * spacing;
            if (ramp) {
                w *= j > shortSide ? 2.0 : shortSide == 0 ? 1.0 : (double) (j + shortSide) / shortSide;
            }
            weights[j + shortSide] = w;
        }
    }

    /**
     * N g(0)^2 / sum g_j^2 for a transform of length N: the width of the noise autocorrelation of the spectrum in
     * point spacings (see InterferogramTransform#noiseVarianceFactor).
     */
    public double noiseVarianceFactor(int transformLength) {
        double sum = 0;
        for (double g : weights) {
            sum += g * g;
        }
        double g0 = weights[shortSide];
        return transformLength * g0 * g0 / sum;
    }

    public boolean fits(int shortSideWanted, int longSideWanted, double spacingWanted) {
        return shortSide == shortSideWanted && longSide == longSideWanted && spacing == spacingWanted;
    }

    /**
     * Fills a transform buffer: the weighted samples less their DC level with ZPD at index 0, the offsets before
     * ZPD wrapped to the end, and zeros between (zero filling).
     *
     * @param direction +1 if the long side follows ZPD, -1 if it precedes it
     */
    public void weigh(Interferogram x, double dc, int zpd, int direction, double[] buffer) {
        int size = buffer.length;
        if (direction > 0) {
            for (int j = 0; j <= longSide; j++) {
                buffer[j] = (x.get(zpd + j) - dc) * weights[j + shortSide];
            }
        } else {
            for (int j = 0; j <= longSide; j++) {
                buffer[j] = (x.get(zpd - j) - dc) * weights[j + shortSide];
            }
        }
        java.util.Arrays.fill(buffer, longSide + 1, size - shortSide, 0.0);
        for (int j = 1; j <= shortSide; j++) {
            buffer[size - j] = (x.get(zpd - direction * j) - dc) * weights[shortSide - j];
        }
    }
}
