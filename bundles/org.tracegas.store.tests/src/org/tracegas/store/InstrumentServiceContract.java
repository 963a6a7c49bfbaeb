package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.WorkspaceFactory;

/** The lab's instruments and the instrument of each measurement, on each backend, with an invented analyzer. */
abstract class InstrumentServiceContract extends AnalysisFixtureContract {

    private static final Instant T0 = Instant.parse("2026-05-04T06:00:00Z");


    private InstrumentService instruments() {
        return f.store.instruments();
    }

    /**
     * An invented bench analyzer: a HeNe reference laser, 15798 cm-1 (632.99 nm in air; common practice, no
     * source), 1 cm maximum path difference for a nominal 1 cm-1 resolution (the resolution is the reciprocal of
     * the maximum path difference for an unapodized interferogram; from memory, Griffiths and de Haseth, Fourier
     * Transform Infrared Spectrometry, ch. 2) and a multipass cell of 6.4 m.
     */
    private static Instrument bench() {
        Instrument i = WorkspaceFactory.eINSTANCE.createInstrument();
        i.setName("Bench analyzer 2");
        i.setSerialNumber("TB-2026-0007");
        i.setLaserWavenumber(15798.0);
        i.setMaxPathDifference(1.0);
        i.setCellPathLength(6.4);
        return i;
    }

    private String measurement(int minute) {
        return f.store.projects().recordMeasurement(f.analyst, f.project.getId(), MeasurementKind.SAMPLE,
                T0.plusSeconds(60L * minute), 438.15, 1013.0);
    }

    @Test
    void anInstrumentIsRecordedOnceByNameAndSerialNumberWithItsFigures() throws Exception {
        Instrument stored = instruments().record(f.analyst, bench());
        assertEquals(stored.getId(), instruments().record(f.reader, bench()).getId());
        assertEquals(1, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'instrument'"));

        Instrument read = instruments().find(f.reader, "Bench analyzer 2", "TB-2026-0007").orElseThrow();
        assertEquals(15798.0, read.getLaserWavenumber());
        assertEquals(1.0, read.getMaxPathDifference());
        assertEquals(6.4, read.getCellPathLength());
        assertFalse(read.isSetFieldOfView(), "no field of view was given");
        assertTrue(instruments().find(f.reader, "Bench analyzer 2", "TB-2026-0008").isEmpty());

        Instrument aperture = bench();
        aperture.setSerialNumber("TB-2026-0008");
        aperture.setFieldOfView(15.9);
        instruments().record(f.analyst, aperture);
        assertEquals(List.of("TB-2026-0007", "TB-2026-0008"), instruments().instruments(f.reader).stream()
                .map(Instrument::getSerialNumber).toList());
        assertEquals(15.9, instruments().instruments(f.reader).get(1).getFieldOfView());

        // another cell under the same name and serial number is another set-up, named apart
        Instrument longerCell = bench();
        longerCell.setCellPathLength(10.0);
        assertTrue(assertThrows(StoreException.class, () -> instruments().record(f.analyst, longerCell))
                .getMessage().startsWith("cellPathLength: "));
        Instrument withAperture = bench();
        withAperture.setFieldOfView(15.9);
        assertTrue(assertThrows(StoreException.class, () -> instruments().record(f.analyst, withAperture))
                .getMessage().startsWith("fieldOfView: "));
        WorkspaceVerification v = f.store.audit().verifyWorkspace(List.of());
        assertTrue(v.intact(), v.dataFindings().toString());
    }

    @Test
    void figuresThatCannotBeAreRefusedNamingTheFieldAndNothingIsWritten() throws Exception {
        long records = f.count("SELECT COUNT(*) FROM audit_record");
        Instrument noLaser = bench();
        noLaser.setLaserWavenumber(0);
        assertEquals("laserWavenumber (cm-1) must be positive and finite, was 0.0", assertThrows(
                IllegalArgumentException.class, () -> instruments().record(f.analyst, noLaser)).getMessage());
        Instrument nanPath = bench();
        nanPath.setMaxPathDifference(Double.NaN);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> instruments().record(f.analyst, nanPath))
                .getMessage().startsWith("maxPathDifference (cm)"));
        Instrument negativeView = bench();
        negativeView.setFieldOfView(-1);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> instruments().record(f.analyst,
                negativeView)).getMessage().startsWith("fieldOfView (mrad)"));
        Instrument noCell = bench();
        noCell.setCellPathLength(Double.POSITIVE_INFINITY);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> instruments().record(f.analyst, noCell))
                .getMessage().startsWith("cellPathLength (m)"));
        Instrument noSerial = bench();
        noSerial.setSerialNumber("");
        assertEquals("serialNumber must not be blank", assertThrows(IllegalArgumentException.class,
                () -> instruments().record(f.analyst, noSerial)).getMessage());
        assertEquals(0, f.count("SELECT COUNT(*) FROM instrument"));
        assertEquals(records, f.count("SELECT COUNT(*) FROM audit_record"));
    }

    @Test
    void aMeasurementReadsBackWithTheInstrumentThatMadeIt() throws Exception {
        Instrument bench = instruments().record(f.analyst, bench());
        List<ProcessedSpectrum> block = new ArrayList<>(SampleBlocks.madeBy(bench.getId(),
                SampleBlocks.block(0, 2, 1, f.method.getId(), f.library.getId())));
        block.add(SampleBlocks.processed(2, 1, f.method.getId(), f.library.getId())); // of no known instrument
        List<String> stored = f.store.blocks().store(f.analyst, f.project.getId(), block).stream()
                .map(StoredMeasurement::measurementId).toList();
        String recorded = measurement(3);

        List<Measurement> read = f.store.projects().measurements(f.reader, f.project.getId());
        assertEquals(List.of(stored.get(0), stored.get(1), stored.get(2), recorded),
                read.stream().map(Measurement::getId).toList());
        assertEquals("TB-2026-0007", read.get(0).getInstrument().getSerialNumber());
        assertEquals(15798.0, read.get(0).getInstrument().getLaserWavenumber());
        assertSame(read.get(0).getInstrument(), read.get(1).getInstrument());
        assertNull(read.get(2).getInstrument());
        assertNull(read.get(3).getInstrument());
        WorkspaceVerification v = f.store.audit().verifyWorkspace(List.of());
        assertTrue(v.intact(), v.dataFindings().toString());
    }
}
