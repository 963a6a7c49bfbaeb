package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** Behaviour of the curve-of-growth fit on spectra of the line-by-line generator: masking, flags, scale, text. */
class CurveOfGrowthFitTest {

    private static final double NOISE = 1e-3;
    private static LineByLineMixture generator;
    private static List<ReferenceSpectrum> references;

    @BeforeAll
    static void references() {
        generator = new LineByLineMixture(LineByLineMixture.Layout.SEPARATE);
        Random random = new Random(7);
        references = new ArrayList<>();
        for (int c = 0; c < 3; c++) {
            for (double f : new double[] {0.25, 0.5, 1}) {
                references.add(generator.reference(c, f * LineByLineMixture.HIGHEST[c], NOISE / 4, random));
            }
        }
    }

    private static QuantificationMethod.Builder method(ShiftTerm term) {
        QuantificationMethod.Builder b = QuantificationMethod.builder("curves").pathLengthMetres(1).maxAbsorbance(3)
                .algorithm(FitAlgorithm.CURVE_OF_GROWTH).shiftTerm(term);
        for (int c = 0; c < 3; c++) {
            List<String> others = new ArrayList<>(LineByLineMixture.COMPOUNDS);
            others.remove(c);
            b.analyte(new Analyte(LineByLineMixture.COMPOUNDS.get(c), others,
                    List.of(AnalysisRegion.of(2090, 2210, 1))));
        }
        references.forEach(b::reference);
        return b;
    }

    private static Quantifier quantifier(QuantificationMethod m) {
        return new Quantifier(PreparedMethod.prepare(m, LineByLineMixture.SAMPLE_AXIS), "library", "test", true);
    }

    private static Spectrum sample(double[] fractions, double scale, long seed) {
        double[] amounts = new double[3];
        for (int c = 0; c < 3; c++) {
            amounts[c] = fractions[c] * LineByLineMixture.HIGHEST[c];
        }
        return generator.absorbance(LineByLineMixture.SAMPLE_AXIS, amounts, 0.01, 2e-5, scale, NOISE,
                new Random(seed));
    }

    /**
     * Three points inside the windows are not finite (a detector glitch): the fit leaves them out, flags every
     * result, and stays within one standard uncertainty of the fit of the intact spectrum.
     */
    @Test
    void masksPointsThatAreNotFinite() {
        Spectrum intact = sample(new double[] {0.6, 0.3, 0.7}, 0, 1);
        double[] broken = intact.toArray();
        broken[100] = Double.NaN;
        broken[101] = Double.POSITIVE_INFINITY;
        broken[180] = Double.NaN;
        Quantifier q = quantifier(method(ShiftTerm.NONE).build());
        List<CompoundResult> whole = q.fit(Sample.of(intact));
        List<CompoundResult> masked = q.fit(Sample.of(intact.withValues(broken, Ordinate.ABSORBANCE)));
        for (int c = 0; c < 3; c++) {
            CompoundResult m = masked.get(c);
            assertTrue(m.flagged(QualityFlag.POINTS_MASKED), m.flags().toString());
            assertFalse(whole.get(c).flagged(QualityFlag.POINTS_MASKED));
            assertEquals(whole.get(c).concentration(), m.concentration(), m.standardUncertainty());
            assertTrue(Double.isNaN(m.spectra().orElseThrow().residual().get(100)));
            assertTrue(Double.isFinite(m.residuals().get(0).rms()));
        }
    }

    /**
     * With one reference per compound the curve is the Beer-Lambert line through it, absorbance proportional to the
     * amount: the fit then is the classical least-squares fit, to rounding (references on the sample axis, so that
     * neither fit resamples them).
     */
    @Test
    void oneReferenceIsTheBeerLambertLine() {
        QuantificationMethod.Builder b = QuantificationMethod.builder("one each").pathLengthMetres(1).maxAbsorbance(3);
        for (int c = 0; c < 3; c++) {
            List<String> others = new ArrayList<>(LineByLineMixture.COMPOUNDS);
            others.remove(c);
            b.analyte(new Analyte(LineByLineMixture.COMPOUNDS.get(c), others,
                    List.of(AnalysisRegion.of(2090, 2210, 1))));
            double[] amounts = new double[3];
            amounts[c] = LineByLineMixture.HIGHEST[c];
            b.reference(new ReferenceSpectrum(LineByLineMixture.COMPOUNDS.get(c), generator.absorbance(
                    LineByLineMixture.SAMPLE_AXIS, amounts, 0, 0, 0, 0, new Random(c)), amounts[c]));
        }
        Spectrum s = sample(new double[] {0.3, 0.6, 0.2}, 0, 6);
        List<CompoundResult> classical = quantifier(b.build()).fit(Sample.of(s));
        List<CompoundResult> curves = quantifier(b.algorithm(FitAlgorithm.CURVE_OF_GROWTH).build())
                .fit(Sample.of(s));
        for (int c = 0; c < 3; c++) {
            assertEquals(classical.get(c).concentration(), curves.get(c).concentration(),
                    1e-9 * LineByLineMixture.HIGHEST[c]);
        }
    }

    /** Above the highest reference the result is an extrapolation of the curve and is flagged as such. */
    @Test
    void flagsAmountAboveHighestReference() {
        List<CompoundResult> r = quantifier(method(ShiftTerm.NONE).build())
                .fit(Sample.of(sample(new double[] {1.15, 0.5, 0.5}, 0, 2)));
        assertTrue(r.get(0).flagged(QualityFlag.OUTSIDE_CALIBRATED_RANGE), r.get(0).flags().toString());
        assertFalse(r.get(1).flagged(QualityFlag.OUTSIDE_CALIBRATED_RANGE));
        assertEquals(1.15 * LineByLineMixture.HIGHEST[0], r.get(0).concentration(),
                0.01 * LineByLineMixture.HIGHEST[0]);
    }

    /**
     * The sample's lines at nu (1 + 3e-5), 0.065 cm-1 at 2150 cm-1, an eighth of the point spacing: the scale term
     * returns the scale to 2e-6 and brings every amount closer to the truth than the fit without it.
     */
    @Test
    void scaleTermRecoversWavenumberScale() {
        double[] fractions = {0.6, 0.4, 0.8};
        Spectrum s = sample(fractions, 3e-5, 3);
        List<CompoundResult> withScale = quantifier(method(ShiftTerm.SCALE).build()).fit(Sample.of(s));
        List<CompoundResult> without = quantifier(method(ShiftTerm.NONE).build()).fit(Sample.of(s));
        assertEquals(3e-5, withScale.get(0).scale(), 2e-6);
        assertTrue(Double.isNaN(without.get(0).scale()));
        for (int c = 0; c < 3; c++) {
            double truth = fractions[c] * LineByLineMixture.HIGHEST[c];
            assertTrue(Math.abs(withScale.get(c).concentration() - truth) < Math.abs(
                    without.get(c).concentration() - truth), LineByLineMixture.COMPOUNDS.get(c));
            assertFalse(withScale.get(c).flagged(QualityFlag.NOT_CONVERGED));
        }
    }

    /** A blank (baseline and noise only): every amount within its detection limit of zero, the fit converged. */
    @Test
    void blankSampleGivesAmountsWithinDetectionLimit() {
        List<CompoundResult> r = quantifier(method(ShiftTerm.SCALE).build())
                .fit(Sample.of(sample(new double[] {0, 0, 0}, 0, 8)));
        for (CompoundResult c : r) {
            assertEquals(0, c.concentration(), c.detectionLimit(), c.compound());
            assertFalse(c.flagged(QualityFlag.NOT_CONVERGED), c.compound());
        }
    }

    /** An iteration cap too low for the saturated compound is reported, not hidden. */
    @Test
    void flagsIterationCapReached() {
        List<CompoundResult> r = quantifier(method(ShiftTerm.NONE).maxIterations(1).build())
                .fit(Sample.of(sample(new double[] {0.9, 0.5, 0.5}, 0, 9)));
        assertTrue(r.get(0).flagged(QualityFlag.NOT_CONVERGED), r.get(0).flags().toString());
        assertEquals(1, r.get(0).iterations());
    }

    /** A scale beyond the bound ends at the bound, flagged as not converged. */
    @Test
    void scaleBeyondItsBoundIsFlagged() {
        List<CompoundResult> r = quantifier(method(ShiftTerm.SCALE).build())
                .fit(Sample.of(sample(new double[] {0.6, 0.4, 0.8}, 2.5e-4, 4)));
        assertEquals(ShiftTerm.MAX_SCALE, Math.abs(r.get(0).scale()), 0);
        assertTrue(r.get(0).flagged(QualityFlag.NOT_CONVERGED));
    }

    /** The correlation factor of the sample enlarges the standard uncertainty, and nothing else. */
    @Test
    void noiseCorrelationEnlargesUncertainty() {
        Spectrum s = sample(new double[] {0.5, 0.5, 0.5}, 0, 5);
        Quantifier q = quantifier(method(ShiftTerm.NONE).build());
        CompoundResult white = q.fit(Sample.of(s)).get(0);
        CompoundResult correlated = q.fit(new Sample(s, null, 1.7)).get(0);
        assertEquals(white.concentration(), correlated.concentration(), 0);
        assertEquals(1.7 * white.standardUncertainty(), correlated.standardUncertainty(), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> new Sample(s, null, 0.5));
    }

    @Test
    void refusesTermsAndAxesItCannotUse() {
        IllegalArgumentException shift = assertThrows(IllegalArgumentException.class,
                () -> method(ShiftTerm.SHIFT).build());
        assertTrue(shift.getMessage().contains("SCALE"), shift.getMessage());
        IllegalArgumentException scale = assertThrows(IllegalArgumentException.class, () -> method(ShiftTerm.SCALE)
                .algorithm(FitAlgorithm.CLASSICAL_LEAST_SQUARES).build());
        assertTrue(scale.getMessage().contains("CLASSICAL_LEAST_SQUARES"), scale.getMessage());
        SpectralAxis uneven = SpectralAxis.of(AxisUnit.WAVENUMBER, 2000, 2100, 2150, 2300);
        QuantificationMethod m = QuantificationMethod.builder("uneven").pathLengthMetres(1)
                .algorithm(FitAlgorithm.CURVE_OF_GROWTH)
                .analyte(new Analyte("TX1", List.of(), List.of(AnalysisRegion.of(2090, 2210, 0))))
                .reference(new ReferenceSpectrum("TX1", new Spectrum(uneven, new double[] {0, 0.1, 0.2, 0},
                        Ordinate.ABSORBANCE), 10))
                .build();
        IllegalArgumentException axis = assertThrows(IllegalArgumentException.class,
                () -> PreparedMethod.prepare(m, LineByLineMixture.SAMPLE_AXIS));
        assertTrue(axis.getMessage().contains("TX1") && axis.getMessage().contains("uniform"), axis.getMessage());
    }

    /**
     * The algorithm is part of the method's text and hash; a method on the default algorithm keeps the text (and
     * so the hash) it had before algorithms could be chosen.
     */
    @Test
    void algorithmTravelsWithTheMethodText() {
        QuantificationMethod curves = method(ShiftTerm.SCALE).build();
        QuantificationMethod back = QuantificationMethod.parse(curves.canonicalText());
        assertEquals(FitAlgorithm.CURVE_OF_GROWTH, back.algorithm());
        assertEquals(ShiftTerm.SCALE, back.shiftTerm());
        assertEquals(curves.contentHash(), back.contentHash());
        QuantificationMethod classical = method(ShiftTerm.NONE).algorithm(FitAlgorithm.CLASSICAL_LEAST_SQUARES)
                .build();
        assertFalse(classical.canonicalText().contains("algorithm"));
        assertTrue(curves.canonicalText().contains("\nalgorithm CURVE_OF_GROWTH\n"));
        assertTrue(!curves.contentHash().equals(method(ShiftTerm.NONE).build().contentHash()));
    }

    /** Work arrays are kept per thread: results are bit-identical on one thread and on four. */
    @Test
    void resultsDoNotDependOnThreads() {
        Quantifier q = quantifier(method(ShiftTerm.SCALE).build());
        List<Sample> samples = new ArrayList<>();
        for (int i = 0; i < 24; i++) {
            samples.add(Sample.of(sample(new double[] {0.1 + 0.03 * i, 0.5, 0.9 - 0.03 * i}, 1e-5, 100 + i)));
        }
        List<SpectrumResult> one = new ArrayList<>();
        List<SpectrumResult> four = new ArrayList<>();
        new BatchQuantifier(q, 1).run(samples.iterator(), samples.size(), one::add, (d, t) -> { }, new CancellationFlag());
        new BatchQuantifier(q, 4).run(samples.iterator(), samples.size(), four::add, (d, t) -> { }, new CancellationFlag());
        for (int i = 0; i < samples.size(); i++) {
            for (int c = 0; c < 3; c++) {
                assertEquals(one.get(i).compounds().get(c).concentration(),
                        four.get(i).compounds().get(c).concentration(), 0);
                assertEquals(one.get(i).compounds().get(c).standardUncertainty(),
                        four.get(i).compounds().get(c).standardUncertainty(), 0);
            }
        }
    }
}
