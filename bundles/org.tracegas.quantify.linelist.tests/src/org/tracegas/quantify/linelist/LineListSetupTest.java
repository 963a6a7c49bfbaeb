package org.tracegas.quantify.linelist;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.library.synthesis.SpectralLine;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;

class LineListSetupTest {

    private static final InstrumentLineShape LINE_SHAPE = InstrumentLineShape.forResolution(Apodization.BOXCAR, 1);
    private static final LineByLineModel MODEL = new LineByLineModel(new LineList("one line",
            List.of(new SpectralLine(90, 1, 2100, 1e-19, 1, 0.07, 0.08, 10, 0.7, 0))), 28,
            PowerLawPartitionFunction.linearMolecule());

    @Test
    void keepsAnUnmodifiableCopyOfTheModels() {
        Map<String, LineByLineModel> models = new HashMap<>(Map.of("TX1", MODEL));
        LineListSetup setup = new LineListSetup(models, 300, 101, LINE_SHAPE, 0);
        models.clear();
        assertEquals(Map.of("TX1", MODEL), setup.models());
        assertThrows(UnsupportedOperationException.class, () -> setup.models().clear());
    }

    @Test
    void movesToOtherConditionsKeepingTheRest() {
        LineListSetup measured = new LineListSetup(Map.of("TX1", MODEL), 300, 101, LINE_SHAPE, 0.004, true);
        assertEquals(new LineListSetup(Map.of("TX1", MODEL), 470, 97, LINE_SHAPE, 0.004, true), measured.at(470, 97));
        assertEquals(false, new LineListSetup(Map.of("TX1", MODEL), 300, 101, LINE_SHAPE, 0).measuredConditions());
        assertMessage("temperature", () -> measured.at(-1, 97));
    }

    @Test
    void refusesWhatNoCellOrInstrumentHas() {
        Map<String, LineByLineModel> models = Map.of("TX1", MODEL);
        Map<String, LineByLineModel> withNull = new HashMap<>();
        withNull.put("TX1", null);
        assertMessage("models", () -> new LineListSetup(Map.of(), 300, 101, LINE_SHAPE, 0));
        assertMessage("no null", () -> new LineListSetup(withNull, 300, 101, LINE_SHAPE, 0));
        assertMessage("temperature", () -> new LineListSetup(models, 0, 101, LINE_SHAPE, 0));
        assertMessage("pressure", () -> new LineListSetup(models, 300, Double.NaN, LINE_SHAPE, 0));
        assertMessage("lineShape", () -> new LineListSetup(models, 300, 101, null, 0));
        assertMessage("fieldOfView", () -> new LineListSetup(models, 300, 101, LINE_SHAPE, 0.2));
        assertMessage("fieldOfView", () -> new LineListSetup(models, 300, 101, LINE_SHAPE, -1e-3));
    }

    private static void assertMessage(String part, org.junit.jupiter.api.function.Executable build) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, build);
        assertTrue(e.getMessage().contains(part), e.getMessage());
    }
}
