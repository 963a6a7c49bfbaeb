package org.tracegas.preprocess;

import org.tracegas.spectrum.Interferogram;

/**
 * Interferograms of cosine lines: a line of amplitude a at wavenumber s contributes a cos(2 pi s (x - delay)) at
 * path difference x, so its single beam is a line of area a / 2 at s (Fourier transform of a cosine).
 */
final class SyntheticInterferogram {

    static final double LASER = 15798.0; // HeNe, common practice
    static final int INTERVAL = 2;

    private SyntheticInterferogram() {
    }

    /**
     * @param n      samples
     * @param zpd    sample at zero path difference
     * @param delay  path difference offset in cm (gives a linear phase)
     * @param dc     constant detector level
     * @param lines  pairs of wavenumber (cm-1) and amplitude
     */
    static Interferogram of(int n, int zpd, double delay, double dc, double... lines) {
        double dx = INTERVAL / LASER;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double opd = (i - zpd) * dx - delay;
            double v = dc;
            for (int l = 0; l < lines.length; l += 2) {
                v += lines[l + 1] * Math.cos(2 * Math.PI * lines[l] * opd);
            }
            x[i] = v;
        }
        return new Interferogram(x, LASER, INTERVAL);
    }
}
