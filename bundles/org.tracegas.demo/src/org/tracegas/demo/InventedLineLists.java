package org.tracegas.demo;

import org.tracegas.report.campaign.WholeFile;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/**
 * Writes the invented line lists of the demo gases in the published HITRAN 160-character record format, so
 * that the demo library is made by the same reader and line-by-line engine a lab uses with real line lists.
 * Linear molecules get rigid-rotor P and R branches (and a Q branch where the band has one); the others get
 * a seeded scatter of lines around the band origin. The numbers are plausible, not real molecular data.
 */
final class InventedLineLists {

    /** Second radiation constant hc/k, cm K (CODATA 2018). */
    private static final double C2 = 1.438776877;
    private static final double T_REF = 296.0;
    private static final int SCATTERED_LINES = 900;
    private static final double SCATTER_HALF_WIDTH = 320.0;

    private InventedLineLists() {
    }

    /** Name of the line list file of a gas. */
    static String fileName(Gas gas) {
        return gas.name().toLowerCase(Locale.ROOT) + "-invented.par";
    }

    /** Writes the line list of a gas into a folder and returns its file. */
    static Path write(Gas gas, Path folder) throws IOException {
        Files.createDirectories(folder);
        Path file = folder.resolve(fileName(gas));
        WholeFile.write(file, stream -> {
            Writer out = new OutputStreamWriter(stream, StandardCharsets.US_ASCII);
            for (Gas.Band band : gas.bands()) {
                if (band.rotational() > 0) {
                    writeBranches(out, gas, band);
                } else {
                    writeScatter(out, gas, band);
                }
            }
            out.flush();
        });
        return file;
    }

    private static void writeBranches(Writer out, Gas gas, Gas.Band band) throws IOException {
        double b = band.rotational();
        int jMax = 1;
        while (b * jMax * (jMax + 1) * C2 / T_REF < 12.0) {
            jMax++;
        }
        double total = 0;
        for (int j = 0; j <= jMax; j++) {
            double boltzmann = Math.exp(-b * j * (j + 1) * C2 / T_REF);
            total += (2 * j + 1) * boltzmann * (band.qBranch() ? 1.5 : 1.0);
        }
        double scale = band.strength() / total;
        for (int j = 0; j <= jMax; j++) {
            double lower = b * j * (j + 1);
            double boltzmann = Math.exp(-lower * C2 / T_REF);
            write(out, gas, band, band.origin() + 2 * b * (j + 1) - 0.002 * b * (j + 1) * (j + 1),
                    scale * (j + 1) * boltzmann, lower);
            if (j > 0) {
                write(out, gas, band, band.origin() - 2 * b * j - 0.002 * b * j * j, scale * j * boltzmann, lower);
                if (band.qBranch()) {
                    write(out, gas, band, band.origin() - 0.004 * b * j * (j + 1), scale * 0.5 * (2 * j + 1) * boltzmann,
                            lower);
                }
            }
        }
    }

    private static void writeScatter(Writer out, Gas gas, Gas.Band band) throws IOException {
        Random random = new Random(Double.doubleToLongBits(band.origin()));
        double[] position = new double[SCATTERED_LINES];
        double[] weight = new double[SCATTERED_LINES];
        double[] lower = new double[SCATTERED_LINES];
        double total = 0;
        for (int i = 0; i < SCATTERED_LINES; i++) {
            position[i] = band.origin() + SCATTER_HALF_WIDTH * (2 * random.nextDouble() - 1);
            weight[i] = Math.pow(10, -3 * random.nextDouble());
            lower[i] = 1500 * random.nextDouble();
            total += weight[i];
        }
        for (int i = 0; i < SCATTERED_LINES; i++) {
            write(out, gas, band, position[i], band.strength() * weight[i] / total, lower[i]);
        }
    }

    private static void write(Writer out, Gas gas, Gas.Band band, double wavenumber, double intensity, double lower)
            throws IOException {
        StringBuilder s = new StringBuilder(160);
        s.append(String.format(Locale.ROOT, "%2d%1d%12.6f%10.3E%10.3E", gas.hitranId(), 1, wavenumber, intensity, 1.0));
        s.append(fraction(band.gammaAir(), 5, 4)).append(fraction(band.gammaSelf(), 5, 3));
        s.append(String.format(Locale.ROOT, "%10.4f%4.2f", lower, 0.72)).append(fraction(-0.0025, 8, 6));
        while (s.length() < 160) {
            s.append(' ');
        }
        out.write(s.toString());
        out.write('\n');
    }

    /** A Fortran Fw.d field: the leading zero of a value below 1 is dropped so that the field keeps its width. */
    private static String fraction(double value, int width, int decimals) {
        String text = String.format(Locale.ROOT, "%." + decimals + "f", value).replaceFirst("^(-?)0\\.", "$1.");
        return " ".repeat(Math.max(0, width - text.length())) + text;
    }
}
