package org.tracegas.importer.jcamp;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportedInterferogram;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** What the writer writes reads back to the same values, within the stated quantisation. */
class JcampWriterTest {

    private final JcampReader reader = new JcampReader();

    @Test
    void integersRoundTripExactly() throws Exception {
        double[] y = {0, 5, 5, 5, 5, 7, -123456789, 42, 42, 42, 1L << 39, 3};
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 4000, -0.5, y.length), y,
                Ordinate.ARBITRARY);
        String text = JcampWriter.defaultPrecision().write(s, "integers", Map.of());
        assertTrue(text.contains("##YFACTOR=1.0\n"), text);
        Spectrum back = ((ImportedSpectrum) reader.read(text, "i.jdx").records().get(0)).spectrum();
        assertArrayEquals(y, back.toArray(), 0.0);
        assertEquals(s.axis(), back.axis());
    }

    @Test
    void realDataRoundTripsWithinTheStatedPrecision() throws Exception {
        Random random = new Random(7);
        int n = 4000;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 0.8 * Math.exp(-Math.pow((i - 1700) / 30.0, 2)) + 1e-3 * random.nextGaussian();
        }
        double max = 0;
        for (double v : y) {
            max = Math.max(max, Math.abs(v));
        }
        for (double precision : new double[] {1e-3, 1e-7, 1e-10}) {
            JcampWriter writer = new JcampWriter(precision);
            Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 600.0, 0.482117, n), y,
                    Ordinate.ABSORBANCE);
            String text = writer.write(s, "real", Map.of("OWNER", "public domain", "operator", "night shift"));
            for (String line : text.split("\n")) {
                assertTrue(line.length() <= 80, line);
            }
            ImportedSpectrum back = (ImportedSpectrum) reader.read(text, "r.jdx").records().get(0);
            double[] r = back.spectrum().toArray();
            double worst = 0;
            for (int i = 0; i < n; i++) {
                worst = Math.max(worst, Math.abs(r[i] - y[i]));
            }
            // the stated bound: half a quantisation step, precision * max|y|; and not far below it either,
            // which shows the quantisation is really applied
            assertTrue(worst <= precision * max, "precision " + precision + ": worst error " + worst);
            assertTrue(worst > 0.5 * precision * max, "precision " + precision + ": worst error " + worst);
            assertEquals(s.axis(), back.spectrum().axis());
            assertEquals("night shift", back.metadata().get("$operator"));
            assertEquals("public domain", back.metadata().get("OWNER"));
        }
    }

    @Test
    void difLinesCarryCheckValuesThatTheReaderVerifies() throws Exception {
        double[] y = new double[300];
        for (int i = 0; i < y.length; i++) {
            y[i] = i * (i % 7);
        }
        String text = JcampWriter.defaultPrecision().write(new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER,
                1000, 1, y.length), y, Ordinate.ARBITRARY), "check", Map.of());
        String[] lines = text.substring(text.indexOf("(X++(Y..Y))\n") + 12).split("\n");
        assertTrue(lines.length > 3);
        // corrupt the check value of the third data line: the reader must notice
        String broken = text.replace("\n" + lines[2] + "\n", "\n" + lines[2].replaceFirst("^(\\S+ )[@A-Ia-i]\\d*",
                "$1" + "A9999") + "\n");
        assertTrue(!broken.equals(text));
        assertTrue(assertThrows(org.tracegas.importer.ImportException.class, () -> reader.read(broken, "b.jdx"))
                .field().contains("Y check"));
    }

    @Test
    void nonUniformMicrometreAxisGoesToXyPoints(@TempDir Path dir) throws Exception {
        Spectrum s = new Spectrum(SpectralAxis.of(AxisUnit.MICROMETRE, 2.5, 2.6, 2.75, 3.1), new double[] {0.9, 0.8,
                0.5, 1e-5}, Ordinate.TRANSMITTANCE);
        Path f = dir.resolve("t.jdx");
        JcampWriter.save(JcampWriter.defaultPrecision().write(s, "t", Map.of()), f);
        Spectrum back = ((ImportedSpectrum) reader.read(f, ImportOptions.defaults()).records().get(0)).spectrum();
        assertEquals(s, back);
    }

    @Test
    void interferogramRoundTrip() throws Exception {
        double[] samples = new double[1024];
        for (int i = 0; i < samples.length; i++) {
            samples[i] = Math.cos(0.2 * (i - 512)) * Math.exp(-Math.abs(i - 512) / 40.0);
        }
        Interferogram ifg = new Interferogram(samples, 15798.0, 2);
        String text = new JcampWriter(1e-9).write(ifg, "ifg", Map.of());
        Interferogram back = ((ImportedInterferogram) reader.read(text, "i.jdx").records().get(0)).interferogram();
        assertArrayEquals(samples, back.toArray(), 1e-9);
        assertEquals(15798.0, back.laserWavenumber());
        assertEquals(2, back.samplingInterval());
    }

    @Test
    void rejectsMultiLineMetadata() {
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1, 1, 2), new double[] {1, 2},
                Ordinate.ABSORBANCE);
        assertThrows(IllegalArgumentException.class,
                () -> JcampWriter.defaultPrecision().write(s, "t", Map.of("a", "x\n##END=")));
        assertThrows(IllegalArgumentException.class, () -> new JcampWriter(0.5));
    }
}
