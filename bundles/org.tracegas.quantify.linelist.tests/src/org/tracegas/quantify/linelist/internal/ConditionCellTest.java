package org.tracegas.quantify.linelist.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.spectrum.SpectralAxis;

class ConditionCellTest {

    private static final InstrumentLineShape LINE_SHAPE = InstrumentLineShape.forResolution(
            Apodization.NORTON_BEER_MEDIUM, 0.5);
    private static final double PATH = 5.0;

    private static ConditionCell cell() {
        return new ConditionCell(List.of(MixtureModelTest.band()), 300.0, 101.0, PATH, LINE_SHAPE, 0, 2125, 2155);
    }

    /**
     * The observed transmittance at conditions inside the cell, from optical depths interpolated between its
     * corners, against the library computing the band's optical depth line by line at exactly those conditions, on
     * the same grid and seen through the same instrument: equal within 2e-6 over the fit range, beside lines whose
     * transmittance falls below 0.3 (at the time of writing 1.1e-6).
     */
    @Test
    void interpolatedConditionsSeeWhatTheLineByLineModelComputesThere() {
        double t = 300.2;
        double p = 101.3;
        double amount = 2500;
        FineGridSpectrometer instrument = new FineGridSpectrometer(List.of(MixtureModelTest.band()),
                MixtureModel.nominal(300, 101, PATH), LINE_SHAPE, 0, 2125, 2155);
        SpectralAxis grid = instrument.grid();
        MixtureModel inside = cell().at(t, p);
        assertEquals(grid, inside.grid());
        MixtureModel there = new MixtureModel(instrument, MixtureModel.opticalDepthPerAmount(
                List.of(MixtureModelTest.band()), grid, MixtureModel.nominal(t, p, PATH)));
        double[] seen = inside.observeAlone(0, amount);
        double[] truth = there.observeAlone(0, amount);
        double worst = 0;
        double deepest = 1;
        for (int i = 0; i < grid.size(); i++) {
            if (grid.get(i) >= 2125 && grid.get(i) <= 2155) {
                worst = Math.max(worst, Math.abs(seen[i] - truth[i]));
                deepest = Math.min(deepest, truth[i]);
            }
        }
        System.out.println("condition cell: largest difference " + worst + ", lowest transmittance " + deepest);
        assertTrue(deepest < 0.3, "the band must saturate, lowest transmittance " + deepest);
        assertTrue(worst < 2e-6, "largest difference " + worst);
    }

    /** The cell holding a condition starts at the multiple of the step at or below it. */
    @Test
    void cellsStartAtMultiplesOfTheStep() {
        assertEquals(300.0, ConditionCell.lowerCorner(300.49, ConditionCell.TEMPERATURE_STEP), 0);
        assertEquals(300.5, ConditionCell.lowerCorner(300.5, ConditionCell.TEMPERATURE_STEP), 0);
        assertEquals(96.5, ConditionCell.lowerCorner(96.99, ConditionCell.PRESSURE_STEP), 0);
    }

    @Test
    void refusesConditionsOutsideTheCell() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> cell().at(300.2, 101.6));
        assertEquals("pressure 101.6 kPa lies outside the cell [101.0, 101.5] kPa", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> cell().at(299.9, 101.2));
        assertEquals("temperature 299.9 K lies outside the cell [300.0, 300.5] K", e.getMessage());
    }
}
