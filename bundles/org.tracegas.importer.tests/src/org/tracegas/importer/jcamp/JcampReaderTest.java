package org.tracegas.importer.jcamp;

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
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedInterferogram;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * Hand-written files, one per compression form, all holding the same eight ordinates. The expected values follow
 * from the ASDF rules of IUPAC JCAMP-DX 4.24 (McDonald & Wilks, Appl. Spectrosc. 42, 151 (1988); from memory):
 * <ul>
 * <li>affn.jdx: "1000 10 20 30 40" is X=1000 and Y=10,20,30,40; with ##YFACTOR=0.001 the ordinates are
 * 0.010,0.020,0.030,0.040, and the second line gives 0.035,0.025,-0.005,0.</li>
 * <li>pac.jdx: a '+' or '-' starts a new number, so "1000+10+20+30+40" splits as in AFFN.</li>
 * <li>sqz.jdx: the leading digit and sign become one letter: A0 = +10, B0 = +20, C5 = +35, e = -5, @ = 0.</li>
 * <li>dif.jdx: A0 = 10, then DIF J0 = +10 three times gives 20, 30, 40. The line ends in DIF form, so the next
 * line starts with the Y check D0 = 40 at X=1003 (the abscissa of point 4), which is dropped; then n = -5 gives
 * 35, j0 = -10 gives 25, l0 = -30 gives -5, N = +5 gives 0. The last line "1007@" only repeats the check
 * value 0 at X=1007.</li>
 * <li>mixed.jdx: AFFN 10, SQZ B0 = 20, DIF J0 = +10 gives 30, SQZ D0 = 40 (the line ends in SQZ form, so no Y
 * check follows); then AFFN 35, SQZ B5 = 25, DIF l0 = -30 gives -5, DIF N = +5 gives 0, and the check line.</li>
 * <li>difdup.jdx (##YFACTOR=1, ##XFACTOR=0.5): E = 5, DIF % = 0 with DUP U = 3 occurrences gives 5,5,5, then
 * K = +2 gives 7; the next line starts at X=2008·0.5 = 1004 with the check G = 7, then K = +2 with DUP T = 2
 * gives 9, 11, and % gives 11 again.</li>
 * </ul>
 */
class JcampReaderTest {

    private static final double[] EXPECTED = {0.010, 0.020, 0.030, 0.040, 0.035, 0.025, -0.005, 0.0};

    private final JcampReader reader = new JcampReader();

    static String resource(String name) throws IOException {
        try (InputStream in = JcampReaderTest.class.getResourceAsStream(name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private Spectrum spectrumOf(String name) throws Exception {
        ImportedData data = reader.read(resource(name), name);
        assertEquals(1, data.records().size());
        return ((ImportedSpectrum) data.records().get(0)).spectrum();
    }

    @ParameterizedTest
    @ValueSource(strings = {"affn.jdx", "pac.jdx", "sqz.jdx", "dif.jdx", "mixed.jdx"})
    void everyCompressionFormGivesTheHandComputedOrdinates(String name) throws Exception {
        Spectrum s = spectrumOf(name);
        assertArrayEquals(EXPECTED, s.toArray(), 1e-15, name);
        assertEquals(Ordinate.ABSORBANCE, s.ordinate());
        assertEquals(AxisUnit.WAVENUMBER, s.axis().unit());
        assertEquals(1000.0, s.axis().first());
        assertEquals(1007.0, s.axis().last());
        assertEquals(1.0, s.axis().step());
    }

    @Test
    void difWithDupAndXFactor() throws Exception {
        Spectrum s = spectrumOf("difdup.jdx");
        assertArrayEquals(new double[] {5, 5, 5, 5, 7, 9, 11, 11}, s.toArray(), 0.0);
        assertEquals(Ordinate.ARBITRARY, s.ordinate());
    }

    @Test
    void linkedBlocksGiveOneRecordPerBlockWithTheirIds() throws Exception {
        ImportedData data = reader.read(resource("linked.jdx"), "linked.jdx");
        assertEquals(2, data.records().size());
        ImportedSpectrum t = (ImportedSpectrum) data.records().get(0);
        // XYPOINTS scaled by XFACTOR 0.01 and YFACTOR 0.01
        assertArrayEquals(new double[] {2.5, 2.6, 2.7, 2.8}, t.spectrum().axis().toArray(), 1e-12);
        assertArrayEquals(new double[] {0.95, 0.90, 0.80, 0.85}, t.spectrum().toArray(), 1e-12);
        assertEquals(AxisUnit.MICROMETRE, t.spectrum().axis().unit());
        assertEquals(Ordinate.TRANSMITTANCE, t.spectrum().ordinate());
        assertEquals("1", t.metadata().get("BLOCK_ID"));
        assertEquals(5, t.firstLine());
        assertEquals(17, t.lastLine());
        ImportedSpectrum peaks = (ImportedSpectrum) data.records().get(1);
        assertEquals("2", peaks.metadata().get("BLOCK_ID"));
        assertEquals("BLOCK_ID=1", peaks.metadata().get("CROSS REFERENCE"));
        assertArrayEquals(new double[] {2.7}, peaks.spectrum().axis().toArray(), 0.0);
        assertArrayEquals(new double[] {0.80}, peaks.spectrum().toArray(), 0.0);
        assertEquals("JCAMP-DX 5.01", data.format());
    }

    @Test
    void interferogramOnAnOpticalPathDifferenceAxis() throws Exception {
        ImportedData data = reader.read(resource("interferogram-cm.jdx"), "i.jdx");
        Interferogram i = ((ImportedInterferogram) data.records().get(0)).interferogram();
        // YFACTOR 0.5 times -4 2 10 2 -4
        assertArrayEquals(new double[] {-2, 1, 5, 1, -2}, i.toArray(), 0.0);
        assertEquals(15798.0, i.laserWavenumber());
        // step (LASTX-FIRSTX)/(NPOINTS-1) = 0.000506393/4 cm = 2.0000 fringes of 15798 cm-1
        assertEquals(2, i.samplingInterval());
    }

    @Test
    void interferogramOnSampleIndexAssumesHeNeWhenTheLaserIsNotGiven() throws Exception {
        ImportedInterferogram r = (ImportedInterferogram) reader.read(resource("interferogram-points.jdx"), "p.jdx")
                .records().get(0);
        assertArrayEquals(new double[] {1, 2, 3, 4}, r.interferogram().toArray(), 0.0);
        // 15798 cm-1: HeNe laser, common practice, no source
        assertEquals(15798.0, r.interferogram().laserWavenumber());
        assertEquals("true", r.metadata().get("laser wavenumber assumed"));
    }

    @Test
    void labelsAreComparedWithoutBlanksDashesSlashesUnderscoresAndCase() throws Exception {
        String text = resource("dif.jdx").replace("##DELTAX=", "##Delta_X=").replace("##NPOINTS=", "##n points=")
                .replace("##XYDATA=", "##xy-data=").replace("##FIRSTX", "##first/x");
        assertArrayEquals(EXPECTED, ((ImportedSpectrum) reader.read(text, "n.jdx").records().get(0)).spectrum()
                .toArray(), 1e-15);
    }

    @Test
    void metadataKeepsTheLabelsAsWritten() throws Exception {
        ImportedSpectrum r = (ImportedSpectrum) reader.read(resource("dif.jdx"), "dif.jdx").records().get(0);
        assertEquals("DIF form", r.metadata().get("TITLE"));
        assertEquals("5.01", r.metadata().get("JCAMP-DX"));
        assertEquals(1, r.firstLine());
        assertEquals(16, r.lastLine());
    }

    @Test
    void readsFromAFileAndRecognisesByContent(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("no-extension");
        Files.writeString(f, resource("sqz.jdx"));
        assertTrue(reader.recognise(Files.readAllBytes(f), "no-extension").confidence() >= 0.9);
        assertEquals(0, reader.recognise("x,y\n1,2\n".getBytes(StandardCharsets.US_ASCII), "a.jdx").confidence());
        assertArrayEquals(EXPECTED, ((ImportedSpectrum) reader.read(f, ImportOptions.defaults()).records().get(0))
                .spectrum().toArray(), 1e-15);
    }

    @Test
    void twoTopLevelBlocksGiveTwoRecords() throws Exception {
        ImportedData data = reader.read(resource("affn.jdx") + resource("difdup.jdx"), "two.jdx");
        assertEquals(2, data.records().size());
        assertEquals(16, data.records().get(1).firstLine());
    }

    static ImportException assertImportError(Executable read) {
        return assertThrows(ImportException.class, read);
    }

    static void assertNames(ImportException e, String file, long line, String field) {
        assertEquals(file, e.source(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.field().contains(field), e.getMessage());
        assertTrue(e.getMessage().startsWith(file + ", line " + line + ", field "), e.getMessage());
    }
}
