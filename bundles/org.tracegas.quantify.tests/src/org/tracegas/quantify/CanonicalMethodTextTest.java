package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** A method read back from its canonical text is the same method; a damaged text is refused by line and field. */
class CanonicalMethodTextTest {

    private static Spectrum band(SpectralAxis axis, double centre, double peak) {
        double[] a = new double[axis.size()];
        for (int i = 0; i < a.length; i++) {
            double d = (axis.get(i) - centre) / 0.9;
            a[i] = peak / (1 + d * d);
        }
        return new Spectrum(axis, a, Ordinate.ABSORBANCE);
    }

    /** Every field away from its default, two kinds of axis, weights, and a name that needs escaping. */
    private static QuantificationMethod method() {
        SpectralAxis uniform = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000.1, 0.241, 113);
        SpectralAxis explicit = SpectralAxis.of(AxisUnit.WAVENUMBER, 2000, 2000.3, 2000.7, 2001.2, 2030, 2060.5,
                2070, 2080, 2095);
        double[] w = new double[uniform.size()];
        java.util.Arrays.fill(w, 1.0 / 3.0);
        return QuantificationMethod.builder("CO \"hot\" \\ wet").pathLengthMetres(4.85).nonlinearity(true)
                .shiftTerm(ShiftTerm.SHIFT_AND_WIDTH).reportingUnit(ReportingUnit.PPB).maxAbsorbance(0.8)
                .tolerance(1e-6).maxIterations(17)
                .analyte(new Analyte("CO", List.of("N2O", "H2O"), List.of(
                        new AnalysisRegion(List.of(new WavenumberWindow(2005, 2012.5), new WavenumberWindow(2014, 2020)),
                                2, 0.004),
                        AnalysisRegion.of(2021, 2026, 0))))
                .analyte(new Analyte("N2O", List.of(), List.of(AnalysisRegion.of(2010, 2020, 1))))
                .reference(new ReferenceSpectrum("CO", band(uniform, 2010, 0.1), 29.1))
                .reference(new ReferenceSpectrum("CO", band(uniform, 2010, 0.31), 87.3))
                .reference(new ReferenceSpectrum("N2O", band(explicit, 2030, 0.05), 7.275))
                .reference(new ReferenceSpectrum("H2O", band(uniform, 2020, 0.2), 58200))
                .weights(new Spectrum(uniform, w, Ordinate.ARBITRARY)).build();
    }

    @Test
    void textReadsBackToTheSameMethod() {
        QuantificationMethod m = method();
        QuantificationMethod back = QuantificationMethod.parse(m.canonicalText());
        assertEquals(m.canonicalText(), back.canonicalText());
        assertEquals(m.contentHash(), back.contentHash());
        assertEquals("CO \"hot\" \\ wet", back.name());
        assertEquals(ShiftTerm.SHIFT_AND_WIDTH, back.shiftTerm());
        assertEquals(2, back.analytes().get(0).regions().get(0).windows().size());
        assertEquals(1.0 / 3.0, back.weights().orElseThrow().get(5));
        assertEquals(m.references("N2O").get(0).absorbance(), back.references("N2O").get(0).absorbance());
    }

    @Test
    void damagedTextIsRefusedWithLineAndField() {
        String text = method().canonicalText();
        String[] lines = text.split("\n");
        int tolerance = indexOf(lines, "tolerance ");
        assertMessage(replaceLine(lines, tolerance, "tolerance ten"), "line " + (tolerance + 1), "'tolerance'",
                "'ten'");
        int window = indexOf(lines, "  window ");
        assertMessage(replaceLine(lines, window, "  window 0x1.0p11"), "line " + (window + 1), "'window'");
        int unit = indexOf(lines, "reporting_unit ");
        assertMessage(replaceLine(lines, unit, "reporting_unit MG_PER_M3"), "line " + (unit + 1),
                "'reporting_unit'");
        int values = indexOf(lines, " ordinate ") + 1;
        assertMessage(replaceLine(lines, values, lines[values] + " 0x1.0p0"), "line " + (values + 1), "expected 8 values");
        assertMessage(text.replace("end\n", ""), "'end'", "ends");
        assertMessage(text.replace("tracegas-quantification-method 1", "tracegas-quantification-method 9"),
                "line 1", "'format'");
    }

    /**
     * An algorithm's settings are part of the text and hash, in one order whatever order they were given in; a
     * method without settings writes no setting line, so the texts of earlier methods stay as they were.
     */
    @Test
    void algorithmSettingsAreBoundInTextAndHash() {
        QuantificationMethod.Builder b = QuantificationMethod.builder("CO").pathLengthMetres(4.85)
                .algorithm(FitAlgorithm.CURVE_OF_GROWTH)
                .analyte(new Analyte("CO", List.of(), List.of(AnalysisRegion.of(2005, 2020, 1))))
                .reference(new ReferenceSpectrum("CO", band(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.25,
                        101), 2010, 0.1), 29.1));
        QuantificationMethod plain = b.build();
        assertTrue(!plain.canonicalText().contains("setting"), plain.canonicalText());
        QuantificationMethod one = b.algorithmSetting(new AlgorithmSetting("gas", "CO file /lab/co \"a\".par"))
                .algorithmSetting(new AlgorithmSetting("temperature", "308.15")).build();
        assertTrue(one.canonicalText().contains("\nsetting gas \"CO file /lab/co \\\"a\\\".par\"\n"
                + "setting temperature \"308.15\"\n"), one.canonicalText());
        QuantificationMethod back = QuantificationMethod.parse(one.canonicalText());
        assertEquals(one.contentHash(), back.contentHash());
        assertEquals(List.of("CO file /lab/co \"a\".par"), back.algorithmSettings("gas"));
        assertTrue(!one.contentHash().equals(plain.contentHash()));
        assertTrue(!one.contentHash().equals(b.algorithmSetting(new AlgorithmSetting("pressure", "99.8")).build()
                .contentHash()));
        String[] lines = one.canonicalText().split("\n");
        int setting = indexOf(lines, "setting temperature");
        assertMessage(replaceLine(lines, setting, "setting temperature 308.15"), "line " + (setting + 1),
                "'setting'");
        assertMessage(replaceLine(lines, setting, "setting Temperature \"308.15\""), "line " + (setting + 1),
                "'setting'", "lower-case");
    }

    private static int indexOf(String[] lines, String prefix) {
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].startsWith(prefix)) {
                return i;
            }
        }
        throw new AssertionError("no line starts with " + prefix);
    }

    private static String replaceLine(String[] lines, int index, String replacement) {
        String[] copy = lines.clone();
        copy[index] = replacement;
        return String.join("\n", copy) + "\n";
    }

    private static void assertMessage(String text, String... parts) {
        String message = assertThrows(IllegalArgumentException.class, () -> QuantificationMethod.parse(text))
                .getMessage();
        for (String p : parts) {
            assertTrue(message.contains(p), message);
        }
    }
}
