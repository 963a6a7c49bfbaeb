package org.tracegas.report.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.WorkspaceFactory;

/** The instrument lines of a report, from the measurements of an invented campaign with two analyzers. */
class ReportedInstrumentsTest {

    private static Instrument analyzer(String id, String serial) {
        Instrument i = WorkspaceFactory.eINSTANCE.createInstrument();
        i.setId(id);
        i.setName("Bench analyzer");
        i.setSerialNumber(serial);
        // HeNe reference laser (632.99 nm in air; common practice, no source), 0.5 cm for a nominal 2 cm-1
        i.setLaserWavenumber(15798.0);
        i.setMaxPathDifference(0.5);
        i.setCellPathLength(6.4);
        return i;
    }

    private static Measurement made(Instrument by) {
        Measurement m = WorkspaceFactory.eINSTANCE.createMeasurement();
        m.setInstrument(by);
        return m;
    }

    @Test
    void eachInstrumentIsStatedOnceWithItsFiguresInTheOrderItFirstMeasured() {
        Instrument second = analyzer("b", "TB-0008");
        second.setFieldOfView(15.9);
        Instrument first = analyzer("a", "TB-0007");
        List<String> lines = ReportedInstruments.lines(List.of(made(first), made(null), made(second), made(first)));
        assertEquals(List.of("Bench analyzer, serial TB-0007: reference laser 15798 cm-1, maximum path difference"
                + " 0.5 cm, field of view not recorded, cell path length 6.4 m",
                "Bench analyzer, serial TB-0008: reference laser 15798 cm-1, maximum path difference 0.5 cm, field"
                        + " of view 15.9 mrad half-angle, cell path length 6.4 m"), lines);
        assertEquals(List.of(), ReportedInstruments.lines(List.of(made(null))));
    }
}
