package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;

import org.junit.jupiter.api.Test;

class ConcentrationLevelTest {

    private static ConcentrationTrace trace(String unit, double... values) {
        double[] hours = new double[values.length];
        for (int i = 0; i < hours.length; i++) {
            hours[i] = i;
        }
        return new ConcentrationTrace("X", unit, hours, values, new BitSet());
    }

    @Test
    void onePercentByVolumeIsTenThousandPpmAndTheMedianDecides() {
        // 1 % by volume = 10,000 ppm (definition of ppm as a volume fraction of 1e-6)
        assertTrue(ConcentrationLevel.major(trace("ppm", 10_000, 10_000, 10_000)));
        assertFalse(ConcentrationLevel.major(trace("ppm", 9_999, 9_999, 9_999)));
        // one spike does not make a trace gas major, nor one dip a major component a trace gas
        assertFalse(ConcentrationLevel.major(trace("ppm", 40, 41, 50_000, 39, 42)));
        assertTrue(ConcentrationLevel.major(trace("ppm", 95_000, 94_000, 3, 96_000, 97_000)));
    }

    @Test
    void percentAndPpbAreConvertedAndUnknownUnitsCountAsTraceGases() {
        assertTrue(ConcentrationLevel.major(trace("vol%", 9.5, 10.1)));
        assertTrue(ConcentrationLevel.major(trace("%", 1.0)));
        assertFalse(ConcentrationLevel.major(trace("ppb", 5_000_000)));
        assertTrue(ConcentrationLevel.major(trace("ppb", 20_000_000)));
        assertFalse(ConcentrationLevel.major(trace("mg/m3", 1e6)));
        assertFalse(ConcentrationLevel.major(trace("ppm")));
    }

    @Test
    void theMedianOfALongRecordIsTakenFromAnEvenSample() {
        double[] v = new double[86_400];
        for (int i = 0; i < v.length; i++) {
            v[i] = i;
        }
        v[5] = Double.NaN;
        // the median of 0 .. 86399 is 43199.5; the sample takes every 21st value, so it lands within 21 of it
        assertEquals(43_199.5, ConcentrationLevel.median(v), 21);
        assertEquals(2.5, ConcentrationLevel.median(new double[] {1, 2, 3, 4}), 0.0);
        assertTrue(Double.isNaN(ConcentrationLevel.median(new double[] {Double.NaN})));
    }
}
