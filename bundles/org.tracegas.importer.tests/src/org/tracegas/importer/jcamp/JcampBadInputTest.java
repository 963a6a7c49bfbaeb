package org.tracegas.importer.jcamp;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracegas.importer.jcamp.JcampReaderTest.assertImportError;
import static org.tracegas.importer.jcamp.JcampReaderTest.assertNames;
import static org.tracegas.importer.jcamp.JcampReaderTest.resource;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;

/** Each malformed file ends in an ImportException naming file, line and field. */
class JcampBadInputTest {

    private final JcampReader reader = new JcampReader();

    @Test
    void failedYCheckNamesTheLine() throws Exception {
        // line 14 starts with D1 = 41 but line 13 ended with 40
        ImportException e = assertImportError(() -> reader.read(resource("bad-ycheck.jdx"), "bad-ycheck.jdx"));
        assertNames(e, "bad-ycheck.jdx", 14, "Y check");
        assertTrue(e.getMessage().contains("41") && e.getMessage().contains("40"), e.getMessage());
    }

    @Test
    void truncatedFileWithoutEnd() throws Exception {
        ImportException e = assertImportError(() -> reader.read(resource("bad-truncated.jdx"), "t.jdx"));
        assertNames(e, "t.jdx", 14, "##END");
    }

    @Test
    void truncatedTableWithEnd() throws Exception {
        String text = resource("dif.jdx").replace("1003D0nj0l0N\n", "");
        // line 13 ends in DIF form with 40, so the next line "1007@" must repeat 40: its 0 fails the Y check
        ImportException e = assertImportError(() -> reader.read(text, "t.jdx"));
        assertNames(e, "t.jdx", 14, "##XYDATA");
    }

    @Test
    void missingPointsAtTheEnd() throws Exception {
        String text = resource("affn.jdx").replace("1004 35, 25, -5, 0\n", "1004 35, 25\n");
        ImportException e = assertImportError(() -> reader.read(text, "short.jdx"));
        assertNames(e, "short.jdx", 14, "##XYDATA");
        assertTrue(e.reason().contains("6 points") && e.reason().contains("8"), e.getMessage());
    }

    @Test
    void inconsistentDeltaX() throws Exception {
        ImportException e = assertImportError(() -> reader.read(resource("affn.jdx").replace("##DELTAX=1", "##DELTAX=1.01"),
                "d.jdx"));
        assertNames(e, "d.jdx", 10, "##DELTAX");
    }

    @Test
    void missingLineIsFoundByTheAbscissaCheck() throws Exception {
        String text = resource("affn.jdx").replace("1004 35", "1005 35");
        assertNames(assertImportError(() -> reader.read(text, "x.jdx")), "x.jdx", 14, "abscissa");
    }

    @Test
    void notANumber() throws Exception {
        String text = resource("affn.jdx").replace("1004 35, 25", "1004 NaN, 25");
        assertNames(assertImportError(() -> reader.read(text, "nan.jdx")), "nan.jdx", 14, "##XYDATA");
    }

    @Test
    void unknownUnits() throws Exception {
        assertNames(assertImportError(() -> reader.read(resource("affn.jdx").replace("1/CM", "FURLONGS"), "u.jdx")),
                "u.jdx", 4, "##XUNITS");
        assertNames(assertImportError(() -> reader.read(resource("affn.jdx").replace("=ABSORBANCE", "=KELVIN"),
                "u.jdx")), "u.jdx", 5, "##YUNITS");
    }

    @Test
    void axisNotMonotonic() throws Exception {
        String text = resource("linked.jdx").replace("270,80", "255,80");
        assertNames(assertImportError(() -> reader.read(text, "m.jdx")), "m.jdx", 16, "##XYPOINTS");
    }

    @Test
    void emptyFile(@TempDir Path dir) throws Exception {
        Path f = Files.createFile(dir.resolve("empty.jdx"));
        assertNames(assertImportError(() -> reader.read(f, ImportOptions.defaults())), f.toString(), 0, "file");
        assertNames(assertImportError(() -> reader.read("  \n", "blank.jdx")), "blank.jdx", 0, "file");
    }

    @Test
    void fileBeyondTheConfiguredSizeIsRefusedUnread(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("big.jdx");
        Files.writeString(f, resource("affn.jdx"));
        long size = Files.size(f);
        ImportException e = assertImportError(() -> reader.read(f, ImportOptions.defaults().withMaxWholeFileBytes(size - 1)));
        assertNames(e, f.toString(), 0, "file size");
    }

    @Test
    void textBeforeTheFirstLabel() throws Exception {
        assertNames(assertImportError(() -> reader.read("hello\n" + resource("affn.jdx"), "h.jdx")), "h.jdx", 1,
                "##TITLE");
    }

    @Test
    void wrongBlockCountOfALinkedBlock() throws Exception {
        String text = resource("linked.jdx").replace("##BLOCKS=2", "##BLOCKS=3");
        assertNames(assertImportError(() -> reader.read(text, "l.jdx")), "l.jdx", 4, "##BLOCKS");
    }

    @Test
    void unsupportedVersion() throws Exception {
        assertNames(assertImportError(() -> reader.read(resource("affn.jdx").replace("4.24", "6.00"), "v.jdx")),
                "v.jdx", 2, "##JCAMP-DX");
    }

    @Test
    void repeatCountBeyondNPoints() throws Exception {
        String text = resource("difdup.jdx").replace("2000E%UK", "2000E%s999999999");
        assertNames(assertImportError(() -> reader.read(text, "dup.jdx")), "dup.jdx", 13, "##XYDATA");
    }

    @Test
    void anErrorInTheSecondBlockImportsNothing() throws Exception {
        // the first block of the linked file is valid; the whole import must still fail
        String text = resource("linked.jdx").replace("2.7 0.80", "2.7 0.80 2.9");
        assertNames(assertImportError(() -> reader.read(text, "l.jdx")), "l.jdx", 26, "##PEAK TABLE");
    }
}
