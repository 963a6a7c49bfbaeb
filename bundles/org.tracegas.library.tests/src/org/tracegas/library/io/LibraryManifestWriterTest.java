package org.tracegas.library.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.Compound;
import org.tracegas.library.Origin;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceMetadata;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** A library written as a folder reads back with the same values and metadata; its version text pins the files. */
class LibraryManifestWriterTest {

    @TempDir
    Path dir;

    private static ReferenceSpectrum reference(Compound compound, double ppmMetres, OriginKind kind) {
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000.0, 0.2410888671875, 40);
        double[] a = new double[axis.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = ppmMetres * 1e-3 / (1 + Math.pow((axis.get(i) - 2004.3) / 0.7, 2)) / 3.0;
        }
        return new ReferenceSpectrum(new Spectrum(axis, a, Ordinate.ABSORBANCE), new ReferenceMetadata(compound,
                new ReferenceConditions(ppmMetres, 438.15, 101.3, 0.5, "NORTON_BEER_MEDIUM"),
                new Origin(kind, kind == OriginKind.SYNTHETIC ? "line by line, Voigt profile" : ""), 0.02));
    }

    private static ReferenceLibrary library() {
        // CAS number and molar mass of CO from memory
        Compound co = new Compound("CO", "630-08-0", "CO", 28.010);
        return new ReferenceLibrary("Hot-wet references", List.of(reference(co, 29.1, OriginKind.SYNTHETIC),
                reference(co, 87.30000000000001, OriginKind.MEASURED)));
    }

    @Test
    void libraryReadsBackWithTheSameValuesAndMetadata() throws IOException {
        ReferenceLibrary written = library();
        Path manifest = new LibraryManifestWriter().write(written, dir.resolve("lib"));
        ReferenceLibrary read = LibraryManifestReader.forTwoColumnText().read(manifest);
        assertEquals(written.name(), read.name());
        for (int r = 0; r < 2; r++) {
            ReferenceSpectrum w = written.references().get(r);
            ReferenceSpectrum b = read.references().get(r);
            assertEquals(w.metadata(), b.metadata());
            assertTrue(b.spectrum().axis().isUniform(), "a uniform axis stays uniform");
            for (int i = 0; i < w.spectrum().size(); i++) {
                assertEquals(w.spectrum().get(i), b.spectrum().get(i), 0.0, "absorbance " + i);
                assertEquals(w.spectrum().axis().get(i), b.spectrum().axis().get(i), 1e-9, "wavenumber " + i);
            }
        }
        assertFalse(Files.exists(dir.resolve("lib.part")));
    }

    @Test
    void fileNamesCarryTheAmountAsPeopleWriteIt() {
        Compound co = new Compound("CO", "630-08-0", "CO", 28.010);
        // 12 ppm x 0.5 x 4.85 m in double arithmetic is 29.099999999999998 (IEEE 754 binary64, Java Language
        // Specification 15.17.1); the file is named after the amount a person would write
        double computed = 12.0 * 0.5 * 4.85;
        assertEquals("29.099999999999998", Double.toString(computed));
        Set<String> taken = new HashSet<>();
        assertEquals("co-29.1.txt", LibraryManifestWriter.fileName(reference(co, computed, OriginKind.SYNTHETIC),
                taken));
        assertEquals("co-29.1-2.txt", LibraryManifestWriter.fileName(reference(co, 29.1, OriginKind.SYNTHETIC),
                taken), "a second reference of the same written amount gets its own name");
        assertEquals("co-614.4.txt", LibraryManifestWriter.fileName(reference(co, 614.4000000000001,
                OriginKind.SYNTHETIC), taken));
    }

    @Test
    void existingFolderIsRefusedAndLeftAlone() throws IOException {
        Files.createDirectories(dir.resolve("lib"));
        IOException e = assertThrows(IOException.class, () -> new LibraryManifestWriter().write(library(),
                dir.resolve("lib")));
        assertTrue(e.getMessage().contains("exists"), e.getMessage());
        try (var files = Files.list(dir.resolve("lib"))) {
            assertEquals(0, files.count());
        }
        assertFalse(Files.exists(dir.resolve("lib.part")));
    }

    @Test
    void versionTextHoldsTheManifestAndChangesWithAnySpectrumByte() throws IOException {
        Path manifest = new LibraryManifestWriter().write(library(), dir.resolve("lib"));
        String before = LibraryVersionText.of(manifest);
        assertTrue(before.startsWith(Files.readString(manifest)), "the manifest text comes first, as it is");
        assertTrue(before.contains(LibraryVersionText.FILES + "\nco-29.1.txt = "), before);
        assertEquals(before, LibraryVersionText.of(manifest), "the same folder gives the same text");
        Path file = dir.resolve("lib").resolve("co-29.1.txt");
        Files.writeString(file, Files.readString(file).replaceFirst("2000.0 ", "2000.00 "));
        assertNotEquals(before, LibraryVersionText.of(manifest));
        Files.delete(file);
        FileFormatException missing = assertThrows(FileFormatException.class, () -> LibraryVersionText.of(manifest));
        assertEquals("file", missing.field());
        assertTrue(missing.line() > 0);
    }
}
