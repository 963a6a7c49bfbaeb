package org.tracegas.qa.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class StudentTTest {

    @ParameterizedTest
    @CsvSource({"1, 12.71, 1.84", "2, 4.30, 1.32", "3, 3.18, 1.20", "4, 2.78, 1.14", "5, 2.57, 1.11",
            "10, 2.23, 1.05", "16, 2.12, 1.03", "20, 2.09, 1.03", "50, 2.01, 1.01", "Infinity, 1.96, 1.00"})
    void quantilesOfTheGumTable(double nu, double t95, double t68) {
        // JCGM 100:2008 Table G.2, t_p(nu) for p = 95 % and 68.27 %, two decimals (from memory; the same as
        // scipy.stats.t.ppf to the digits given)
        assertEquals(t95, StudentT.twoSidedQuantile(0.95, nu), 0.005 + 1e-9);
        assertEquals(t68, StudentT.twoSidedQuantile(0.6827, nu), 0.005 + 1e-9);
    }

    @ParameterizedTest
    @CsvSource({"0, 3", "1, 3", "0.95, 0.5"})
    void rejectsImpossibleArguments(double p, double nu) {
        assertThrows(IllegalArgumentException.class, () -> StudentT.twoSidedQuantile(p, nu));
    }
}
