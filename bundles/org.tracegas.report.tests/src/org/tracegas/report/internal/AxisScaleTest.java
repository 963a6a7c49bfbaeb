package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class AxisScaleTest {

    @Test
    void coveringWidensToWholeTicks() {
        AxisScale s = AxisScale.covering(3.2, 97.0, 5);
        assertEquals(20.0, s.step(), 0);
        assertEquals(List.of(0.0, 20.0, 40.0, 60.0, 80.0, 100.0), s.ticks());
        assertEquals("40", s.label(40));
    }

    @Test
    void tightKeepsTheDataRange() {
        AxisScale s = AxisScale.tight(2780, 2980, 6);
        assertEquals(2780, s.low(), 0);
        assertEquals(2980, s.high(), 0);
        assertEquals(List.of(2800.0, 2850.0, 2900.0, 2950.0), s.ticks());
    }

    @Test
    void smallStepsGetDecimals() {
        AxisScale s = AxisScale.covering(-0.0017, 0.0019, 4);
        assertEquals(0.001, s.step(), 1e-18);
        assertEquals("-0.002", s.label(s.ticks().get(0)));
        assertEquals("0.000", s.label(s.ticks().get(2)));
    }

    @Test
    void constantDataGetARange() {
        AxisScale s = AxisScale.covering(5, 5, 4);
        assertEquals(0.5, s.fraction(5), 1e-12);
    }
}
