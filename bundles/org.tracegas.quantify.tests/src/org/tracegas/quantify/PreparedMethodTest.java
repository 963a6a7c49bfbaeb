package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class PreparedMethodTest {

    private static QuantificationMethod.Builder hclCh4(List<String> hclInterferents, List<String> ch4Interferents) {
        return QuantificationMethod.builder("HCl and CH4").pathLengthMetres(Mixture.PATH)
                .analyte(new Analyte("HCl", hclInterferents, List.of(AnalysisRegion.of(2700, 3100, 2))))
                .analyte(new Analyte("CH4", ch4Interferents, List.of(AnalysisRegion.of(2700, 3100, 2))))
                .reference(SyntheticGas.named("HCl").reference(100, 0))
                .reference(SyntheticGas.named("CH4").reference(100, 0));
    }

    /** Analytes fitted with the same compounds in the same regions share one system and one solution. */
    @Test
    void analytesWithTheSameFitShareOneSystem() {
        PreparedMethod shared = PreparedMethod.prepare(hclCh4(List.of("CH4"), List.of("HCl")).build(),
                SyntheticGas.AXIS);
        assertEquals(1, shared.systemCount());
        assertEquals(8, PreparedMethod.prepare(Mixture.method().build(), SyntheticGas.AXIS).systemCount());
        PreparedMethod alone = PreparedMethod.prepare(QuantificationMethod.builder("CH4").pathLengthMetres(Mixture.PATH)
                .analyte(new Analyte("CH4", List.of("HCl"), List.of(AnalysisRegion.of(2700, 3100, 2))))
                .reference(SyntheticGas.named("HCl").reference(100, 0))
                .reference(SyntheticGas.named("CH4").reference(100, 0)).build(), SyntheticGas.AXIS);
        Sample sample = Sample.of(Mixture.noisy(Mixture.clean(Mixture.TRUTH), new Random(11)));
        CompoundResult fromShared = new Quantifier(shared, "l", "v", false).quantify(sample).compound("CH4")
                .orElseThrow();
        CompoundResult fromAlone = new Quantifier(alone, "l", "v", false).quantify(sample).compound("CH4")
                .orElseThrow();
        // the same least-squares problem with the columns in another order: equal to rounding
        assertEquals(fromAlone.concentration(), fromShared.concentration(), 1e-12 * fromAlone.concentration());
        assertEquals(fromAlone.standardUncertainty(), fromShared.standardUncertainty(),
                1e-9 * fromAlone.standardUncertainty());
    }

    @Test
    void refusesReferenceThatDoesNotCoverARegion() {
        SpectralAxis shortAxis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2800, 0.5, 401);
        double[] a = new double[401];
        a[200] = 0.1;
        QuantificationMethod m = hclCh4(List.of(), List.of()).reference(
                new ReferenceSpectrum("HCl", new Spectrum(shortAxis, a, Ordinate.ABSORBANCE), 300)).build();
        String message = assertThrows(IllegalArgumentException.class,
                () -> PreparedMethod.prepare(m, SyntheticGas.AXIS)).getMessage();
        assertTrue(message.contains("fit of HCl") && message.contains("300.0 ppm·m")
                && message.contains("2700.0 cm-1"), message);
    }

    @Test
    void refusesCompoundsThatCannotBeToldApart() {
        QuantificationMethod m = QuantificationMethod.builder("twins").pathLengthMetres(1)
                .analyte(new Analyte("CO", List.of("COcopy"), List.of(AnalysisRegion.of(2040, 2200, 1))))
                .reference(SyntheticGas.named("CO").reference(100, 0))
                .reference(new ReferenceSpectrum("COcopy", SyntheticGas.named("CO").reference(100, 0).absorbance(),
                        100))
                .build();
        String message = assertThrows(IllegalArgumentException.class,
                () -> PreparedMethod.prepare(m, SyntheticGas.AXIS)).getMessage();
        assertTrue(message.startsWith("fit of CO has columns that cannot be told apart"), message);
    }

    @Test
    void refusesRegionWithTooFewPoints() {
        QuantificationMethod m = QuantificationMethod.builder("narrow").pathLengthMetres(1)
                .analyte(new Analyte("CO", List.of(), List.of(AnalysisRegion.of(2100.1, 2100.9, 1))))
                .reference(SyntheticGas.named("CO").reference(100, 0)).build();
        String message = assertThrows(IllegalArgumentException.class,
                () -> PreparedMethod.prepare(m, SyntheticGas.AXIS)).getMessage();
        assertTrue(message.contains("region 0") && message.contains("too few"), message);
    }

    @Test
    void refusesAxisNotInWavenumbers() {
        SpectralAxis microns = SpectralAxis.uniform(AxisUnit.MICROMETRE, 2, 0.01, 100);
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> PreparedMethod.prepare(Mixture.method().build(), microns)).getMessage().startsWith("axis"));
    }

    /** References on another (coarser, descending) axis are resampled onto the sample axis. */
    @Test
    void resamplesReferencesGivenOnAnotherAxis() {
        SpectralAxis descending = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 3200, -0.25, 2001);
        double[] k = SyntheticGas.named("HCl").absorptivity(descending, 0, 2.0);
        for (int i = 0; i < k.length; i++) {
            k[i] *= 100;
        }
        QuantificationMethod m = QuantificationMethod.builder("HCl").pathLengthMetres(1)
                .analyte(new Analyte("HCl", List.of(), List.of(AnalysisRegion.of(2750, 3000, 0))))
                .reference(new ReferenceSpectrum("HCl", new Spectrum(descending, k, Ordinate.ABSORBANCE), 100)).build();
        double[] sample = SyntheticGas.named("HCl").absorptivity(SyntheticGas.AXIS, 0, 2.0);
        for (int i = 0; i < sample.length; i++) {
            sample[i] *= 42;
        }
        CompoundResult r = new Quantifier(PreparedMethod.prepare(m, SyntheticGas.AXIS), "l", "v", false)
                .quantify(Sample.of(new Spectrum(SyntheticGas.AXIS, sample, Ordinate.ABSORBANCE))).compounds().get(0);
        // the sample axis points lie on the reference axis (0.5 is two steps of 0.25), so resampling is exact
        assertEquals(42, r.concentration(), 42e-12);
    }
}
