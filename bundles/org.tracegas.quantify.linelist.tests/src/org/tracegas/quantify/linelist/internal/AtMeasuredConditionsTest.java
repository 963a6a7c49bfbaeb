package org.tracegas.quantify.linelist.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.library.synthesis.SpectralLine;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.PreparedFit;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.linelist.LineListAlgorithm;
import org.tracegas.quantify.linelist.LineListSetup;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** The fits prepared per measured cell conditions, over one invented band, prepared by the line-list algorithm. */
class AtMeasuredConditionsTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2120, 0.25, 161);
    private static final LineByLineModel BAND = band();
    private static final LineListSetup SETUP = new LineListSetup(Map.of("TX1", BAND), 308.15, 99.8,
            InstrumentLineShape.forResolution(Apodization.NORTON_BEER_MEDIUM, 0.5), 0);
    private static final QuantificationMethod METHOD = QuantificationMethod.builder("Vellmar kiln hot cell")
            .pathLengthMetres(6.2).algorithm(new LineListAlgorithm(SETUP))
            .analyte(new Analyte("TX1", List.of(), List.of(AnalysisRegion.of(2125, 2155, 1)))).build();

    private static LineByLineModel band() {
        List<SpectralLine> lines = new ArrayList<>();
        for (int m = -6; m <= 6; m++) {
            if (m != 0) {
                lines.add(new SpectralLine(90, 1, 2140 + 3.5 * m, 2e-19, 1, 0.065, 0.075, 50.0 * m * m, 0.7, 0));
            }
        }
        return new LineByLineModel(new LineList("invented", lines), 28, PowerLawPartitionFunction.linearMolecule());
    }

    /** The band's absorbance at 470 K and 97 kPa, 600 ppm·m, seen through the method's line shape. */
    private static Sample hotSample() {
        Spectrum t = SETUP.lineShape().apply(BAND.transmittance(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2100,
                0.01, 8001), new AbsorptionPath(470, 97, 600 / 6.2, 6.2)));
        double[] a = new double[AXIS.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = -Math.log10(t.get(t.axis().nearestIndex(AXIS.get(i))));
        }
        return Sample.of(new Spectrum(AXIS, a, Ordinate.ABSORBANCE));
    }

    /** One preparation per lattice cell, and within it each sample's own conditions. */
    @Test
    void preparesOncePerCellAndFitsEachSampleAtItsOwnConditions() {
        List<double[]> prepared = new ArrayList<>();
        List<double[]> fitted = new ArrayList<>();
        AtMeasuredConditions fit = new AtMeasuredConditions(METHOD.name(),
                new LineListAlgorithm(SETUP).prepare(METHOD, AXIS), (t0, p0) -> {
                    prepared.add(new double[] {t0, p0});
                    return (t, p) -> {
                        fitted.add(new double[] {t, p});
                        return new LineListAlgorithm(SETUP.at(t, p)).prepare(METHOD, AXIS);
                    };
                });
        Sample hot = hotSample();
        double first = fit.fit(hot.inCell(470.1, 97.2), false).get(0).concentration();
        double same = fit.fit(hot.inCell(470.1, 97.2), false).get(0).concentration();
        double near = fit.fit(hot.inCell(470.4, 97.0), false).get(0).concentration();
        fit.fit(hot.inCell(470.6, 97.0), false);
        assertEquals(2, prepared.size());
        assertArrayEquals(new double[] {470.0, 97.0}, prepared.get(0), 1e-12);
        assertArrayEquals(new double[] {470.5, 97.0}, prepared.get(1), 1e-12);
        assertArrayEquals(new double[] {470.4, 97.0}, fitted.get(2), 0);
        assertEquals(first, same);
        assertNotEquals(first, near);
    }

    /**
     * The line-list algorithm at measured conditions, interpolating within a cell, against the same method computed
     * line by line at exactly the sample's conditions: the concentrations agree within 5e-4 of their value (at the
     * time of writing 1.6e-4), and to the last bit at the cell's lower corner, whose grid the cell uses. Inside, most
     * of the difference is that of the fine grid, the lower corner's rather than the sample's own: the cubic reading
     * of the grid lies differently between the fit points. The interpolation itself is checked by ConditionCellTest.
     * The hot sample is noise-free, so the fit's stated uncertainty (1.4e-4 of the value here) only measures how
     * far the method's model and the sample's synthesis differ; a minute's noisy spectrum has ten times more.
     */
    @Test
    void interpolatedConditionsFitAsThoseComputedThere() {
        double t = 470.23;
        double p = 97.31;
        Sample hot = hotSample().inCell(t, p);
        PreparedFit measured = new LineListAlgorithm(new LineListSetup(SETUP.models(), 308.15, 99.8,
                SETUP.lineShape(), SETUP.fieldOfView(), true)).prepare(METHOD, AXIS);
        CompoundResult interpolated = measured.fit(hot, false).get(0);
        CompoundResult there = new LineListAlgorithm(SETUP.at(t, p)).prepare(METHOD, AXIS).fit(hot, false).get(0);
        double relative = interpolated.concentration() / there.concentration() - 1;
        System.out.println("interpolated conditions: concentration " + interpolated.concentration() + " against "
                + there.concentration() + " computed there (" + relative + "), u " + there.standardUncertainty());
        assertEquals(0, relative, 5e-4);
        Sample atCorner = hotSample().inCell(470.0, 97.0);
        assertEquals(new LineListAlgorithm(SETUP.at(470.0, 97.0)).prepare(METHOD, AXIS).fit(atCorner, false).get(0)
                .concentration(), measured.fit(atCorner, false).get(0).concentration());
    }

    @Test
    void refusesASampleWithoutConditions() {
        PreparedFit fit = new LineListAlgorithm(new LineListSetup(SETUP.models(), 308.15, 99.8, SETUP.lineShape(),
                SETUP.fieldOfView(), true)).prepare(METHOD, AXIS);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> fit.fit(hotSample(), false));
        assertTrue(e.getMessage().contains("Vellmar kiln hot cell") && e.getMessage().contains("no temperature"),
                e.getMessage());
    }
}
