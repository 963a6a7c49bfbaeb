package org.tracegas.qa.control;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.qa.internal.Require;

/**
 * Tabular CUSUM with reference value k and decision interval h given in units of σ:
 * S+_t = max(0, S+_{t−1} + (x_t − μ) − kσ), S−_t = max(0, S−_{t−1} − (x_t − μ) − kσ); a sample signals when
 * either sum exceeds hσ. After a signal both sums restart from zero, as after an adjustment.
 */
public final class CusumChart {

    private final double target;
    private final double sigma;
    private final double k;
    private final double h;

    /**
     * @param target μ, the reference value of the check (for example 0 for a zero check)
     * @param sigma  σ of the check readings in control
     * @param k      reference value in σ units (0.5 detects a shift of 1σ best)
     * @param h      decision interval in σ units
     */
    public CusumChart(double target, double sigma, double k, double h) {
        this.target = Require.finite("target", target);
        this.sigma = Require.positive("sigma", sigma);
        this.k = Require.nonNegative("k", k);
        this.h = Require.positive("h", h);
    }

    /**
     * The drift CUSUM of EN 14181:2004 Annex C with d_t = reading − reference, k = 0.501 and h = 2.85 in units
     * of s_AMS (figures recalled and not confirmed against the standard).
     */
    public static CusumChart en14181Drift(double reference, double sAms) {
        return new CusumChart(reference, sAms, 0.501, 2.85);
    }

    public CusumResult evaluate(double[] values) {
        Require.notNull("values", values);
        double[] upper = new double[values.length];
        double[] lower = new double[values.length];
        List<ControlSignal> signals = new ArrayList<>();
        double sPlus = 0;
        double sMinus = 0;
        for (int i = 0; i < values.length; i++) {
            double d = Require.finite("value " + i, values[i]) - target;
            sPlus = Math.max(0, sPlus + d - k * sigma);
            sMinus = Math.max(0, sMinus - d - k * sigma);
            upper[i] = sPlus;
            lower[i] = sMinus;
            if (sPlus > h * sigma || sMinus > h * sigma) {
                signals.add(new ControlSignal(i, sPlus > h * sigma ? "CUSUM upward shift" : "CUSUM downward shift"));
                sPlus = 0;
                sMinus = 0;
            }
        }
        return new CusumResult(upper, lower, signals);
    }
}
