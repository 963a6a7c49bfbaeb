package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.swt.graphics.Color;
import org.junit.jupiter.api.Test;

/** Compound colours: the Okabe-Ito set, fixed by name, the same in every project. */
class PaletteTest {

    private static String hex(Color c) {
        return String.format("#%02X%02X%02X", c.getRed(), c.getGreen(), c.getBlue());
    }

    @Test
    void theColoursAreOkabeAndItosColourUniversalDesignSet() {
        // Okabe & Ito (2008), "Color Universal Design", as listed e.g. by the R package khroma (scheme okabeito)
        // and the R package see (okabeito_colors): black, orange, sky blue, bluish green, yellow, blue,
        // vermilion, reddish purple
        assertEquals(List.of("#000000", "#E69F00", "#56B4E9", "#009E73", "#F0E442", "#0072B2", "#D55E00",
                "#CC79A7"), Palette.OKABE_ITO.stream().map(PaletteTest::hex).toList());
    }

    @Test
    void nitrogenOxidesAndCarbonMonoxideGetDistinctHuesWhateverTheOrderOfAProject() {
        Color co = Palette.compound("CO");
        Color no = Palette.compound("NO");
        Color n2o = Palette.compound("N2O");
        Color no2 = Palette.compound("NO2");
        assertEquals(4, java.util.Set.of(hex(co), hex(no), hex(n2o), hex(no2)).size());
        assertEquals("#D55E00", hex(co));
        assertEquals("#0072B2", hex(no));
        assertEquals("#009E73", hex(n2o));
        // by name, so case and stray spaces from a method file change nothing
        assertSame(no, Palette.compound(" no "));
    }

    @Test
    void anOtherCompoundGetsAPaletteColourChosenByItsNameAlone() {
        Color hcl = Palette.compound("HCl");
        assertTrue(Palette.OKABE_ITO.contains(hcl));
        assertSame(hcl, Palette.compound("HCL"));
        // "HCL".hashCode() is fixed by the Java Language Specification (s[0]*31^(n-1) + ... + s[n-1]):
        // 'H'=72, 'C'=67, 'L'=76 -> 72*961 + 67*31 + 76 = 71345; 71345 mod 8 = 1 -> orange
        assertEquals(71345, "HCL".hashCode());
        assertEquals("#E69F00", hex(hcl));
        assertNotEquals(hex(Palette.compound("CO")), hex(hcl));
    }
}
