package org.tracegas.method;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.quantify.WavenumberWindow;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** The stored text of a method version: a method file's text with the library pinned, and the exact method. */
class StoredMethodTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 401);

    /** A Lorentzian band of 0.01 peak absorbance and 2 cm-1 half width on the test axis. */
    static Spectrum band(double centre) {
        double[] v = new double[AXIS.size()];
        for (int i = 0; i < v.length; i++) {
            double d = (AXIS.get(i) - centre) / 2.0;
            v[i] = 0.01 / (1 + d * d);
        }
        return new Spectrum(AXIS, v, Ordinate.ABSORBANCE);
    }

    static StoredMethod stored() {
        QuantificationMethod m = QuantificationMethod.builder("Kiln CO, N2O").pathLengthMetres(4.85)
                .nonlinearity(false).tolerance(1e-7).shiftTerm(ShiftTerm.SHIFT)
                .analyte(new Analyte("CO", List.of("N2O"), List.of(new AnalysisRegion(List.of(
                        new WavenumberWindow(2040, 2080), new WavenumberWindow(2090, 2120)), 1, 0.004))))
                .analyte(new Analyte("N2O", List.of(), List.of(AnalysisRegion.of(2130, 2190, 2))))
                .reference(new ReferenceSpectrum("CO", band(2060), 100))
                .reference(new ReferenceSpectrum("N2O", band(2160), 50)).build();
        return new StoredMethod(m, TransformSettings.defaults().withRange(2000, 2200), "lib-version-1",
                "a".repeat(64));
    }

    /** A stored head with the library named by its folder: a method file the runner defines methods from. */
    private static String asMethodFile(String head) {
        return head.replace("library-version = lib-version-1\nlibrary-sha256 = " + "a".repeat(64) + "\n",
                "library = lib/library.manifest\n");
    }

    @Test
    void theStoredTextReadsBackToTheSameMethod() throws Exception {
        StoredMethod s = stored();
        StoredMethod back = StoredMethod.parse(s.content(), "v1");
        assertEquals(s, back);
        assertEquals(s.content(), back.content());
    }

    @Test
    void theHeadIsAMethodFileWithTheLibraryPinned() throws Exception {
        String head = stored().declaration();
        assertTrue(head.startsWith("method = Kiln CO, N2O\nlibrary-version = lib-version-1\n"), head);
        assertTrue(head.contains("region = 2040.0..2080.0, 2090.0..2120.0 baseline 1 residual-limit 0.004\n"), head);
        // the same text with the library named by its folder is a method file the runner defines methods from
        String file = head.replace("library-version = lib-version-1\nlibrary-sha256 = " + "a".repeat(64) + "\n",
                "library = lib/library.manifest\n");
        MethodDefinition d = MethodDefinition.parse(file, Path.of("/lab/kiln.method"));
        assertEquals(Path.of("/lab/lib/library.manifest"), d.libraryManifest());
        assertEquals(stored().method().analytes(), d.analytes());
        assertEquals(stored().transform(), d.transform());
    }

    @Test
    void theFitAlgorithmIsChosenInTheMethodFileAndKeptByTheStoredVersion() throws Exception {
        QuantificationMethod m = QuantificationMethod.builder("Kiln CO").pathLengthMetres(4.85)
                .algorithm(FitAlgorithm.CURVE_OF_GROWTH).shiftTerm(ShiftTerm.SCALE)
                .analyte(new Analyte("CO", List.of(), List.of(AnalysisRegion.of(2040, 2080, 1))))
                .reference(new ReferenceSpectrum("CO", band(2060), 100)).build();
        StoredMethod s = new StoredMethod(m, TransformSettings.defaults().withRange(2000, 2200), "lib-version-1",
                "a".repeat(64));
        assertTrue(s.declaration().contains("shift = scale\nreporting-unit = ppm\nalgorithm = curve-of-growth\n"), s.declaration());
        StoredMethod back = StoredMethod.parse(s.content(), "v2");
        assertEquals(FitAlgorithm.CURVE_OF_GROWTH, back.method().algorithm());
        assertEquals(s.content(), back.content());
        // the head's algorithm must agree with the exact method's, like every other setting
        String tampered = s.content().replace("algorithm = curve-of-growth\n", "");
        assertThrows(FileFormatException.class, () -> StoredMethod.parse(tampered, "v3"));
    }

    @Test
    void aMethodFileWithoutAnAlgorithmFitsByClassicalLeastSquaresAndItsStoredTextNamesNone() throws Exception {
        // earlier method versions were written before a method file could choose the algorithm: they read as before
        String head = stored().declaration();
        assertTrue(!head.contains("algorithm"), head);
        String file = asMethodFile(head);
        assertEquals(FitAlgorithm.CLASSICAL_LEAST_SQUARES,
                MethodDefinition.parse(file, Path.of("/lab/kiln.method")).algorithm());
    }

    @Test
    void anUnknownAlgorithmIsRefusedNamingItsLine() {
        String file = asMethodFile(stored().declaration()).replace("reporting-unit = ppm\n",
                "reporting-unit = ppm\nalgorithm = curve-fitting\n");
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> MethodDefinition.parse(file, Path.of("/lab/kiln.method")));
        assertTrue(e.getMessage().contains("kiln.method"), e.getMessage());
        assertTrue(e.getMessage().contains("algorithm"), e.getMessage());
        assertTrue(e.getMessage().contains("[classical-least-squares, curve-of-growth]"), e.getMessage());
        assertEquals(10, e.line(), e.getMessage());
    }

    @Test
    void aCtsDerivedPathSourceIsReadFromTheMethodFileAndKeptByTheStoredVersion() throws Exception {
        String head = stored().declaration();
        assertTrue(!head.contains("path-source"), "the nominal path is the default and not written: " + head);
        assertEquals(PathOrigin.NOMINAL, MethodDefinition.parse(asMethodFile(head), Path.of("/lab/kiln.method"))
                .pathSource());
        String file = asMethodFile(head).replace("path-length = 4.85\n", "path-length = 4.85\npath-source = "
                + "cts-derived\n");
        assertEquals(PathOrigin.CTS_DERIVED, MethodDefinition.parse(file, Path.of("/lab/kiln.method")).pathSource());
        StoredMethod s = stored();
        StoredMethod derived = new StoredMethod(s.method(), s.transform(), s.libraryVersionId(),
                s.libraryContentHash(), s.recipe(), s.resolution(), s.referenceConditions(), PathOrigin.CTS_DERIVED);
        StoredMethod back = StoredMethod.parse(derived.content(), "v4");
        assertEquals(PathOrigin.CTS_DERIVED, back.pathSource());
        assertEquals(derived.content(), back.content());
        FileFormatException e = assertThrows(FileFormatException.class, () -> MethodDefinition.parse(
                file.replace("cts-derived", "from-cts"), Path.of("/lab/kiln.method")));
        assertTrue(e.getMessage().contains("path-source"), e.getMessage());
        assertEquals(4, e.line(), e.getMessage());
    }

    @Test
    void aHeadThatDisagreesWithTheExactMethodIsRefused() {
        String tampered = stored().content().replace("path-length = 4.85", "path-length = 5.0");
        FileFormatException e = assertThrows(FileFormatException.class, () -> StoredMethod.parse(tampered, "v7"));
        assertTrue(e.getMessage().contains("[exact]"), e.getMessage());
        assertTrue(e.getMessage().contains("v7"), e.getMessage());
    }

    @Test
    void aTextWithoutTheExactMethodIsRefused() {
        String head = stored().declaration();
        FileFormatException e = assertThrows(FileFormatException.class, () -> StoredMethod.parse(head, "v8"));
        assertTrue(e.getMessage().contains("exact text of the method is missing"), e.getMessage());
    }
}
