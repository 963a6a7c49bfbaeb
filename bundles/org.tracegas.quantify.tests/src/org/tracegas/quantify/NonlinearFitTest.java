package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/** Non-linear response (interpolation between references) and the Levenberg-Marquardt line position terms. */
class NonlinearFitTest {

    private static final double SATURATION = 0.5;
    private static final SyntheticGas CO = SyntheticGas.named("CO");

    private static QuantificationMethod.Builder coMethod(boolean nonlinearity) {
        QuantificationMethod.Builder b = QuantificationMethod.builder("CO saturating").pathLengthMetres(1.0)
                .nonlinearity(nonlinearity).maxAbsorbance(2.0)
                .analyte(new Analyte("CO", List.of(), List.of(AnalysisRegion.of(2040, 2250, 1))));
        for (double amount : new double[] {50, 100, 200, 300, 400, 600, 800}) {
            b.reference(CO.reference(amount, SATURATION));
        }
        return b;
    }

    private static Spectrum saturatedSample(double ppmMetres) {
        double[] k = CO.absorptivity(SyntheticGas.AXIS, 0, SyntheticGas.HWHM);
        double[] a = new double[k.length];
        for (int i = 0; i < a.length; i++) {
            a[i] = SyntheticGas.saturate(k[i] * ppmMetres, SATURATION) + 0.003;
        }
        return new Spectrum(SyntheticGas.AXIS, a, Ordinate.ABSORBANCE);
    }

    private static CompoundResult fit(QuantificationMethod method, Spectrum sample) {
        return new Quantifier(PreparedMethod.prepare(method, SyntheticGas.AXIS), "l", "v", false)
                .quantify(Sample.of(sample)).compounds().get(0);
    }

    /**
     * A saturating band (A = a/(1 + 0.5 a), peaks near 0.4) between references at 200 and 300 ppm·m: the
     * interpolated absorptivity recovers 250 ppm·m within 1 %; a pooled linear fit misses by more.
     */
    @Test
    void interpolationBetweenReferencesRecoversSaturatedBand() {
        Spectrum sample = saturatedSample(250);
        CompoundResult nonlinear = fit(coMethod(true).build(), sample);
        CompoundResult linear = fit(coMethod(false).build(), sample);
        assertEquals(250, nonlinear.concentration(), 2.5);
        assertTrue(Math.abs(linear.concentration() - 250) > 3 * Math.abs(nonlinear.concentration() - 250),
                "linear " + linear.concentration() + " nonlinear " + nonlinear.concentration());
        assertTrue(nonlinear.iterations() >= 2 && nonlinear.iterations() < 50, "iterations " + nonlinear.iterations());
        assertFalse(nonlinear.flagged(QualityFlag.NOT_CONVERGED));
        assertEquals(0, linear.iterations());
    }

    /** At an amount equal to a reference the interpolation reproduces that reference: recovery to 1e-6. */
    @Test
    void reproducesReferenceAmountExactly() {
        CompoundResult r = fit(coMethod(true).build(), saturatedSample(400));
        assertEquals(400, r.concentration(), 400e-6);
    }

    @Test
    void flagsIterationCapReached() {
        CompoundResult r = fit(coMethod(true).maxIterations(1).build(), saturatedSample(250));
        assertTrue(r.flagged(QualityFlag.NOT_CONVERGED), r.flags().toString());
        assertEquals(1, r.iterations());
    }

    /** Pressure-broadened NO lines (half width 1 cm-1), well sampled at 0.5 cm-1. */
    private static final double WIDE = 1.0;

    private static QuantificationMethod shiftMethod(ShiftTerm term) {
        return shiftMethod(term, QuantificationMethod.DEFAULT_MAX_ITERATIONS);
    }

    private static QuantificationMethod shiftMethod(ShiftTerm term, int maxIterations) {
        double[] k = SyntheticGas.named("NO").absorptivity(SyntheticGas.AXIS, 0, WIDE);
        for (int i = 0; i < k.length; i++) {
            k[i] *= 100;
        }
        return QuantificationMethod.builder("NO with shift").pathLengthMetres(1.0).shiftTerm(term)
                .maxIterations(maxIterations)
                .analyte(new Analyte("NO", List.of(), List.of(AnalysisRegion.of(1800, 1950, 1))))
                .reference(new ReferenceSpectrum("NO", new Spectrum(SyntheticGas.AXIS, k, Ordinate.ABSORBANCE), 100))
                .build();
    }

    /** NO at an amount, lines shifted, convolved with a Gaussian of the given variance (cm-2; 0 for none). */
    private static Spectrum shiftedNo(double amount, double shift, double variance) {
        SyntheticGas no = SyntheticGas.named("NO");
        double[] a = new double[SyntheticGas.AXIS.size()];
        int nodes = variance > 0 ? 61 : 1;
        double sigma = Math.sqrt(variance);
        double total = 0;
        for (int q = 0; q < nodes; q++) {
            double offset = nodes == 1 ? 0 : sigma * (-5 + 10.0 * q / (nodes - 1));
            double weight = nodes == 1 ? 1 : Math.exp(-0.5 * (offset / sigma) * (offset / sigma));
            total += weight;
            double[] k = no.absorptivity(SyntheticGas.AXIS, shift + offset, WIDE);
            for (int i = 0; i < a.length; i++) {
                a[i] += weight * k[i] * amount;
            }
        }
        for (int i = 0; i < a.length; i++) {
            a[i] = a[i] / total + 0.002;
        }
        return new Spectrum(SyntheticGas.AXIS, a, Ordinate.ABSORBANCE);
    }

    /**
     * Sample lines 0.1 cm-1 above the references (a fifth of the point spacing): the shift fit returns the shift to
     * 2e-3 cm-1 and the amount to 0.5 %, with a residual far below that of the plain fit.
     */
    @Test
    void shiftTermRecoversLinePositionOffset() {
        Spectrum sample = shiftedNo(80, 0.1, 0);
        CompoundResult shifted = fit(shiftMethod(ShiftTerm.SHIFT), sample);
        CompoundResult plain = fit(shiftMethod(ShiftTerm.NONE), sample);
        assertEquals(0.1, shifted.shift(), 2e-3);
        assertEquals(80, shifted.concentration(), 0.4);
        assertTrue(Double.isNaN(shifted.width()));
        assertTrue(shifted.iterations() > 0);
        assertTrue(shifted.residuals().get(0).rms() < 0.05 * plain.residuals().get(0).rms(),
                shifted.residuals().get(0).rms() + " vs " + plain.residuals().get(0).rms());
    }

    /**
     * Sample lines broadened by a Gaussian of variance 0.04 cm-2 (sigma 0.2 cm-1) and shifted by 0.05 cm-1: the
     * width term returns the variance to 15 %, the shift to 5e-3 cm-1 (Lorentzian wings alias at this sampling,
     * which costs the derivatives a few per cent), the amount to 1 %, and a residual well below the shift-only fit.
     */
    @Test
    void widthTermFollowsGaussianBroadening() {
        Spectrum sample = shiftedNo(80, 0.05, 0.04);
        CompoundResult both = fit(shiftMethod(ShiftTerm.SHIFT_AND_WIDTH), sample);
        CompoundResult shiftOnly = fit(shiftMethod(ShiftTerm.SHIFT), sample);
        assertEquals(0.04, both.width(), 0.006);
        assertEquals(0.05, both.shift(), 5e-3);
        assertEquals(80, both.concentration(), 0.8);
        assertTrue(both.residuals().get(0).rms() < 0.2 * shiftOnly.residuals().get(0).rms(),
                both.residuals().get(0).rms() + " vs " + shiftOnly.residuals().get(0).rms());
    }

    /** A shift fit that cannot finish within its iteration cap reports the plain fit, flagged. */
    @Test
    void shiftFitBeyondItsIterationCapFallsBackFlagged() {
        Spectrum sample = shiftedNo(80, 0.1, 0);
        CompoundResult capped = fit(shiftMethod(ShiftTerm.SHIFT, 1), sample);
        CompoundResult plain = fit(shiftMethod(ShiftTerm.NONE), sample);
        assertTrue(capped.flagged(QualityFlag.NOT_CONVERGED), capped.flags().toString());
        assertTrue(Double.isNaN(capped.shift()));
        assertEquals(plain.concentration(), capped.concentration());
    }

    /** A blank sample (no compound above its detection limit) has no lines to place: no shift, the plain fit. */
    @Test
    void blankSampleLeavesShiftUndefined() {
        double[] blank = new double[SyntheticGas.AXIS.size()];
        java.util.Random random = new java.util.Random(17);
        for (int i = 0; i < blank.length; i++) {
            blank[i] = 0.002 + 5e-4 * random.nextGaussian();
        }
        CompoundResult r = fit(shiftMethod(ShiftTerm.SHIFT_AND_WIDTH),
                new Spectrum(SyntheticGas.AXIS, blank, Ordinate.ABSORBANCE));
        assertTrue(Double.isNaN(r.shift()) && Double.isNaN(r.width()), r.shift() + " " + r.width());
        assertEquals(0, r.concentration(), r.detectionLimit());
        assertFalse(r.flagged(QualityFlag.NOT_CONVERGED));
    }
}
