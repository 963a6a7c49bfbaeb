package org.tracegas.qa.basis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.library.Compound;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.library.synthesis.PhysicalConstants;
import org.tracegas.library.synthesis.PublishedMolecularConstants;
import org.tracegas.library.synthesis.ReferenceSynthesizer;
import org.tracegas.library.synthesis.SpectralLine;
import org.tracegas.library.synthesis.SynthesisRequest;
import org.tracegas.preprocess.Apodization;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.Sample;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class ConditionsCorrectionTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000.0, 0.25, 1201);
    private static final double TRUE_PPM = 10.0;

    /**
     * A CO-like fundamental (B = 1.93 cm-1, origin 2143 cm-1, J up to 45 so that no population is cut off at
     * 470 K), 296 K intensities from the Boltzmann populations, air width 0.06 cm-1/atm with exponent 0.72, and
     * Q(T) from the published constants of CO.
     */
    private static LineByLineModel coLikeBand() {
        double b = 1.93;
        List<SpectralLine> lines = new ArrayList<>();
        for (int m = -45; m <= 45; m++) {
            if (m == 0) {
                continue;
            }
            int j = m > 0 ? m - 1 : -m;
            double lower = b * j * (j + 1);
            double v = 2143.0 + 2 * b * m - 0.0175 * m * m;
            double s = 4.0e-20 * Math.abs(m) * Math.exp(-PhysicalConstants.C2 * lower / 296.0);
            lines.add(new SpectralLine(5, 1, v, s, 30.0, 0.06, 0.07, lower, 0.72, 0.0));
        }
        return new LineByLineModel(new LineList("CO-like band", lines), 28.01,
                PublishedMolecularConstants.forFormula("CO").orElseThrow());
    }

    private static Spectrum synthesize(ReferenceSynthesizer s, double temperatureK, double pressureKPa, double ppm) {
        return s.synthesize(new SynthesisRequest(new AbsorptionPath(temperatureK, pressureKPa, ppm, 1.0), AXIS,
                Apodization.NORTON_BEER_MEDIUM, 0.5, 0.02)).spectrum();
    }

    /**
     * The physics, not the correction, makes the truth: references and sample are each synthesized line by line
     * at their own cell conditions (number density, Voigt widths, intensities at temperature), the sample holding
     * 10 ppm at 470 K and 97 kPa, the reference 10 ppm·m at 453 K and 101.3 kPa. The fit alone reads the sample's
     * 8 % fewer molecules as 8 % less gas; corrected with the EPA FTIR Protocol's ratios it is within 1 %.
     */
    @Test
    void sampleHotterAndAtLowerPressureThanTheReferencesIsRecoveredWithinOnePercent() {
        ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(coLikeBand(),
                new Compound("Carbon monoxide", "630-08-0", "CO", 28.01));
        QuantificationMethod method = QuantificationMethod.builder("conditions").pathLengthMetres(1.0)
                .nonlinearity(false).maxAbsorbance(3.0)
                .analyte(new Analyte("CO", List.of(), List.of(AnalysisRegion.of(2040, 2250, 1))))
                .reference(new ReferenceSpectrum("CO", synthesize(synthesizer, 453.0, 101.3, TRUE_PPM), TRUE_PPM))
                .build();
        Quantifier quantifier = new Quantifier(PreparedMethod.prepare(method, AXIS), "synthetic", "test", false);
        double calculated = quantifier.quantify(Sample.of(synthesize(synthesizer, 470.0, 97.0, TRUE_PPM)))
                .compounds().get(0).concentration();

        CellConditions cell = new CellConditions(ConditionValue.firstOf(470.0, null, 438.15),
                ConditionValue.firstOf(null, 97.0, 101.3), 1.0, PathOrigin.NOMINAL);
        ConditionsCorrection.CorrectedConcentration c = new ConditionsCorrection(453.0, 101.3, 1.0)
                .correct(calculated, cell);

        assertTrue(Math.abs(calculated / TRUE_PPM - 1) > 0.05, "uncorrected " + calculated);
        assertEquals(TRUE_PPM, c.corrected(), 0.01 * TRUE_PPM, "uncorrected " + calculated);
        assertEquals(ConditionOrigin.FILE_LABEL, c.sample().temperatureK().origin());
        assertEquals(ConditionOrigin.INSTRUMENT_CHANNEL, c.sample().pressureKPa().origin());
    }

    @Test
    void ratiosOfPathTemperatureAndPressureAsWrittenInTheProtocol() {
        // EPA FTIR Protocol section 11.2 (not confirmed against the official text): with a CTS-derived 5.00 m
        // against the 4.85 m of the fit, 470 K against 453 K and 97 kPa against 101.3 kPa:
        // (4.85/5.00)(470/453)(101.3/97) = 0.97 x 1.037528 x 1.044330 = 1.051015
        CellConditions cell = new CellConditions(new ConditionValue(470.0, ConditionOrigin.METHOD_STATED),
                new ConditionValue(97.0, ConditionOrigin.METHOD_STATED), 5.00, PathOrigin.CTS_DERIVED);
        ConditionsCorrection.CorrectedConcentration c = new ConditionsCorrection(453.0, 101.3, 4.85).correct(100.0,
                cell);
        assertEquals(1.051015, c.factor(), 1e-6);
        assertEquals(105.1015, c.corrected(), 1e-4);
        assertEquals(PathOrigin.CTS_DERIVED, c.sample().pathOrigin());
    }

    @Test
    void methodStatedValuesAreTheLastResort() {
        assertEquals(new ConditionValue(438.15, ConditionOrigin.METHOD_STATED), ConditionValue.firstOf(null, null,
                438.15));
        assertEquals(ConditionOrigin.FILE_LABEL, ConditionValue.firstOf(437.0, 439.0, 438.15).origin());
    }
}
