package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.io.FileFormatException;

class HitranLineListReaderTest {

    @TempDir
    Path dir;

    /**
     * A record written field by field after the published layout (Rothman et al., JQSRT 96 (2005) 139, table 1:
     * I2, I1, F12.6, E10.3, E10.3, F5.4, F5.3, F10.4, F4.2, F8.6, then quanta); the values are invented.
     */
    @Test
    void readsEveryFieldFromItsColumns() throws IOException {
        String record = " 51 2143.271100 4.123E-19 1.250E+01.0712 .081   11.5350 .72-.002500";
        record += " ".repeat(160 - record.length());
        Path file = write("one.par", record);
        SpectralLine l = new HitranLineListReader().read(file).get(0);
        assertEquals(5, l.moleculeId());
        assertEquals(1, l.isotopologue());
        assertEquals(2143.2711, l.wavenumber(), 0.0);
        assertEquals(4.123e-19, l.intensity(), 0.0);
        assertEquals(12.5, l.einsteinA(), 0.0);
        assertEquals(0.0712, l.airHalfWidth(), 0.0);
        assertEquals(0.081, l.selfHalfWidth(), 0.0);
        assertEquals(11.535, l.lowerStateEnergy(), 0.0);
        assertEquals(0.72, l.temperatureExponent(), 0.0);
        assertEquals(-0.0025, l.pressureShift(), 0.0);
    }

    @Test
    void generatedListRoundTripsSortedByWavenumber() throws IOException {
        List<SpectralLine> lines = SyntheticLineListGenerator.coLikeBand(200, 7);
        List<String> records = new ArrayList<>();
        lines.forEach(l -> records.add(HitranLineListWriter.record(l)));
        Path file = dir.resolve("band.par");
        Files.write(file, records);
        LineList read = new HitranLineListReader().read(file);
        List<SpectralLine> expected = new ArrayList<>(lines);
        expected.sort(Comparator.comparingDouble(SpectralLine::wavenumber));
        assertEquals(expected, read.lines());
        assertEquals("band.par", read.name());
    }

    @Test
    void badFieldNamesFileLineAndColumns() throws IOException {
        String good = HitranLineListWriter.record(SyntheticLineListGenerator.coLikeBand(0, 1).get(0));
        String bad = good.substring(0, 35) + "x.071" + good.substring(40);
        Path file = write("bad.par", good + "\n" + bad);
        FileFormatException e = assertThrows(FileFormatException.class, () -> new HitranLineListReader().read(file));
        assertEquals(2, e.line());
        assertEquals("air half width", e.field());
        assertTrue(e.getMessage().contains("bad.par") && e.getMessage().contains("columns 36-40"), e.getMessage());
    }

    @Test
    void shortRecordIsRejectedWithItsLength() throws IOException {
        Path file = write("short.par", " 51 2143.271100 4.123E-19");
        FileFormatException e = assertThrows(FileFormatException.class, () -> new HitranLineListReader().read(file));
        assertEquals(1, e.line());
        assertTrue(e.getMessage().contains("has 25"), e.getMessage());
    }

    @Test
    void negativeIntensityIsRejectedWithTheLine() throws IOException {
        String good = HitranLineListWriter.record(SyntheticLineListGenerator.coLikeBand(0, 1).get(0));
        String bad = good.substring(0, 15) + "-1.000E-20" + good.substring(25);
        Path file = write("neg.par", bad);
        FileFormatException e = assertThrows(FileFormatException.class, () -> new HitranLineListReader().read(file));
        assertTrue(e.getMessage().contains("line 1") && e.getMessage().contains("intensity"), e.getMessage());
    }

    private Path write(String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, text);
        return file;
    }
}
