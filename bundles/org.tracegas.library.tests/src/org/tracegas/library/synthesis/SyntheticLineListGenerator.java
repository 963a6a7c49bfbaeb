package org.tracegas.library.synthesis;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Plausible, invented line lists in the HITRAN 2004+ 160-character format: a CO-like fundamental band with
 * P and R branches (rotational constants of that order from memory, not taken from any line list), a weak
 * isotopic copy of it, and randomly placed weak lines. For tests and timing only; not molecular data.
 */
final class SyntheticLineListGenerator {

    private static final double B_LOWER = 1.92;
    private static final double B_UPPER = 1.90;
    private static final double BAND_CENTRE = 2143.0;

    private SyntheticLineListGenerator() {
    }

    /** Lines of the band (J up to 35 in P and R), its isotopic copy, and {@code weakLines} random lines. */
    static List<SpectralLine> coLikeBand(int weakLines, long seed) {
        List<SpectralLine> lines = new ArrayList<>();
        addBand(lines, 1, BAND_CENTRE, 1.0);
        addBand(lines, 2, BAND_CENTRE - 47.0, 0.011);
        Random random = new Random(seed);
        for (int i = 0; i < weakLines; i++) {
            double v = 1900.0 + 500.0 * random.nextDouble();
            double s = Math.pow(10.0, -26.0 + 4.0 * random.nextDouble());
            lines.add(new SpectralLine(5, 3, round(v, 6), roundSignificant(s), 1.0,
                    round(0.05 + 0.04 * random.nextDouble(), 4), round(0.06 + 0.03 * random.nextDouble(), 3),
                    round(2000.0 * random.nextDouble(), 4),
                    round(0.6 + 0.2 * random.nextDouble(), 2), round(-0.004 * random.nextDouble(), 6)));
        }
        return lines;
    }

    private static void addBand(List<SpectralLine> lines, int isotopologue, double centre, double abundance) {
        double peak = 4.5e-19 * abundance;
        double strongest = 7.0 * Math.exp(-PhysicalConstants.C2 * B_LOWER * 42.0 / 296.0);
        for (int j = 0; j <= 35; j++) {
            for (int branch = -1; branch <= 1; branch += 2) {
                int m = branch > 0 ? j + 1 : -j;
                if (m == 0) {
                    continue;
                }
                double lower = B_LOWER * j * (j + 1);
                double v = centre + (B_UPPER + B_LOWER) * m + (B_UPPER - B_LOWER) * m * m;
                double s = peak * Math.abs(m) * Math.exp(-PhysicalConstants.C2 * lower / 296.0) / strongest;
                lines.add(new SpectralLine(5, isotopologue, round(v, 6), roundSignificant(s), 30.0,
                        round(0.078 - 0.0007 * Math.abs(m), 4), round(0.085 - 0.0006 * Math.abs(m), 3), round(lower, 4),
                        0.72, -0.0025));
            }
        }
    }

    private static double round(double v, int decimals) {
        return Double.parseDouble(String.format(Locale.ROOT, "%." + decimals + "f", v));
    }

    private static double roundSignificant(double v) {
        return Double.parseDouble(String.format(Locale.ROOT, "%.3E", v));
    }
}
