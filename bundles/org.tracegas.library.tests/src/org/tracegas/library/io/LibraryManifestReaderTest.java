package org.tracegas.library.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;

class LibraryManifestReaderTest {

    private static final String CO_BLOCK = """
            [reference]
            file = co-%s.txt
            compound = Carbon monoxide
            cas = 630-08-0
            formula = CO
            molar-mass = 28.0101
            ppm-m = %s
            temperature = 296
            pressure = 101.325
            resolution = 0.5
            apodization = NORTON_BEER_MEDIUM
            origin = %s
            origin-text = 10 m cell
            uncertainty = 0.02
            """;

    @TempDir
    Path dir;

    private Path manifest(String text) throws IOException {
        Files.writeString(dir.resolve("co-200.txt"), "2000 0.10\n2000.25 0.20\n2000.5 0.10\n");
        Files.writeString(dir.resolve("co-50.txt"), "2000 0.025\n2000.25 0.05\n2000.5 0.025\n");
        Path m = dir.resolve("library.manifest");
        Files.writeString(m, text);
        return m;
    }

    private static String twoReferences() {
        return "# stack gas\nlibrary = Stack gas\n\n" + CO_BLOCK.formatted("200", "200", "measured")
                + CO_BLOCK.formatted("50", "50", "Synthetic");
    }

    @Test
    void readsEveryFieldOfEveryBlock() throws IOException {
        ReferenceLibrary library = LibraryManifestReader.forTwoColumnText().read(manifest(twoReferences()));
        assertEquals("Stack gas", library.name());
        assertEquals(2, library.references().size());
        ReferenceSpectrum low = library.references().get(0);
        assertEquals(50, low.metadata().conditions().concentrationPathLength(), 0);
        assertEquals(OriginKind.SYNTHETIC, low.metadata().origin().kind());
        assertEquals("10 m cell", low.metadata().origin().description());
        assertEquals(28.0101, low.compound().molarMass(), 0);
        assertEquals(0.05, low.spectrum().get(1), 0);
        ReferenceSpectrum high = library.references().get(1);
        assertEquals(OriginKind.MEASURED, high.metadata().origin().kind());
        assertEquals(0.02, high.metadata().relativeUncertainty(), 0);
        assertEquals(library.contentHash(),
                LibraryManifestReader.forTwoColumnText().read(manifest(twoReferences())).contentHash());
    }

    @Test
    void invalidCasNumberNamesManifestLineAndField() throws IOException {
        Path m = manifest(twoReferences().replaceFirst("630-08-0", "630-08-9"));
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> LibraryManifestReader.forTwoColumnText().read(m));
        assertEquals(7, e.line());
        assertEquals("cas", e.field());
        assertTrue(e.getMessage().startsWith(m + ", line 7, field 'cas'"), e.getMessage());
    }

    @Test
    void badNumberAndMissingKeyAreNamed() throws IOException {
        Path m = manifest(twoReferences().replaceFirst("temperature = 296", "temperature = warm"));
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> LibraryManifestReader.forTwoColumnText().read(m));
        assertEquals(11, e.line());
        assertEquals("temperature", e.field());
        Path missing = manifest(twoReferences().replaceFirst("uncertainty = 0.02\n", ""));
        e = assertThrows(FileFormatException.class, () -> LibraryManifestReader.forTwoColumnText().read(missing));
        assertEquals("uncertainty", e.field());
        assertEquals(4, e.line()); // the [reference] line of the block that lacks it
    }

    @Test
    void unknownRepeatedAndMisplacedKeysAreRejected() throws IOException {
        FileFormatException e = assertThrows(FileFormatException.class, () -> LibraryManifestReader
                .forTwoColumnText().read(manifest(twoReferences().replaceFirst("formula", "formular"))));
        assertEquals("formular", e.field());
        assertTrue(e.getMessage().contains("unknown key"), e.getMessage());
        e = assertThrows(FileFormatException.class, () -> LibraryManifestReader.forTwoColumnText()
                .read(manifest(twoReferences().replaceFirst("formula = CO\n", "formula = CO\nformula = CO\n"))));
        assertTrue(e.getMessage().contains("line 9, field 'formula': repeats line 8"), e.getMessage());
        e = assertThrows(FileFormatException.class, () -> LibraryManifestReader.forTwoColumnText()
                .read(manifest("cas = 630-08-0\n" + twoReferences())));
        assertEquals(1, e.line());
    }

    @Test
    void missingSpectrumFileNamesTheManifestLine() throws IOException {
        Path m = manifest(twoReferences().replaceFirst("co-50.txt", "co-51.txt"));
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> LibraryManifestReader.forTwoColumnText().read(m));
        assertEquals("file", e.field());
        assertEquals(19, e.line());
        assertTrue(e.getMessage().contains("co-51.txt"), e.getMessage());
    }

    @Test
    void brokenSpectrumFileNamesThatFileAndLine() throws IOException {
        Path m = manifest(twoReferences());
        Files.writeString(dir.resolve("co-50.txt"), "2000 0.025\n2000.25 none\n");
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> LibraryManifestReader.forTwoColumnText().read(m));
        assertTrue(e.getMessage().contains("co-50.txt, line 2, field 'absorbance'"), e.getMessage());
    }

    /** The reader leaves the file format to its source, so a JCAMP-DX reader can take the text reader's place. */
    @Test
    void spectrumFilesAreReadThroughTheGivenSource() throws IOException {
        Path m = manifest(twoReferences());
        ReferenceSpectrumSource halved = file -> {
            var s = new TwoColumnTextSource().read(file);
            double[] v = s.toArray();
            for (int i = 0; i < v.length; i++) {
                v[i] /= 2;
            }
            return s.withValues(v, s.ordinate());
        };
        ReferenceLibrary library = new LibraryManifestReader(halved).read(m);
        assertEquals(0.025, library.references().get(0).spectrum().get(1), 1e-15);
    }
}
