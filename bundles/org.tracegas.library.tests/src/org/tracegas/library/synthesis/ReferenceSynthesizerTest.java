package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.Compound;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.preprocess.Apodization;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;

class ReferenceSynthesizerTest {

    private static final Compound CO = new Compound("Carbon monoxide", "630-08-0", "CO", 28.0101);

    @TempDir
    Path dir;

    private static double integral(ReferenceSpectrum r) {
        double sum = 0;
        for (int i = 0; i < r.spectrum().size(); i++) {
            sum += r.spectrum().get(i);
        }
        return sum * r.spectrum().axis().step();
    }

    private static SynthesisRequest request(double ppm, double metres, SpectralAxis axis) {
        return new SynthesisRequest(new AbsorptionPath(296.0, 101.325, ppm, metres), axis,
                Apodization.NORTON_BEER_MEDIUM, 0.5, 0.03);
    }

    /**
     * Beer-Lambert after the instrument line shape: for a thin line the decadic absorbance integrates to
     * S N L / ln 10 (the line shape has unit area, so convolution keeps the area); 0.5 % allowed, the Lorentz
     * wings beyond the 25 cm-1 cut-off take 0.18 %.
     */
    @Test
    void thinLineKeepsItsAreaThroughTheInstrumentLineShape() {
        ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(
                LineByLineModelTest.singleLine(1e-21, 0.07, LineCutoff.standard()), CO);
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2060.0, 0.125, 641);
        ReferenceSpectrum r = synthesizer.synthesize(request(100.0, 1.0, axis));
        double expected = 1e-21 * LineByLineModelTest.density(100.0, 101.325, 296.0) * 100.0 / Math.log(10);
        assertEquals(expected, integral(r), 0.005 * expected);
        assertEquals(axis, r.spectrum().axis());
        assertEquals(Ordinate.ABSORBANCE, r.spectrum().ordinate());
    }

    @Test
    void resultIsMarkedSyntheticWithItsConditions() {
        ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(
                LineByLineModelTest.singleLine(1e-21, 0.07, LineCutoff.standard()), CO);
        ReferenceSpectrum r = synthesizer.synthesize(
                request(50.0, 4.0, SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2090.0, 0.25, 81)));
        assertTrue(r.isSynthetic());
        assertEquals(OriginKind.SYNTHETIC, r.metadata().origin().kind());
        assertEquals(200.0, r.metadata().conditions().concentrationPathLength(), 1e-12);
        assertEquals("NORTON_BEER_MEDIUM", r.metadata().conditions().apodization());
        assertEquals(0.5, r.metadata().conditions().resolution(), 0);
        assertEquals(0.03, r.metadata().relativeUncertainty(), 0);
        assertTrue(r.toString().contains("synthetic (line by line from one line (1 lines)"), r.toString());
    }

    /** Synthesis is deterministic: a library of the same synthetic references has the same content hash. */
    @Test
    void severalConcentrationsMakeAReproducibleSyntheticLibrary() {
        ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(
                LineByLineModelTest.singleLine(1e-20, 0.07, LineCutoff.standard()), CO);
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2080.0, 0.25, 161);
        List<ReferenceSpectrum> first = new ArrayList<>();
        List<ReferenceSpectrum> second = new ArrayList<>();
        for (double ppm : new double[] {10, 100, 1000}) {
            first.add(synthesizer.synthesize(request(ppm, 1.0, axis)));
            second.add(0, synthesizer.synthesize(request(ppm, 1.0, axis)));
        }
        ReferenceLibrary a = new ReferenceLibrary("synthetic CO", first);
        assertEquals(a.contentHash(), new ReferenceLibrary("synthetic CO", second).contentHash());
        assertEquals(3, a.referencesFor("630-08-0").size());
        assertTrue(a.references().stream().allMatch(ReferenceSpectrum::isSynthetic));
    }

    /**
     * Curve of growth as seen through the instrument: once the line saturates, the apparent integrated absorbance
     * at 0.5 cm-1 grows less than linearly with concentration (the instrument averages transmittance, not
     * absorbance; e.g. Griffiths and de Haseth, Fourier Transform Infrared Spectrometry, from memory).
     */
    @Test
    void saturatedLineGrowsLessThanLinearlyThroughTheInstrument() {
        ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(
                LineByLineModelTest.singleLine(4e-19, 0.07, LineCutoff.standard()), CO);
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2060.0, 0.125, 641);
        double thin = integral(synthesizer.synthesize(request(0.1, 1.0, axis)));
        double thin4 = integral(synthesizer.synthesize(request(0.4, 1.0, axis)));
        double thick = integral(synthesizer.synthesize(request(1000.0, 1.0, axis)));
        double thick4 = integral(synthesizer.synthesize(request(4000.0, 1.0, axis)));
        assertEquals(4.0, thin4 / thin, 0.01);
        assertTrue(thick / 10000 < 0.8 * thin,
                "per-ppm area must fall once saturated: " + thick / 10000 + " vs " + thin);
        assertTrue(thick4 / thick < 3.0, "four times the amount gave " + thick4 / thick + " times the area");
    }

    @Test
    void rejectsAnAxisTooCoarseForTheResolution() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> request(1.0, 1.0, SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 10)));
        assertTrue(e.getMessage().contains("half the resolution"), e.getMessage());
    }

    /**
     * The figure for the product: a reference at 0.5 cm-1 with Norton-Beer medium apodization from a line list of
     * several thousand lines (invented CO-like band plus random weak lines, written to and read from a HITRAN
     * format file), 1900-2400 cm-1. The synthesis time is printed; it must stay well below a minute.
     */
    @Test
    void synthesizesFromSeveralThousandLinesInSeconds() throws IOException {
        List<String> records = new ArrayList<>();
        SyntheticLineListGenerator.coLikeBand(5000, 42)
                .forEach(l -> records.add(HitranLineListWriter.record(l)));
        Path file = dir.resolve("co-like.par");
        Files.write(file, records);
        LineList lines = new HitranLineListReader().read(file);
        assertTrue(lines.size() > 5000);
        ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(
                new LineByLineModel(lines, 28.0101, PowerLawPartitionFunction.linearMolecule()), CO);
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1900.0, 0.25, 2001);
        SynthesisRequest request = request(100.0, 10.0, axis);
        synthesizer.synthesize(request); // warm-up, so that the figure shows compiled code
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        long cpu = threads.getCurrentThreadCpuTime();
        long start = System.nanoTime();
        ReferenceSpectrum r = synthesizer.synthesize(request);
        double seconds = (System.nanoTime() - start) * 1e-9;
        System.out.printf("synthesis of %d lines, 1900-2400 cm-1 at 0.5 cm-1 %s: %.2f s wall, %.2f s CPU%n",
                lines.size(), request.apodization(), seconds, (threads.getCurrentThreadCpuTime() - cpu) * 1e-9);
        assertTrue(seconds < 30, "synthesis took " + seconds + " s");
        // strongest R-branch line (m = 7 at about 2169.5 cm-1) stands out; the region above the band holds weak
        // lines only
        int peak = axis.nearestIndex(2169.5);
        double max = 0;
        for (int i = peak - 4; i <= peak + 4; i++) {
            max = Math.max(max, r.spectrum().get(i));
        }
        assertTrue(max > 0.1, "peak absorbance " + max);
        assertTrue(r.spectrum().get(axis.nearestIndex(2380.0)) < 0.01);
        assertTrue(r.isSynthetic());
    }
}
