package org.tracegas.importer.delimited;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

class DelimitedReaderTest {

    private final DelimitedReader reader = new DelimitedReader();
    private final ImportOptions options = ImportOptions.defaults();

    private static String resource(String name) throws IOException {
        try (InputStream in = DelimitedReaderTest.class.getResourceAsStream(name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static Spectrum spectrum(ImportedData d, int i) {
        return ((ImportedSpectrum) d.records().get(i)).spectrum();
    }

    @Test
    void csvWithHeaderGivesOneSpectrumPerColumn() throws Exception {
        ImportedData d = reader.read(resource("absorbance.csv"), "a.csv", options);
        assertEquals(2, d.records().size());
        assertArrayEquals(new double[] {4000.0, 3999.5, 3999.0}, spectrum(d, 0).axis().toArray(), 0.0);
        assertEquals(AxisUnit.WAVENUMBER, spectrum(d, 0).axis().unit());
        assertArrayEquals(new double[] {0.010, 0.012, 0.015}, spectrum(d, 0).toArray(), 0.0);
        assertArrayEquals(new double[] {0.5, 0.5, 0.25}, spectrum(d, 1).toArray(), 0.0);
        assertEquals(Ordinate.ABSORBANCE, spectrum(d, 1).ordinate());
        assertEquals("Absorbance reference", d.records().get(1).metadata().get(DelimitedReader.COLUMN));
        assertEquals(1, d.records().get(0).firstLine());
        assertEquals(4, d.records().get(0).lastLine());
    }

    @Test
    void semicolonWithDecimalCommaAndUnitsRow() throws Exception {
        ImportedData d = reader.read(resource("decimal-comma.csv"), "d.csv", options);
        assertEquals(1, d.records().size());
        // "1000,5" is 1000.5 with a decimal comma; "-1,5E-3" is -0.0015
        assertArrayEquals(new double[] {1000.5, 1001.5, 1002.5}, spectrum(d, 0).axis().toArray(), 0.0);
        assertArrayEquals(new double[] {0.125, -1.5e-3, 2}, spectrum(d, 0).toArray(), 0.0);
        assertEquals("WAVENUMBER", d.records().get(0).metadata().get(DelimitedReader.AXIS_UNIT_IN_FILE));
        assertEquals("Absorbance AU", d.records().get(0).metadata().get(DelimitedReader.COLUMN));
        assertEquals("semicolon, decimal comma", d.records().get(0).metadata().get("dialect"));
    }

    @Test
    void wavelengthAxisIsKeptOrConverted() throws Exception {
        ImportedData kept = reader.read(resource("wavelength.tsv"), "w.tsv", options);
        assertEquals(AxisUnit.MICROMETRE, spectrum(kept, 0).axis().unit());
        assertArrayEquals(new double[] {2.0, 2.5, 4.0}, spectrum(kept, 0).axis().toArray(), 0.0);
        assertEquals(Ordinate.TRANSMITTANCE, spectrum(kept, 0).ordinate());

        ImportedData converted = reader.read(resource("wavelength.tsv"), "w.tsv",
                options.withWavelengthToWavenumber(true));
        Spectrum s = spectrum(converted, 0);
        // wavenumber in cm-1 = 1e4 / wavelength in micrometres (definition): 4 um -> 2500, 2.5 -> 4000, 2 -> 5000
        assertEquals(AxisUnit.WAVENUMBER, s.axis().unit());
        assertArrayEquals(new double[] {2500, 4000, 5000}, s.axis().toArray(), 1e-9);
        assertArrayEquals(new double[] {0.7, 0.8, 0.9}, s.toArray(), 0.0);
        assertEquals("MICROMETRE", converted.records().get(0).metadata().get(DelimitedReader.AXIS_UNIT_IN_FILE));
    }

    @Test
    void headerlessFileNeedsAnAssumedUnit() throws Exception {
        String text = "1000\t1\n1001\t2\n";
        ImportException e = assertThrows(ImportException.class, () -> reader.read(text, "h.tsv", options));
        assertEquals("column 1", e.field());
        Spectrum s = spectrum(reader.read(text, "h.tsv", options.withAssumedAxisUnit(AxisUnit.WAVENUMBER)), 0);
        assertArrayEquals(new double[] {1, 2}, s.toArray(), 0.0);
    }

    @Test
    void badInputNamesFileLineAndField() {
        assertError("Wavenumber (cm-1),A\n1,2\n2,NaN\n", 3, "A", "not a finite number");
        assertError("Wavenumber (cm-1),A\n1,2\n3,2\n2,2\n", 4, "Wavenumber (cm-1)", "monotonic");
        assertError("Frequency (Hz),A\n1,2\n2,3\n", 1, "Frequency (Hz)", "unknown axis unit");
        assertError("Wavenumber (cm-1),A\n1,2\n2,3,4\n", 3, "row", "fields");
        assertError("Wavenumber (cm-1),A\n1,2\n2,\n", 3, "A", "empty field");
        assertError("\n\n", 0, "file", "empty");
        assertError("just text\nmore text\n", 1, "separator", "");
    }

    private void assertError(String text, long line, String field, String reason) {
        ImportException e = assertThrows(ImportException.class, () -> reader.read(text, "bad.csv", options));
        assertEquals("bad.csv", e.source());
        assertEquals(line, e.line(), e.getMessage());
        assertEquals(field, e.field(), e.getMessage());
        assertTrue(e.reason().contains(reason), e.getMessage());
    }

    @Test
    void recognisesNumericTableByContentAndRefusesLargeFiles(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("export.dat");
        Files.writeString(f, resource("absorbance.csv"));
        assertTrue(reader.recognise(Files.readAllBytes(f), "export.dat").confidence() >= 0.5);
        assertEquals(0, reader.recognise("##TITLE=x\n".getBytes(StandardCharsets.US_ASCII), "x.csv").confidence());
        ImportException e = assertThrows(ImportException.class, () -> reader.read(f, options.withMaxWholeFileBytes(10)));
        assertEquals("file size", e.field());
        assertEquals(2, reader.read(f, options).records().size());
    }
}
