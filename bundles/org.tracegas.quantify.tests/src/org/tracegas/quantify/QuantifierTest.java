package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

class QuantifierTest {

    private static PreparedMethod prepared;
    private static double[] clean;

    @BeforeAll
    static void prepare() {
        prepared = PreparedMethod.prepare(Mixture.method().build(), SyntheticGas.AXIS);
        clean = Mixture.clean(Mixture.TRUTH);
    }

    private static Quantifier quantifier(boolean keepSpectra) {
        return new Quantifier(prepared, "library-1", "1.0.0", keepSpectra);
    }

    /**
     * Known mixture plus noise: each analyte within 1 % of the truth or within one detection limit (acceptance
     * criterion of this check; 1 % is the synthetic-recovery target, common practice, no source).
     */
    @Test
    void recoversKnownMixture() {
        SpectrumResult result = quantifier(false).quantify(Sample.of(Mixture.noisy(clean, new Random(1))));
        assertEquals(8, result.compounds().size());
        for (CompoundResult r : result.compounds()) {
            double truth = Mixture.TRUTH.get(r.compound());
            double error = Math.abs(r.concentration() - truth);
            assertTrue(error <= Math.max(0.01 * truth, r.detectionLimit()),
                    r.compound() + ": " + r.concentration() + " ppm, truth " + truth + ", DL " + r.detectionLimit());
            assertTrue(r.flags().isEmpty(), r.compound() + " flags " + r.flags());
            assertEquals(0, r.iterations());
            assertTrue(Double.isNaN(r.shift()));
            assertTrue(r.detectionLimit() > 0);
            for (RegionResidual rr : r.residuals()) {
                // white noise of standard deviation NOISE: residual RMS close to it (fit removes a few dof)
                assertEquals(Mixture.NOISE, rr.rms(), 0.2 * Mixture.NOISE, r.compound());
            }
        }
    }

    /**
     * With a correct model and Gaussian noise, mean +/- one standard uncertainty covers the truth with
     * probability 68.3 % (normal distribution, any statistics handbook); 300 draws, accepted 60 % to 76 %.
     */
    @Test
    void standardUncertaintyCoversTruthInTwoThirdsOfDraws() {
        Quantifier q = quantifier(false);
        Random random = new Random(20261202);
        int draws = 300;
        Map<String, Integer> covered = new java.util.HashMap<>();
        double[] meanError = new double[8];
        for (int d = 0; d < draws; d++) {
            SpectrumResult result = q.quantify(Sample.of(Mixture.noisy(clean, random)));
            for (int i = 0; i < 8; i++) {
                CompoundResult r = result.compounds().get(i);
                double error = r.concentration() - Mixture.TRUTH.get(r.compound());
                meanError[i] += error / draws;
                if (Math.abs(error) <= r.standardUncertainty()) {
                    covered.merge(r.compound(), 1, Integer::sum);
                }
            }
        }
        for (String gas : Mixture.TRUTH.keySet()) {
            double fraction = covered.getOrDefault(gas, 0) / (double) draws;
            assertTrue(fraction >= 0.60 && fraction <= 0.76, gas + " covered in " + fraction + " of draws");
        }
    }

    @Test
    void keepsFittedSpectraOnRequest() {
        Spectrum sample = Mixture.noisy(clean, new Random(2));
        CompoundResult plain = quantifier(false).quantify(Sample.of(sample)).compound("NO").orElseThrow();
        assertTrue(plain.spectra().isEmpty());
        CompoundResult kept = quantifier(true).quantify(Sample.of(sample)).compound("NO").orElseThrow();
        FitSpectra spectra = kept.spectra().orElseThrow();
        double[] truth = SyntheticGas.named("NO").absorptivity(SyntheticGas.AXIS, 0, SyntheticGas.HWHM);
        int inside = 0;
        for (int i = 0; i < sample.size(); i++) {
            double nu = SyntheticGas.AXIS.get(i);
            if (nu >= 1800 && nu <= 1950) {
                inside++;
                assertEquals(sample.get(i), spectra.model().get(i) + spectra.residual().get(i), 1e-15);
                assertEquals(truth[i] * Mixture.TRUTH.get("NO") * Mixture.PATH, spectra.contribution().get(i),
                        5e-4, "NO contribution at " + nu);
            } else {
                assertTrue(Double.isNaN(spectra.contribution().get(i)), "outside the region at " + nu);
                assertTrue(Double.isNaN(spectra.residual().get(i)));
            }
        }
        assertEquals(301, inside);
        assertEquals(plain.concentration(), kept.concentration());
    }

    @Test
    void flagsBackgroundOlderThanLimit() {
        Spectrum sample = Mixture.noisy(clean, new Random(3));
        var old = new BackgroundAge(java.time.Duration.ofHours(3), java.time.Duration.ofHours(2));
        var fresh = new BackgroundAge(java.time.Duration.ofHours(1), java.time.Duration.ofHours(2));
        SpectrumResult flagged = quantifier(false).quantify(new Sample(sample, old));
        SpectrumResult clear = quantifier(false).quantify(new Sample(sample, fresh));
        for (int i = 0; i < 8; i++) {
            assertTrue(flagged.compounds().get(i).flagged(QualityFlag.BACKGROUND_TOO_OLD));
            assertFalse(clear.compounds().get(i).flagged(QualityFlag.BACKGROUND_TOO_OLD));
        }
    }

    @Test
    void flagsAmountAboveHighestReference() {
        Map<String, Double> high = new java.util.LinkedHashMap<>(Mixture.TRUTH);
        high.put("CO", 30.0); // 300 ppm·m against a reference of 200 ppm·m
        CompoundResult co = quantifier(false).quantify(Sample.of(Mixture.noisy(Mixture.clean(high), new Random(4))))
                .compound("CO").orElseThrow();
        assertTrue(co.flagged(QualityFlag.OUTSIDE_CALIBRATED_RANGE), co.flags().toString());
        assertEquals(30.0, co.concentration(), 0.3);
    }

    @Test
    void flagsConcentrationNegativeBeyondDetectionLimit() {
        Map<String, Double> negative = new java.util.LinkedHashMap<>(Mixture.TRUTH);
        negative.put("NO", -2.0); // an over-subtracted background
        CompoundResult no = quantifier(false).quantify(Sample.of(Mixture.noisy(Mixture.clean(negative),
                new Random(5)))).compound("NO").orElseThrow();
        assertTrue(no.flagged(QualityFlag.NEGATIVE_BEYOND_DETECTION_LIMIT), no.flags().toString());
        CompoundResult positive = quantifier(false).quantify(Sample.of(Mixture.noisy(clean, new Random(5))))
                .compound("NO").orElseThrow();
        assertFalse(positive.flagged(QualityFlag.NEGATIVE_BEYOND_DETECTION_LIMIT));
    }

    @Test
    void flagsResidualAboveRegionLimitAndAbsorbanceAboveTrust() {
        QuantificationMethod strict = Mixture.method().maxAbsorbance(0.1).build();
        QuantificationMethod.Builder limited = QuantificationMethod.builder("limited").pathLengthMetres(Mixture.PATH)
                .analyte(new Analyte("NO", java.util.List.of("H2O"),
                        java.util.List.of(Mixture.region(1, 2 * Mixture.NOISE, 1800, 1870),
                                Mixture.region(1, 0.5 * Mixture.NOISE, 1880, 1950))));
        for (String g : new String[] {"NO", "H2O"}) {
            limited.reference(SyntheticGas.named(g).reference(Mixture.referenceAmount(g), 0));
        }
        Spectrum sample = Mixture.noisy(clean, new Random(6));
        CompoundResult co = new Quantifier(PreparedMethod.prepare(strict, SyntheticGas.AXIS), "l", "v", false)
                .quantify(Sample.of(sample)).compound("CO").orElseThrow();
        assertTrue(co.flagged(QualityFlag.ABSORBANCE_TOO_HIGH), "CO peaks near 0.24 absorbance");
        CompoundResult no = new Quantifier(PreparedMethod.prepare(limited.build(), SyntheticGas.AXIS), "l", "v",
                false).quantify(Sample.of(sample)).compound("NO").orElseThrow();
        assertFalse(no.residuals().get(0).aboveLimit());
        assertTrue(no.residuals().get(1).aboveLimit());
        assertTrue(no.flagged(QualityFlag.RESIDUAL_ABOVE_LIMIT));
        assertFalse(no.flagged(QualityFlag.ABSORBANCE_TOO_HIGH));
    }

    @Test
    void reportsInTheMethodsUnit() {
        QuantificationMethod ppb = Mixture.method().reportingUnit(ReportingUnit.PPB).build();
        CompoundResult n2o = new Quantifier(PreparedMethod.prepare(ppb, SyntheticGas.AXIS), "l", "v", false)
                .quantify(Sample.of(Mixture.noisy(clean, new Random(7)))).compound("N2O").orElseThrow();
        assertEquals(n2o.concentration() * 1000, n2o.reported(n2o.concentration()), 1e-12);
    }

    @Test
    void refusesSampleOnAnotherAxis() {
        Spectrum other = new Spectrum(org.tracegas.spectrum.SpectralAxis.uniform(
                org.tracegas.spectrum.AxisUnit.WAVENUMBER, 600.0, 0.25, 6801), clean, Ordinate.ABSORBANCE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> quantifier(false).quantify(Sample.of(other)));
        assertTrue(e.getMessage().contains("axis"), e.getMessage());
        double[] bad = clean.clone();
        bad[SyntheticGas.AXIS.nearestIndex(1850)] = Double.NaN;
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class, () -> quantifier(false)
                .quantify(Sample.of(new Spectrum(SyntheticGas.AXIS, bad, Ordinate.ABSORBANCE))));
        assertTrue(nan.getMessage().contains("index " + SyntheticGas.AXIS.nearestIndex(1850)), nan.getMessage());
    }

    /**
     * Noise five times larger above 1875 cm-1: with weights 1/sigma^2 the fit stays unbiased, its standard
     * uncertainty covers the truth in 60-76 % of 250 draws (68.3 % expected, normal distribution) and is smaller
     * than that of the unweighted fit (weighted least squares is the best linear unbiased estimator: Gauss-Markov
     * theorem, any regression text).
     */
    @Test
    void weightsFollowUnequalNoise() {
        int n = SyntheticGas.AXIS.size();
        double[] sigma = new double[n];
        double[] weights = new double[n];
        for (int i = 0; i < n; i++) {
            sigma[i] = Mixture.NOISE * (SyntheticGas.AXIS.get(i) > 1875 ? 5 : 1);
            weights[i] = 1 / (sigma[i] * sigma[i]);
        }
        java.util.function.Function<Boolean, QuantificationMethod> method = weighted -> {
            QuantificationMethod.Builder b = QuantificationMethod.builder("NO").pathLengthMetres(Mixture.PATH)
                    .analyte(new Analyte("NO", java.util.List.of("H2O"),
                            java.util.List.of(Mixture.region(1800, 1950, 1))));
            for (String g : new String[] {"NO", "H2O"}) {
                b.reference(SyntheticGas.named(g).reference(Mixture.referenceAmount(g), 0));
            }
            if (weighted) {
                b.weights(new Spectrum(SyntheticGas.AXIS, weights, Ordinate.ARBITRARY));
            }
            return b.build();
        };
        Quantifier weightedFit = new Quantifier(PreparedMethod.prepare(method.apply(true), SyntheticGas.AXIS), "l",
                "v", false);
        Quantifier plainFit = new Quantifier(PreparedMethod.prepare(method.apply(false), SyntheticGas.AXIS), "l",
                "v", false);
        Random random = new Random(404);
        int draws = 250;
        int covered = 0;
        double weightedU = 0;
        double plainU = 0;
        double truth = Mixture.TRUTH.get("NO");
        for (int d = 0; d < draws; d++) {
            double[] a = clean.clone();
            for (int i = 0; i < n; i++) {
                a[i] += sigma[i] * random.nextGaussian();
            }
            Sample sample = Sample.of(new Spectrum(SyntheticGas.AXIS, a, Ordinate.ABSORBANCE));
            CompoundResult w = weightedFit.quantify(sample).compounds().get(0);
            CompoundResult p = plainFit.quantify(sample).compounds().get(0);
            if (Math.abs(w.concentration() - truth) <= w.standardUncertainty()) {
                covered++;
            }
            weightedU += w.standardUncertainty() / draws;
            plainU += p.standardUncertainty() / draws;
        }
        double fraction = covered / (double) draws;
        assertTrue(fraction >= 0.60 && fraction <= 0.76, "covered in " + fraction);
        assertTrue(weightedU < 0.8 * plainU, "weighted " + weightedU + ", unweighted " + plainU);
    }
}
