package org.tracegas.ui.session;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.ReferenceOrigin;
import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.model.WorkspaceFactory;

/** The workspace model's references of a library version, read from the text the version keeps. */
class StoredLibraryTest {

    @TempDir
    Path folder;

    private ContentVersion version() {
        ContentVersion v = WorkspaceFactory.eINSTANCE.createContentVersion();
        v.setItemName("Kiln references");
        v.setNumber(3);
        return v;
    }

    @Test
    void eachReferenceCarriesItsConditionsOriginAndTheHashOfItsSpectrumFile() throws Exception {
        Files.writeString(folder.resolve("co.txt"), "2000 0.0\n2001 0.1\n");
        Files.writeString(folder.resolve("NO.txt"), "1850 0.0\n1851 0.2\n");
        // CAS registry numbers of CO and NO from the NIST Chemistry WebBook (from memory)
        Path manifest = Files.writeString(folder.resolve("library.manifest"), String.join("\n",
                "library = Kiln references", "",
                "[reference]", "file = co.txt", "compound = CO", "cas = 630-08-0", "formula = CO",
                "molar-mass = 28.010", "ppm-m = 200", "temperature = 296", "pressure = 101.325",
                "resolution = 0.5", "apodization = triangular", "origin = measured",
                "origin-text = 10 m cell", "uncertainty = 0.02", "",
                // this block leaves the temperature to the spectrum file, as a manifest may
                "[reference]", "file = NO.txt", "compound = NO", "cas = 10102-43-9", "formula = NO",
                "molar-mass = 30.006", "ppm-m = 97.5", "pressure = 98.6",
                "resolution = 0.5", "apodization = triangular", "origin = Synthetic",
                "uncertainty = 0.05", ""));

        StoredLibrary.Listing listing = StoredLibrary.of(version(), LibraryVersionText.of(manifest));

        assertEquals("", listing.note());
        List<ReferenceSpectrum> refs = listing.references();
        assertEquals(2, refs.size());
        ReferenceSpectrum co = refs.get(0);
        assertEquals("CO", co.getCompound());
        assertEquals("630-08-0", co.getCasNumber());
        assertEquals(200, co.getPpmMetres());
        assertEquals(296, co.getTemperature());
        assertEquals(101.325, co.getPressure());
        assertEquals(0.5, co.getResolution());
        assertEquals("triangular", co.getApodization());
        assertEquals(ReferenceOrigin.MEASURED, co.getOrigin());
        assertEquals("10 m cell", co.getOriginText());
        // GNU coreutils sha256sum of the files' bytes
        assertEquals("1144cbf01539373b27ece0d42cf8653b12f426b6489588936e973b6a0bae0d9a", co.getContentSha256());
        ReferenceSpectrum no = refs.get(1);
        assertEquals("8518cf1698e4ad71e30143362f5f3c13869afcb91598721e3d54d4401989b7fd", no.getContentSha256());
        assertEquals(ReferenceOrigin.SYNTHETIC, no.getOrigin());
        assertTrue(Double.isNaN(no.getTemperature()), "a temperature the manifest leaves to the file is not known here");
        assertArrayEquals(new String[] {"NO", "10102-43-9", "SYNTHETIC — ", "97.5", "", "98.6", "0.5", "triangular",
                "in the library folder"}, listing.rows().get(1));
    }

    @Test
    void aTextThatIsNoManifestListsNothingAndSaysWhy() {
        StoredLibrary.Listing none = StoredLibrary.of(version(), "compounds = CO, NO\n");
        assertEquals(List.of(), none.references());
        assertTrue(none.note().contains("no [reference] blocks"), none.note());
        StoredLibrary.Listing broken = StoredLibrary.of(version(), "[reference]\nppm-m = lots\n");
        assertEquals(List.of(), broken.references());
        assertTrue(broken.note().startsWith("its stored text cannot be read: "), broken.note());
        assertTrue(broken.note().contains("Kiln references version 3"), broken.note());
    }
}
