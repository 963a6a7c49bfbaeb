package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracegas.library.Compound;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.library.synthesis.ReferenceSynthesizer;
import org.tracegas.library.synthesis.SpectralLine;
import org.tracegas.library.synthesis.SynthesisRequest;
import org.tracegas.preprocess.Apodization;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * References and samples from the line-by-line synthesis (Voigt lines, instrument line shape at 1 cm-1 resolution,
 * 0.5 cm-1 axis). The instrument line shape acts on transmittance, so the apparent absorbance of narrow lines
 * grows less than in proportion to the amount: the interpolation between references corrects for that.
 */
class LineByLineReferenceTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000.0, 0.5, 601);
    /** Second radiation constant hc/k in cm K (CODATA, from memory, rounded). */
    private static final double C2 = 1.4388;
    private static final double[] AMOUNTS = {100, 200, 400, 800};

    private static ReferenceSynthesizer coLike;
    private static ReferenceSynthesizer n2oLike;

    /** An invented diatomic band: P and R branches up to J = 30, lines of 0.07 cm-1/atm air half width. */
    private static LineByLineModel band(int molecule, double centre, double b, double peak) {
        List<SpectralLine> lines = new ArrayList<>();
        for (int m = -30; m <= 30; m++) {
            if (m == 0) {
                continue;
            }
            int j = m > 0 ? m - 1 : -m;
            double lower = b * j * (j + 1);
            double v = centre + 2 * b * m - 0.01 * m * m;
            double s = peak * Math.abs(m) * Math.exp(-C2 * lower / 296.0) / 7.0;
            lines.add(new SpectralLine(molecule, 1, v, s, 30.0, 0.07, 0.08, lower, 0.72, 0.0));
        }
        return new LineByLineModel(new LineList("invented band at " + centre, lines), 28.0,
                PowerLawPartitionFunction.linearMolecule());
    }

    @BeforeAll
    static void models() {
        coLike = new ReferenceSynthesizer(band(5, 2143.0, 1.92, 4.5e-19),
                new Compound("Carbon monoxide", "630-08-0", "CO", 28.0101));
        n2oLike = new ReferenceSynthesizer(band(4, 2224.0, 0.42, 1.0e-19),
                new Compound("Nitrous oxide", "10024-97-2", "N2O", 44.013));
    }

    private static double[] synthesize(ReferenceSynthesizer synthesizer, double ppmMetres) {
        SynthesisRequest request = new SynthesisRequest(new AbsorptionPath(296.0, 101.325, ppmMetres, 1.0), AXIS,
                Apodization.NORTON_BEER_MEDIUM, 1.0, 0.02);
        return synthesizer.synthesize(request).spectrum().toArray();
    }

    private static QuantificationMethod method(boolean nonlinearity) {
        QuantificationMethod.Builder b = QuantificationMethod.builder("line by line").pathLengthMetres(1.0)
                .nonlinearity(nonlinearity).maxAbsorbance(3.0)
                .analyte(new Analyte("CO", List.of("N2O"), List.of(AnalysisRegion.of(2040, 2250, 1))));
        for (double amount : AMOUNTS) {
            b.reference(new ReferenceSpectrum("CO", new Spectrum(AXIS, synthesize(coLike, amount),
                    Ordinate.ABSORBANCE), amount));
        }
        b.reference(new ReferenceSpectrum("N2O", new Spectrum(AXIS, synthesize(n2oLike, 100), Ordinate.ABSORBANCE),
                100));
        return b.build();
    }

    private static PreparedMethod nonlinear;
    private static PreparedMethod linear;

    @BeforeAll
    static void methods() {
        nonlinear = PreparedMethod.prepare(method(true), AXIS);
        linear = PreparedMethod.prepare(method(false), AXIS);
    }

    /**
     * CO at 300 ppm·m with N2O at 20 ppm·m, each synthesized on its own and added (weak N2O: the sum is close to
     * the joint transmittance): the interpolating fit recovers CO within 1 %; the pooled linear fit, dominated by
     * the 800 ppm·m reference, is more than 5 % off.
     */
    @Test
    void recoversAmountBetweenSynthesizedReferences() {
        double[] co = synthesize(coLike, 300);
        double[] n2o = synthesize(n2oLike, 20);
        double[] sample = new double[co.length];
        for (int i = 0; i < sample.length; i++) {
            sample[i] = co[i] + n2o[i] + 0.005;
        }
        Sample s = Sample.of(new Spectrum(AXIS, sample, Ordinate.ABSORBANCE));
        CompoundResult fromNonlinear = new Quantifier(nonlinear, "synthetic", "test", false).quantify(s).compounds()
                .get(0);
        CompoundResult fromLinear = new Quantifier(linear, "synthetic", "test", false).quantify(s).compounds().get(0);
        assertEquals(300, fromNonlinear.concentration(), 3.0);
        assertTrue(Math.abs(fromLinear.concentration() - 300) > 15,
                "linear " + fromLinear.concentration() + ", interpolated " + fromNonlinear.concentration());
        assertTrue(fromNonlinear.iterations() > 0);
    }
}
