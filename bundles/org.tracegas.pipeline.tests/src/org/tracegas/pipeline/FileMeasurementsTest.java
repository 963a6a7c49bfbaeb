package org.tracegas.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.importer.jcamp.JcampReader;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.SpectralContent;
import org.tracegas.store.NewMeasurement;
import org.tracegas.store.RawFile;

/**
 * JCAMP-DX files written by hand (labels as IUPAC JCAMP-DX 4.24 and 5.01 name them, from memory) read as
 * measurements: time, title, kind and cell conditions from the labels or from the lab's defaults, the bytes kept
 * as they are, and a missing time named by file, line and label.
 */
class FileMeasurementsTest {

    @TempDir
    Path folder;

    private final ReaderRegistry readers = new ReaderRegistry().register("jcamp", "JCAMP-DX", new JcampReader());

    private Path jcamp(String name, String labels, String yUnits) throws Exception {
        return Files.writeString(folder.resolve(name), "##TITLE=Kiln 5 stack 1\n##JCAMP-DX=5.01\n"
                + "##DATA TYPE=INFRARED SPECTRUM\n" + labels + "##XUNITS=1/CM\n##YUNITS=" + yUnits + "\n"
                + "##XFACTOR=1\n##YFACTOR=0.001\n##FIRSTX=2000\n##LASTX=2001.5\n##DELTAX=0.5\n##NPOINTS=4\n"
                + "##XYDATA=(X++(Y..Y))\n2000 100 200 300 400\n##END=\n");
    }

    @Test
    void labelsGiveTimeTitleKindAndConditions() throws Exception {
        Path f = jcamp("stack-1.jdx", "##LONGDATE=2026/05/04 06:30:00\n##TEMPERATURE=40\n##$CELL PRESSURE=1009\n"
                + "##$KIND=background\n", "TRANSMITTANCE");
        FileMeasurements.Read read = FileMeasurements.read(readers, f, FileMeasurements.Defaults.none());
        NewMeasurement m = read.measurements().get(0);
        assertEquals(Instant.parse("2026-05-04T06:30:00Z"), m.time(), "a time without zone is UTC");
        assertEquals("Kiln 5 stack 1", m.title());
        assertEquals(MeasurementKind.BACKGROUND, m.kind());
        // ##TEMPERATURE is in degrees Celsius (JCAMP-DX 4.24, from memory); 0 degC = 273.15 K (SI Brochure)
        assertEquals(313.15, m.cellTemperature(), 1e-12);
        assertEquals(1009.0, m.cellPressure());
        assertEquals(SpectralContent.TRANSMITTANCE, m.content());
        assertEquals(0.3, m.spectrum().get(2), 1e-12);
        assertEquals(RawFile.sha256Hex(Files.readAllBytes(f)), read.file().sha256());
        assertEquals("stack-1.jdx", read.file().fileName());
    }

    @Test
    void dateAndTimeLabelsAndTheLabsDefaults() throws Exception {
        Path f = jcamp("stack-2.jdx", "##DATE=26/05/04\n##TIME=07:15:00\n", "ABSORBANCE");
        NewMeasurement m = FileMeasurements.read(readers, f, new FileMeasurements.Defaults(null, null, 296.0,
                1013.25)).measurements().get(0);
        assertEquals(Instant.parse("2026-05-04T07:15:00Z"), m.time());
        assertEquals(MeasurementKind.SAMPLE, m.kind());
        assertEquals(296.0, m.cellTemperature());
        assertEquals(1013.25, m.cellPressure());
    }

    @Test
    void aMissingTimeOrConditionIsNamedByFileLineAndLabel() throws Exception {
        Path f = jcamp("stack-3.jdx", "", "ABSORBANCE");
        ImportException noTime = assertThrows(ImportException.class, () -> FileMeasurements.read(readers, f,
                FileMeasurements.Defaults.none()));
        assertEquals("##LONGDATE", noTime.field());
        assertEquals(f.toString(), noTime.source());
        assertEquals(1, noTime.line(), "the record's first line");
        ImportException noPressure = assertThrows(ImportException.class, () -> FileMeasurements.read(readers, f,
                new FileMeasurements.Defaults(null, Instant.EPOCH, 296.0, null)));
        assertEquals("##$CELL PRESSURE", noPressure.field());
        Path arbitrary = jcamp("stack-4.jdx", "##LONGDATE=2026/05/04 06:30:00\n", "ARBITRARY UNITS");
        ImportException unstated = assertThrows(ImportException.class, () -> FileMeasurements.read(readers,
                arbitrary, new FileMeasurements.Defaults(null, null, 296.0, 1013.25)));
        assertTrue(unstated.getMessage().contains("single beam"), unstated.getMessage());
    }
}
