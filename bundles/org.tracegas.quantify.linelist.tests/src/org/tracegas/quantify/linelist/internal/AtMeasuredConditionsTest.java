package org.tracegas.quantify.linelist.internal;

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

    @Test
    void preparesOncePerConditionsToAHundredthOfAKelvinAndAThousandthOfAKilopascal() {
        List<double[]> prepared = new ArrayList<>();
        AtMeasuredConditions fit = new AtMeasuredConditions(METHOD.name(),
                new LineListAlgorithm(SETUP).prepare(METHOD, AXIS), (t, p) -> {
                    prepared.add(new double[] {t, p});
                    return new LineListAlgorithm(SETUP.at(t, p)).prepare(METHOD, AXIS);
                });
        Sample hot = hotSample();
        double first = fit.fit(hot.inCell(470.001, 97.0002), false).get(0).concentration();
        double same = fit.fit(hot.inCell(470.004, 96.9996), false).get(0).concentration();
        double other = fit.fit(hot.inCell(470.02, 97), false).get(0).concentration();
        assertEquals(2, prepared.size());
        assertEquals(470.0, prepared.get(0)[0], 1e-12);
        assertEquals(97.0, prepared.get(0)[1], 1e-12);
        assertEquals(first, same);
        assertNotEquals(first, other);
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
