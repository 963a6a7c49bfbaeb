package org.tracegas.method;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.library.Compound;
import org.tracegas.library.Origin;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceMetadata;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Apodization;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * A method takes only references of the instrument's line shape: EPA Method 320 sections 10.3, 10.4 and 11.1 ask
 * for references at the sample's resolution and with the apodization of the sample spectra (standards notes, not
 * confirmed against the official text). The conditions each reference was recorded at travel with the stored
 * method, since the correction of a result to the sample cell starts from them.
 */
class MethodReferencesTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.25, 801);
    private static final Compound CO = new Compound("CO", "630-08-0", "CO", 28.0101);

    private static final String METHOD = """
            method = Kiln CO
            library = lib/library.manifest
            path-length = 4.85
            resolution = 0.5

            [transform]
            apodization = norton-beer-medium

            [analyte]
            compound = CO
            region = 2040..2140 baseline 1
            """;

    private static ReferenceSpectrum reference(double ppmM, double resolution, String apodization) {
        double[] v = new double[AXIS.size()];
        for (int i = 0; i < v.length; i++) {
            double d = (AXIS.get(i) - 2090) / 3.0;
            v[i] = 1e-4 * ppmM / (1 + d * d);
        }
        return new ReferenceSpectrum(new Spectrum(AXIS, v, Ordinate.ABSORBANCE), new ReferenceMetadata(CO,
                new ReferenceConditions(ppmM, 423.15, 98.6, resolution, apodization),
                new Origin(OriginKind.MEASURED, "CO " + ppmM + " ppm·m, 4.85 m cell"), 0.02));
    }

    private static MethodDefinition method() throws FileFormatException {
        return MethodDefinition.parse(METHOD, Path.of("/lab/kiln.method"));
    }

    @Test
    void aReferenceOfAnotherApodizationIsRefusedByName() throws Exception {
        ReferenceLibrary library = new ReferenceLibrary("Kiln references", List.of(
                reference(100, 0.5, "Norton-Beer medium"), reference(400, 0.5, "Happ-Genzel")));
        FileFormatException e = assertThrows(FileFormatException.class, () -> method().build(library));
        assertTrue(e.getMessage().contains("CO 630-08-0, 400.0 ppm·m"), e.getMessage());
        assertTrue(e.getMessage().contains("'Happ-Genzel'"), e.getMessage());
        assertTrue(e.getMessage().contains("norton-beer-medium"), e.getMessage());
        assertTrue(e.getMessage().contains("kiln.method"), e.getMessage());
    }

    @Test
    void aReferenceOfAnotherResolutionIsRefusedByName() throws Exception {
        // a 1 cm-1 reference has lines twice as wide as the 0.5 cm-1 sample's: the fit would misread their depth
        ReferenceLibrary library = new ReferenceLibrary("Kiln references", List.of(
                reference(100, 1.0, "NORTON_BEER_MEDIUM"), reference(400, 0.5, "NORTON_BEER_MEDIUM")));
        FileFormatException e = assertThrows(FileFormatException.class, () -> method().build(library));
        assertTrue(e.getMessage().contains("CO 630-08-0, 100.0 ppm·m"), e.getMessage());
        assertTrue(e.getMessage().contains("resolution 1.0 cm-1"), e.getMessage());
        assertTrue(e.getMessage().contains("0.5 cm-1"), e.getMessage());
    }

    @Test
    void theStoredMethodCarriesEachReferencesConditions() throws Exception {
        ReferenceLibrary library = new ReferenceLibrary("Kiln references", List.of(
                reference(400, 0.5, "norton-beer-medium"), reference(100, 0.5, "Norton-Beer medium")));
        MethodDefinition d = method();
        QuantificationMethod m = d.build(library);
        List<ReferenceConditions> conditions = MethodReferences.of(library, m.references(), d.transform(),
                d.resolution());
        // the method orders its references by amount; their conditions follow them
        assertEquals(100.0, conditions.get(0).concentrationPathLength());
        assertEquals(400.0, conditions.get(1).concentrationPathLength());
        StoredMethod stored = new StoredMethod(m, d.transform(), "lib-1", "b".repeat(64), d.recipe(), 0.5,
                conditions);
        String text = stored.content();
        assertTrue(text.contains("resolution = 0.5\n"), text);
        assertTrue(text.contains("\n[references]\nreference = CO | 100.0 ppm-m | 423.15 K | 98.6 kPa | 0.5 cm-1 | "
                + "Norton-Beer medium\n"), text);
        StoredMethod back = StoredMethod.parse(text, "v3");
        assertEquals(stored, back);
        assertEquals(423.15, back.referenceConditions().get(1).temperature());
        assertEquals(98.6, back.referenceConditions().get(1).pressure());
    }

    @Test
    void aStoredConditionLineForAnotherReferenceIsRefusedWithItsLine() throws Exception {
        ReferenceLibrary library = new ReferenceLibrary("Kiln references", List.of(
                reference(100, 0.5, "norton-beer-medium"), reference(400, 0.5, "norton-beer-medium")));
        MethodDefinition d = method();
        QuantificationMethod m = d.build(library);
        String text = new StoredMethod(m, d.transform(), "lib-1", "b".repeat(64), d.recipe(), 0.5,
                MethodReferences.of(library, m.references(), d.transform(), d.resolution())).content()
                .replace("CO | 400.0 ppm-m", "CO | 500.0 ppm-m");
        FileFormatException e = assertThrows(FileFormatException.class, () -> StoredMethod.parse(text, "v4"));
        assertTrue(e.getMessage().contains("500.0"), e.getMessage());
        assertTrue(e.getMessage().contains("v4"), e.getMessage());
    }

    @Test
    void apodizationNamesAreReadInAnyCommonSpelling() {
        assertEquals(Apodization.NORTON_BEER_MEDIUM, MethodReferences.apodization("Norton-Beer medium").get());
        assertEquals(Apodization.HAPP_GENZEL, MethodReferences.apodization("happ_genzel").get());
        assertTrue(MethodReferences.apodization("cosine squared").isEmpty());
    }
}
