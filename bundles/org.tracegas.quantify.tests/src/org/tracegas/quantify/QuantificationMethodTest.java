package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.function.Function;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class QuantificationMethodTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 201);

    private static ReferenceSpectrum ref(String compound, double ppmMetres, double peak) {
        double[] a = new double[AXIS.size()];
        for (int i = 0; i < a.length; i++) {
            double d = (AXIS.get(i) - peak) / 0.8;
            a[i] = 0.1 / (1 + d * d);
        }
        return new ReferenceSpectrum(compound, new Spectrum(AXIS, a, Ordinate.ABSORBANCE), ppmMetres);
    }

    private static QuantificationMethod.Builder valid() {
        return QuantificationMethod.builder("CO in N2O").pathLengthMetres(2.5)
                .analyte(new Analyte("CO", List.of("N2O"), List.of(AnalysisRegion.of(2010, 2080, 1))))
                .reference(ref("CO", 100, 2030)).reference(ref("N2O", 50, 2050)).reference(ref("CO", 400, 2030));
    }

    private static String failure(QuantificationMethod.Builder b) {
        return assertThrows(IllegalArgumentException.class, b::build).getMessage();
    }

    @Test
    void builderNamesTheWrongField() {
        assertTrue(failure(valid().pathLengthMetres(0)).startsWith("pathLengthMetres"));
        assertTrue(failure(valid().maxAbsorbance(-1)).startsWith("maxAbsorbance"));
        assertTrue(failure(valid().tolerance(0)).startsWith("tolerance"));
        assertTrue(failure(valid().maxIterations(0)).startsWith("maxIterations"));
        assertTrue(failure(valid().shiftTerm(null)).startsWith("shiftTerm"));
        assertTrue(failure(valid().reportingUnit(null)).startsWith("reportingUnit"));
        assertTrue(failure(QuantificationMethod.builder(" ").pathLengthMetres(1)).startsWith("name"));
        assertTrue(failure(QuantificationMethod.builder("x").pathLengthMetres(1)).startsWith("analytes"));
        assertTrue(failure(valid().analyte(new Analyte("CO", List.of(), List.of(AnalysisRegion.of(1, 2, 0)))))
                .contains("CO twice"));
        assertTrue(failure(valid().reference(ref("CO", 100, 2030))).contains("two spectra of CO at 100.0"));
        String missing = failure(valid().analyte(new Analyte("NO", List.of(), List.of(AnalysisRegion.of(1, 2, 0)))));
        assertTrue(missing.contains("no spectrum of NO"), missing);
        double[] w = new double[AXIS.size()];
        java.util.Arrays.fill(w, 1);
        w[17] = 0;
        assertTrue(failure(valid().weights(new Spectrum(AXIS, w, Ordinate.ARBITRARY))).contains("index 17"));
    }

    @Test
    void valueClassesNameTheWrongField() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new WavenumberWindow(5, 5)).getMessage()
                .contains("high"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> AnalysisRegion.of(1, 2, 4)).getMessage()
                .startsWith("baselineOrder"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new AnalysisRegion(List.of(
                new WavenumberWindow(1, 3), new WavenumberWindow(2, 4)), 0, 1)).getMessage().contains("overlap"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> new AnalysisRegion(List.of(new WavenumberWindow(1, 3)), 0, 0)).getMessage()
                .startsWith("residualRmsLimit"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> new Analyte("CO", List.of("CO"), List.of(AnalysisRegion.of(1, 2, 0)))).getMessage()
                .contains("interferent CO"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> new Analyte("C O", List.of(), List.of(AnalysisRegion.of(1, 2, 0)))).getMessage()
                .startsWith("compound 'C O'"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new Analyte("CO", List.of(),
                List.of(AnalysisRegion.of(1, 3, 0), AnalysisRegion.of(2, 4, 0)))).getMessage()
                .contains("regions 0 and 1 of CO overlap"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ReferenceSpectrum("CO",
                new Spectrum(AXIS, new double[AXIS.size()], Ordinate.TRANSMITTANCE), 1)).getMessage()
                .contains("ABSORBANCE"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> ref("CO", -1, 2030)).getMessage()
                .startsWith("ppmMetres of reference CO"));
    }

    @Test
    void defaultsAreDocumented() {
        QuantificationMethod m = valid().build();
        assertEquals(1.0, m.maxAbsorbance()); // common practice, no source
        assertEquals(ShiftTerm.NONE, m.shiftTerm());
        assertEquals(ReportingUnit.PPM, m.reportingUnit());
        assertEquals(List.of(100.0, 400.0), m.references("CO").stream().map(ReferenceSpectrum::ppmMetres).toList());
    }

    /** The canonical text does not depend on the order references were added in; its hash is its SHA-256. */
    @Test
    void canonicalTextIsDeterministicAndHashedWithSha256() throws Exception {
        QuantificationMethod a = valid().build();
        QuantificationMethod b = QuantificationMethod.builder("CO in N2O").pathLengthMetres(2.5)
                .reference(ref("CO", 400, 2030)).reference(ref("N2O", 50, 2050)).reference(ref("CO", 100, 2030))
                .analyte(new Analyte("CO", List.of("N2O"), List.of(AnalysisRegion.of(2010, 2080, 1)))).build();
        assertEquals(a.canonicalText(), b.canonicalText());
        assertEquals(a, b);
        byte[] digest = MessageDigest.getInstance("SHA-256").digest(a.canonicalText().getBytes(StandardCharsets.UTF_8));
        assertEquals(HexFormat.of().formatHex(digest), a.contentHash());
        assertTrue(a.canonicalText().startsWith("tracegas-quantification-method 1\n"));
    }

    /** Everything that changes a result changes the text: one changed field at a time. */
    @Test
    void everyFieldChangesTheHash() {
        String base = valid().build().contentHash();
        List<Function<QuantificationMethod.Builder, QuantificationMethod.Builder>> changes = List.of(
                b -> b.pathLengthMetres(Math.nextUp(2.5)),
                b -> b.nonlinearity(true),
                b -> b.shiftTerm(ShiftTerm.SHIFT),
                b -> b.reportingUnit(ReportingUnit.PPB),
                b -> b.maxAbsorbance(0.9),
                b -> b.tolerance(1e-6),
                b -> b.maxIterations(7),
                b -> b.reference(ref("N2O", 60, 2050)),
                b -> b.analyte(new Analyte("N2O", List.of(), List.of(AnalysisRegion.of(2040, 2060, 0)))),
                b -> b.weights(new Spectrum(AXIS, filled(2.0), Ordinate.ARBITRARY)));
        for (var change : changes) {
            assertNotEquals(base, change.apply(valid()).build().contentHash());
        }
        QuantificationMethod otherRegion = QuantificationMethod.builder("CO in N2O").pathLengthMetres(2.5)
                .analyte(new Analyte("CO", List.of("N2O"), List.of(AnalysisRegion.of(2010, 2080, 2))))
                .reference(ref("CO", 100, 2030)).reference(ref("N2O", 50, 2050)).reference(ref("CO", 400, 2030))
                .build();
        assertNotEquals(base, otherRegion.contentHash());
        QuantificationMethod otherValue = QuantificationMethod.builder("CO in N2O").pathLengthMetres(2.5)
                .analyte(new Analyte("CO", List.of("N2O"), List.of(AnalysisRegion.of(2010, 2080, 1))))
                .reference(ref("CO", 100, 2030)).reference(ref("N2O", 50, 2050.0000001))
                .reference(ref("CO", 400, 2030)).build();
        assertNotEquals(base, otherValue.contentHash());
    }

    private static double[] filled(double v) {
        double[] a = new double[AXIS.size()];
        java.util.Arrays.fill(a, v);
        return a;
    }
}
