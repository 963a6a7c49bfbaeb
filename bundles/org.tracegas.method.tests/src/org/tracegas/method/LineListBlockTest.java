package org.tracegas.method;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.quantify.AlgorithmSetting;

/**
 * The [line-list] block of a method file: line lists pinned by SHA-256 and resolved next to the method file, the
 * cell conditions and field of view checked, every fault named by file, line and field.
 */
class LineListBlockTest {

    /** SHA-256 of the three bytes "abc": FIPS 180-2, appendix B.1 (one-block message). */
    private static final String ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";

    @TempDir
    Path folder;

    private List<AlgorithmSetting> read(String block) throws Exception {
        KeyValueFile f = KeyValueFile.parse("method = Kiln\n\n[line-list]\n" + block, folder.resolve("kiln.method"));
        return LineListBlock.read(f, f.blocks("line-list").get(0), true);
    }

    private void writeList() throws Exception {
        Files.createDirectories(folder.resolve("lists"));
        Files.writeString(folder.resolve("lists/tx1 band.par"), "abc", StandardCharsets.US_ASCII);
    }

    private static String block(String gas) {
        return "temperature = 308.15\npressure = 99.8\nfield-of-view = 0.008\ngas = " + gas + "\n";
    }

    @Test
    void settingsHoldTheConditionsAndTheLineListByItsAbsolutePath() throws Exception {
        writeList();
        // the hash the Java platform's digest gives for the file agrees with the published one
        assertEquals(ABC, HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                .digest(Files.readAllBytes(folder.resolve("lists/tx1 band.par")))));
        List<AlgorithmSetting> s = read(block("TX1 molar-mass 28 partition linear sha256 " + ABC
                + " file lists/tx1 band.par"));
        assertEquals(List.of(new AlgorithmSetting("temperature", "308.15"), new AlgorithmSetting("pressure", "99.8"),
                new AlgorithmSetting("field-of-view", "0.008"), new AlgorithmSetting("gas",
                        "TX1 molar-mass 28.0 partition linear sha256 " + ABC + " file "
                                + folder.resolve("lists/tx1 band.par").toAbsolutePath().normalize())), s);
    }

    @Test
    void aLineListWithAnotherHashIsRefusedNamingFileLineAndField() throws Exception {
        writeList();
        String other = "0".repeat(64);
        FileFormatException e = assertThrows(FileFormatException.class, () -> read(block(
                "TX1 molar-mass 28 partition linear sha256 " + other + " file lists/tx1 band.par")));
        assertTrue(e.getMessage().contains("kiln.method, line 7, field 'gas'") && e.getMessage().contains(ABC)
                && e.getMessage().contains("tx1 band.par"), e.getMessage());
    }

    @Test
    void faultsAreNamedByLineAndField() throws Exception {
        writeList();
        String gas = "TX1 molar-mass 28 partition linear sha256 " + ABC + " file lists/tx1 band.par";
        assertFault(block(gas.replace("linear", "table")), "line 7, field 'gas'", "linear");
        assertFault(block(gas.replace(" file lists/tx1 band.par", "")), "line 7, field 'gas'", "expected");
        assertFault(block(gas.replace(ABC, ABC.toUpperCase())), "line 7, field 'gas'", "hex");
        assertFault(block(gas.replace("tx1 band", "tx9")), "line 7, field 'gas'", "cannot be read");
        assertFault(block(gas) + "gas = " + gas + "\n", "line 8, field 'gas'", "twice");
        assertFault(block(gas).replace("0.008", "0.2"), "line 6, field 'field-of-view'", "[0, 0.05]");
        assertFault(block(gas).replace("99.8", "-1"), "line 5, field 'pressure'", "positive");
        assertFault(block(gas).replace("gas = " + gas + "\n", ""), "field 'gas'", "no gas");
        assertFault(block(gas) + "path = 6.2\n", "line 8, field 'path'", "unknown key");
    }

    private void assertFault(String block, String... parts) {
        FileFormatException e = assertThrows(FileFormatException.class, () -> read(block));
        for (String p : parts) {
            assertTrue(e.getMessage().contains(p), p + " in " + e.getMessage());
        }
    }

    @Test
    void onlyALineListMethodHasTheBlock() {
        String file = """
                method = Kiln
                library = lib/library.manifest
                path-length = 6.2

                [transform]
                apodization = norton-beer-medium

                [line-list]
                temperature = 308.15

                [analyte]
                compound = CO
                region = 2100..2200 baseline 1
                """;
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> MethodDefinition.parse(file, Path.of("/lab/kiln.method")));
        assertTrue(e.getMessage().contains("line 8") && e.getMessage().contains("algorithm = line-list"),
                e.getMessage());
    }
}
