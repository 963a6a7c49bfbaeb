package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class LineByLineModelTest {

    private static final double BOLTZMANN = 1.380649e-23; // CODATA 2018, exact

    static LineByLineModel singleLine(double intensity, double airWidth, LineCutoff cutoff) {
        SpectralLine line = new SpectralLine(5, 1, 2100.0, intensity, 1.0, airWidth, airWidth, 0.0, 0.7, 0.0);
        return new LineByLineModel(new LineList("one line", List.of(line)), 28.0101,
                PowerLawPartitionFunction.linearMolecule(), FaddeevaFunction.standard(), cutoff);
    }

    /** Absorber molecules per cm^3 from the ideal gas law n = x p / (kT), computed here independently. */
    static double density(double ppm, double kPa, double kelvin) {
        return ppm * 1e-6 * kPa * 1e3 / (BOLTZMANN * kelvin) * 1e-6;
    }

    private static double integral(double[] values, double step) {
        double sum = 0.5 * (values[0] + values[values.length - 1]);
        for (int i = 1; i < values.length - 1; i++) {
            sum += values[i];
        }
        return sum * step;
    }

    /**
     * Beer-Lambert for an isolated, optically thin line: the integral of -ln T over the line is S N L (any
     * spectroscopy text, e.g. the HITRAN definitions). The Lorentz wings beyond the 50 cm-1 cut-off hold
     * 2 gamma / (pi 50) = 0.09 % of the area, within the 0.5 % allowed.
     */
    @Test
    void thinLineIntegratesToIntensityTimesColumn() {
        LineByLineModel model = singleLine(1e-21, 0.07, LineCutoff.wavenumbers(50));
        AbsorptionPath path = new AbsorptionPath(296.0, 101.325, 100.0, 1.0);
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2050.0, 0.005, 20_001);
        double[] t = model.transmittance(axis, path).toArray();
        for (int i = 0; i < t.length; i++) {
            t[i] = -Math.log(t[i]);
        }
        double expected = 1e-21 * density(100.0, 101.325, 296.0) * 100.0;
        assertEquals(expected, integral(t, 0.005), 0.005 * expected);
    }

    /** The same at 1 kPa, where the Doppler width dominates, with a cut-off of 200 Voigt half widths. */
    @Test
    void thinDopplerLineIntegratesToIntensityTimesColumn() {
        LineByLineModel model = singleLine(1e-21, 0.07, LineCutoff.halfWidths(200));
        AbsorptionPath path = new AbsorptionPath(296.0, 1.0, 1000.0, 1.0);
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2099.0, 0.0002, 10_001);
        double[] tau = model.opticalDepth(axis, path).toArray();
        double expected = 1e-21 * density(1000.0, 1.0, 296.0) * 100.0;
        assertEquals(expected, integral(tau, 0.0002), 0.005 * expected);
    }

    /**
     * Curve of growth of a Lorentz line (Ladenburg and Reiche 1913; e.g. Goody and Yung, Atmospheric Radiation,
     * from memory): the equivalent width W = integral of (1 - T) grows linearly with the column u while the line
     * is thin and as 2 sqrt(S u gamma) once it is strongly saturated, so four times the column gives twice W.
     * The 1 atm width (0.07 cm-1) is 28 times the Doppler width, the cut-off of 500 cm-1 leaves 0.3 % of W.
     */
    @Test
    void saturatedLineFollowsTheSquareRootCurveOfGrowth() {
        LineByLineModel model = singleLine(1e-19, 0.07, LineCutoff.wavenumbers(500));
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1600.0, 0.01, 100_001);
        double thin1 = equivalentWidth(model, axis, 0.01);
        double thin4 = equivalentWidth(model, axis, 0.04);
        assertEquals(4.0, thin4 / thin1, 0.01);
        double strong1 = equivalentWidth(model, axis, 1e4);
        double strong4 = equivalentWidth(model, axis, 4e4);
        assertEquals(2.0, strong4 / strong1, 0.02);
        double su = 1e-19 * density(1e4, 101.325, 296.0) * 1e4;
        assertEquals(2 * Math.sqrt(su * 0.07), strong1, 0.01 * strong1);
    }

    private static double equivalentWidth(LineByLineModel model, SpectralAxis axis, double ppm) {
        double[] t = model.transmittance(axis, new AbsorptionPath(296.0, 101.325, ppm, 100.0)).toArray();
        for (int i = 0; i < t.length; i++) {
            t[i] = 1 - t[i];
        }
        return integral(t, axis.step());
    }

    @Test
    void lineIsNotEvaluatedBeyondItsCutoff() {
        LineByLineModel model = singleLine(1e-19, 0.07, LineCutoff.wavenumbers(5));
        AbsorptionPath path = new AbsorptionPath(296.0, 101.325, 100.0, 1.0);
        Spectrum tau = model.opticalDepth(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2090.0, 0.5, 41), path);
        assertEquals(0.0, tau.get(9), 0.0);
        assertTrue(tau.get(10) > 0);
        assertTrue(tau.get(30) > 0);
        assertEquals(0.0, tau.get(31), 0.0);
    }

    @Test
    void rejectsANonUniformGrid() {
        LineByLineModel model = singleLine(1e-19, 0.07, LineCutoff.standard());
        AbsorptionPath path = new AbsorptionPath(296.0, 101.325, 100.0, 1.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> model.transmittance(SpectralAxis.of(AxisUnit.WAVENUMBER, 2000, 2001, 2003), path));
        assertTrue(e.getMessage().contains("uniform"), e.getMessage());
    }
}
