package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class ApodizationTest {

    @Test
    void nortonBeerCoefficientsAreThePublishedOnes() {
        // Norton & Beer, J. Opt. Soc. Am. 66, 259 (1976), erratum 67, 419 (1977), table of C0, C1, C2, C4 for
        // sum C_i (1 - x^2)^i: weak 0.384093, -0.087577, 0.703484, -; medium 0.152442, -0.136176, 0.983734, -;
        // strong 0.045335, 0, 0.554883, 0.399782. Checked against the table as reproduced by Naylor & Tahic,
        // J. Opt. Soc. Am. A 24, 3644 (2007), whose extended family also uses only powers 0, 1, 2, 4, 6, 8.
        assertArrayEquals(new double[] {0.384093, -0.087577, 0.703484}, Apodization.NORTON_BEER_WEAK.coefficients());
        assertArrayEquals(new double[] {0.152442, -0.136176, 0.983734}, Apodization.NORTON_BEER_MEDIUM.coefficients());
        assertArrayEquals(new double[] {0.045335, 0.0, 0.554883, 0.0, 0.399782},
                Apodization.NORTON_BEER_STRONG.coefficients());
    }

    @Test
    void nortonBeerStrongCarriesItsLastCoefficientOnTheFourthPower() {
        // Norton & Beer (1976), strong: 0.045335 + 0.554883 (1 - x^2)^2 + 0.399782 (1 - x^2)^4, written out here
        // from the published form; at x = 0.5, 1 - x^2 = 0.75
        double u = 0.75;
        assertEquals(0.045335 + 0.554883 * u * u + 0.399782 * u * u * u * u, Apodization.NORTON_BEER_STRONG.weight(0.5),
                1e-15);
        // the cubic form would give 0.045335 + 0.554883 u^2 + 0.399782 u^3 = 0.526... instead of 0.484...
        assertEquals(0.48395, Apodization.NORTON_BEER_STRONG.weight(0.5), 1e-5);
    }

    @ParameterizedTest
    @EnumSource(value = Apodization.class, names = "NORTON_BEER_.*", mode = EnumSource.Mode.MATCH_ANY)
    void nortonBeerSetsSumToOneAndFallToTheirConstantTermAtTheEnds(Apodization a) {
        // Norton & Beer (1976): each set sums to 1 (value at ZPD); at |x| = 1 only c0 is left, and beyond, 0
        double[] c = a.coefficients();
        double sum = 0;
        for (double v : c) {
            sum += v;
        }
        assertEquals(1.0, sum, 1e-6, "sum of coefficients");
        assertEquals(c[0], a.weight(1.0), 1e-15);
        assertEquals(c[0], a.weight(-1.0), 1e-15);
        assertEquals(0.0, a.weight(1.0 + 1e-12));
    }

    @Test
    void strongerNortonBeerFallsCloserToZeroAtTheEnd() {
        // Norton & Beer (1976): end values c0 = 0.384 (weak) > 0.152 (medium) > 0.045 (strong), from memory
        assertEquals(true, Apodization.NORTON_BEER_WEAK.weight(1) > Apodization.NORTON_BEER_MEDIUM.weight(1));
        assertEquals(true, Apodization.NORTON_BEER_MEDIUM.weight(1) > Apodization.NORTON_BEER_STRONG.weight(1));
        assertEquals(0.045335, Apodization.NORTON_BEER_STRONG.weight(1), 1e-12);
    }

    @ParameterizedTest
    @EnumSource(Apodization.class)
    void oneAtZeroPathDifferenceEvenAndZeroOutside(Apodization a) {
        // definition of an apodization function (common practice): unit weight at ZPD, symmetric, support [-1, 1]
        assertEquals(1.0, a.weight(0.0), 1e-9);
        for (double x = 0; x <= 1.0; x += 0.0625) {
            assertEquals(a.weight(x), a.weight(-x), 0.0, "x = " + x);
        }
        assertEquals(0.0, a.weight(1.5));
        assertEquals(0.0, a.weight(Double.NaN));
    }

    @Test
    void triangleAndCosineWindowsReachTheirKnownEndValues() {
        // triangle: 0 at the end; Happ-Genzel 0.54 - 0.46 = 0.08 (common practice, no source);
        // Blackman-Harris ends: 0.42323 - 0.49755 + 0.07922 and 0.35875 - 0.48829 + 0.14128 - 0.01168
        // (Harris, Proc. IEEE 66, 51 (1978), from memory)
        assertEquals(0.0, Apodization.TRIANGULAR.weight(1.0), 0.0);
        assertEquals(0.5, Apodization.TRIANGULAR.weight(0.5), 0.0);
        assertEquals(0.08, Apodization.HAPP_GENZEL.weight(1.0), 1e-12);
        assertEquals(0.0049, Apodization.BLACKMAN_HARRIS_3.weight(1.0), 1e-9);
        assertEquals(0.00006, Apodization.BLACKMAN_HARRIS_4.weight(1.0), 1e-9);
        assertEquals(1.0, Apodization.BOXCAR.weight(1.0), 0.0);
    }

    @ParameterizedTest
    @org.junit.jupiter.params.provider.CsvSource({"BOXCAR, 1.00", "TRIANGULAR, 1.33", "HAPP_GENZEL, 1.36",
            "BLACKMAN_HARRIS_3, 1.71", "BLACKMAN_HARRIS_4, 2.00"})
    void meanSquareMatchesTheEquivalentNoiseBandwidthsOfHarris(Apodization a, double enbwBins) {
        // Harris, Proc. IEEE 66, 51 (1978), Table 1 (from memory): equivalent noise bandwidth in bins
        // ENBW = mean(w^2) / mean(w)^2 for rectangle 1.00, triangle 1.33, Hamming (0.54/0.46) 1.36,
        // 3-term (-67 dB) 1.71 and 4-term (-92 dB) Blackman-Harris 2.00, given to two decimals; mean(w) here by
        // the trapezoid rule, independent of the Simpson rule of meanSquare()
        int n = 100000;
        double mean = 0;
        for (int i = 0; i <= n; i++) {
            mean += (i == 0 || i == n ? 0.5 : 1.0) * a.weight((double) i / n);
        }
        mean /= n;
        assertEquals(enbwBins, a.meanSquare() / (mean * mean), 0.006);
    }

    @Test
    void parseIgnoresCaseAndNamesUnknownText() {
        assertEquals(Apodization.HAPP_GENZEL, Apodization.parse("happ_genzel"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Apodization.parse("hann"));
        assertEquals(true, e.getMessage().contains("'hann'"));
    }
}
