package org.tracegas.method;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.synthesis.PartitionFunction;

class LibraryPlanTest {

    private static final String HEAD = """
            library = test
            temperature = 438.15
            pressure = 101.3
            path-length = 4.85
            resolution = 0.5
            apodization = norton-beer-medium
            first-wavenumber = 2000
            step = 0.25
            points = 100
            uncertainty = 0.02

            [compound]
            name = CO
            cas = 630-08-0
            formula = CO
            molar-mass = 28.010
            line-list = co.par
            ppm-m = 29.1
            """;

    @TempDir
    Path dir;

    @Test
    void aTableOfPublishedValuesIsReadFromBesideThePlan() throws IOException {
        // TIPS-2021 Q of 12C16O at 400, 450 and 500 K (Gamache et al., JQSRT 271, 107713 (2021))
        Files.writeString(dir.resolve("co-q.txt"), "# TIPS-2021, CO 26\n400 145.140529\n450 163.360418\n"
                + "500 181.686304\n");
        LibraryPlan plan = LibraryPlan.read(write(HEAD + "partition = table\npartition-table = co-q.txt\n"));
        LibraryPlan.Gas co = plan.gases().get(0);
        assertEquals(dir.resolve("co-q.txt"), co.partitionTable());
        PartitionFunction q = co.partitionFunction();
        assertEquals(163.360418, q.value(450), 1e-9);
        assertTrue(q.description().contains("TIPS-2021"), q.description());
    }

    @Test
    void publishedConstantsAreChosenByFormula() throws IOException {
        LibraryPlan plan = LibraryPlan.read(write(HEAD + "partition = constants\n"));
        // TIPS-2021: Q(450 K) / Q(400 K) of CO = 163.360418 / 145.140529
        assertEquals(163.360418 / 145.140529, plan.gases().get(0).partitionFunction().ratio(450, 400), 1e-3);
    }

    @Test
    void wrongPartitionLinesAreNamed() throws IOException {
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> LibraryPlan.read(write(HEAD + "partition = quantum\n")));
        assertEquals("partition", e.field());
        e = assertThrows(FileFormatException.class, () -> LibraryPlan.read(write(HEAD + "partition = table\n")));
        assertEquals("partition-table", e.field());
        String xenon = HEAD.replace("formula = CO", "formula = XeF2") + "partition = constants\n";
        e = assertThrows(FileFormatException.class, () -> LibraryPlan.read(write(xenon)));
        assertTrue(e.getMessage().contains("no published constants for XeF2"), e.getMessage());
    }

    private Path write(String text) throws IOException {
        return Files.writeString(dir.resolve("library.plan"), text);
    }
}
