package org.tracegas.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.method.MethodRecipe;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.qa.basis.ConditionOrigin;
import org.tracegas.qa.basis.ConditionValue;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.ReportingUnit;
import org.tracegas.quantify.ReprocessingRecord;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * A fitted concentration corrected from the references' cell to the sample cell, EPA FTIR Protocol section 11.2
 * (standards notes): C_corr = (L_r/L_s)(T_s/T_r)(p_r/p_s) C_calc; the noise factor F of the transform widens the
 * uncertainty by sqrt(F).
 */
class ResultCorrectionTest {

    private static final String HASH = "c".repeat(64);

    /** A Gaussian reference band of 0.01 peak absorbance; its shape does not enter the cell correction. */
    private static Spectrum band(double centre) {
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 401);
        double[] v = new double[axis.size()];
        for (int i = 0; i < v.length; i++) {
            double d = axis.get(i) - centre;
            v[i] = 0.01 * Math.exp(-d * d / 8);
        }
        return new Spectrum(axis, v, Ordinate.ABSORBANCE);
    }

    private static QuantificationMethod method() {
        return QuantificationMethod.builder("Kiln CO").pathLengthMetres(4.85)
                .analyte(new Analyte("CO", List.of(), List.of(AnalysisRegion.of(2040, 2140, 1))))
                .reference(new ReferenceSpectrum("CO", band(2090), 100))
                .reference(new ReferenceSpectrum("CO", band(2090.5), 400)).build();
    }

    private static StoredMethod stored(double secondTemperature) {
        return new StoredMethod(method(), TransformSettings.defaults(), "lib-1", HASH, MethodRecipe.none(), 0.5,
                List.of(new ReferenceConditions(100, 423.15, 101.325, 0.5, "happ-genzel"),
                        new ReferenceConditions(400, secondTemperature, 101.325, 0.5, "happ-genzel")));
    }

    private static SpectrumResult fitted(double ppm, double u) {
        return new SpectrumResult(List.of(new CompoundResult("CO", ppm, u, 3 * u, ReportingUnit.PPM, List.of(),
                Set.of(), 0, Double.NaN, Double.NaN, Double.NaN, Optional.empty())),
                new ReprocessingRecord(HASH, HASH, "0.1.0", HASH));
    }

    @Test
    void aHotterCellAtLowerPressureReadsHigherByTheProtocolRatios() {
        ResultCorrection correction = ResultCorrection.of(stored(423.15));
        Result r = correction.results(fitted(100.0, 1.0), new AnalysisVersions("m-1", "l-1"),
                new ConditionValue(433.15, ConditionOrigin.INSTRUMENT_CHANNEL),
                new ConditionValue(98.0, ConditionOrigin.FILE_LABEL), 2.0, "transform of the method").get(0);
        // (433.15 / 423.15) (101.325 / 98.0), worked by hand: 1.0236323 x 1.0339286 = 1.0583627
        double factor = 1.0583627;
        assertEquals(100.0 * factor, r.getConcentration(), 1e-5);
        assertEquals(1.0 * factor, r.getStandardUncertainty(), 1e-7);
        assertEquals(3.0 * factor, r.getDetectionLimit(), 3e-7);
        ResultConditions c = r.getConditions();
        assertEquals(factor, c.correctionFactor(), 1e-7);
        assertEquals("instrument-channel", c.temperatureOrigin());
        assertEquals("file-label", c.pressureOrigin());
        assertEquals(4.85, c.pathM());
        assertEquals("nominal", c.pathOrigin());
        assertEquals(423.15, c.referenceTemperatureK());
        assertEquals(101.325, c.referencePressureKPa());
        assertEquals(2.0, c.noiseFactor());
        assertEquals("transform of the method", c.noiseFactorOrigin());
    }

    @Test
    void aCtsDerivedPathThreePercentLongerLowersEveryValueByThatRatio() {
        // C_corr = (L_r/L_s)(T_s/T_r)(p_r/p_s) C_calc (EPA FTIR Protocol 11.2): the cell at the references' T and
        // p with L_s = 1.03 L_r gives 1/1.03 = 0.9708738 (worked by hand)
        Result r = ResultCorrection.of(stored(423.15)).withCtsPath(1.03 * 4.85).results(fitted(100.0, 1.0),
                new AnalysisVersions("m", "l"), new ConditionValue(423.15, ConditionOrigin.METHOD_STATED),
                new ConditionValue(101.325, ConditionOrigin.METHOD_STATED), 1.0, ResultCorrection.NO_TRANSFORM)
                .get(0);
        assertEquals(97.08738, r.getConcentration(), 1e-5);
        assertEquals(0.9708738, r.getStandardUncertainty(), 1e-7);
        assertEquals(1.03 * 4.85, r.getConditions().pathM(), 1e-12);
        assertEquals("cts-derived", r.getConditions().pathOrigin());
        assertEquals(4.85, r.getConditions().fitPathM());
        StoredMethod bare = new StoredMethod(method(), TransformSettings.defaults(), "lib-1", HASH);
        assertThrows(IllegalArgumentException.class, () -> ResultCorrection.of(bare).withCtsPath(5.0));
        assertThrows(IllegalArgumentException.class, () -> ResultCorrection.of(stored(423.15)).withCtsPath(0));
    }

    @Test
    void theFactorAQaReadingGetsIsTheOneItsResultsGet() {
        // (433.15 / 423.15) (101.325 / 98.0) = 1.0583627 as above; with L_s = 1.03 L_r, 1.0583627 / 1.03 =
        // 1.0275366 (worked by hand); a compound the method has no correction for stays as fitted
        ResultCorrection correction = ResultCorrection.of(stored(423.15));
        assertEquals(1.0583627, correction.factor("CO", 433.15, 98.0), 1e-7);
        assertEquals(1.0275366, correction.withCtsPath(1.03 * 4.85).factor("CO", 433.15, 98.0), 1e-7);
        assertEquals(1.0, correction.factor("N2O", 433.15, 98.0));
        assertEquals(1.0, ResultCorrection.none().factor("CO", 433.15, 98.0));
    }

    @Test
    void theCellAtTheReferencesConditionsLeavesTheValueAsFitted() {
        Result r = ResultCorrection.of(stored(423.15)).results(fitted(42.0, 0.5), new AnalysisVersions("m", "l"),
                new ConditionValue(423.15, ConditionOrigin.METHOD_STATED),
                new ConditionValue(101.325, ConditionOrigin.METHOD_STATED), 1.0, ResultCorrection.NO_TRANSFORM)
                .get(0);
        assertEquals(42.0, r.getConcentration(), 1e-12);
        assertEquals(1.0, r.getConditions().correctionFactor(), 1e-15);
    }

    @Test
    void aMethodWithoutReferenceConditionsStoresResultsAsFitted() {
        StoredMethod bare = new StoredMethod(method(), TransformSettings.defaults(), "lib-1", HASH);
        Result r = ResultCorrection.of(bare).results(fitted(42.0, 0.5), new AnalysisVersions("m", "l"),
                new ConditionValue(433.15, ConditionOrigin.INSTRUMENT_CHANNEL),
                new ConditionValue(98.0, ConditionOrigin.INSTRUMENT_CHANNEL), 2.0, "transform").get(0);
        assertEquals(42.0, r.getConcentration());
        assertNull(r.getConditions());
    }

    @Test
    void theResultsOfAFitCarryTheRunsVersionsWithTheFitsSoftwareAndInput() {
        Result r = ResultCorrection.none().results(fitted(42.0, 0.5), new AnalysisVersions("m-7", "l-3"), null, null,
                1.0, null).get(0);
        assertEquals(new Provenance("m-7", "l-3", "0.1.0", HASH), r.getProvenance());
        assertNull(r.getMeasurementId(), "the store assigns the measurement");
        assertNull(r.getId());
    }

    @Test
    void referencesOfOneCompoundAtTwoTemperaturesAreRefusedNamingIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ResultCorrection.of(stored(296.0)));
        assertTrue(e.getMessage().contains("references of CO"), e.getMessage());
        assertTrue(e.getMessage().contains("296.0 K"), e.getMessage());
    }

    @Test
    void theUncertaintyWidensBySqrtFAndNeverNarrows() {
        // zero filling by 2 of an unapodized interferogram doubles F (InterferogramTransform's noise factor):
        // the standard deviation of a fitted amount grows by sqrt 2 (common practice, no source)
        assertEquals(Math.sqrt(2.0), ResultCorrection.noiseCorrelation(2.0), 1e-15);
        assertEquals(1.0, ResultCorrection.noiseCorrelation(0.8));
    }
}
