package org.tracegas.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.model.Instrument;
import org.tracegas.spectrum.Interferogram;

/** The figures of an invented analyzer read from the real container files it wrote. */
class ContainerInstrumentTest {

    /** HeNe reference laser, cm-1 (632.99 nm in air; common practice, no source). */
    private static final double HENE = 15798.0;

    @TempDir
    Path folder;

    /**
     * A file of one double-sided interferogram of {@code points} samples, one every second laser fringe, its zero
     * path difference at {@code zpd}.
     */
    private Path file(String name, int points, int zpd, double pathM) throws Exception {
        Path file = folder.resolve(name);
        try (ContainerWriter out = ContainerWriter.create(file)) {
            out.append(new AcquisitionHeader(zpd, SampleKind.SAMPLE, Instant.parse("2026-05-04T06:00:00Z"), 438.15,
                    1013.0, pathM, Map.of()), new Interferogram(new double[points], HENE, 2));
            out.commit();
        }
        return file;
    }

    @Test
    void theFiguresAreTheLaserTheLongerSideFromZeroPathDifferenceAndTheCellPath() throws Exception {
        // 15798 samples 2/15798 cm apart with the ZPD in the middle: 7899 samples, 1 cm, on the longer side; a
        // nominal resolution of 1 cm-1, the reciprocal of the maximum path difference (from memory: Griffiths and
        // de Haseth, Fourier Transform Infrared Spectrometry, ch. 2)
        Instrument i = ContainerInstrument.describe(List.of(file("a.tgic", 15798, 7899, 6.4),
                file("b.tgic", 15798, 7899, 6.4)), "Bench analyzer 2", "TB-0007");
        assertEquals("Bench analyzer 2", i.getName());
        assertEquals("TB-0007", i.getSerialNumber());
        assertEquals(HENE, i.getLaserWavenumber());
        assertEquals(1.0, i.getMaxPathDifference(), 1e-12);
        assertEquals(6.4, i.getCellPathLength());
        assertFalse(i.isSetFieldOfView(), "containers carry no field of view");
        // a single-sided record: ZPD near the start, the long side counts
        Instrument single = ContainerInstrument.describe(List.of(file("c.tgic", 8000, 100, 6.4)), "B", "1");
        assertEquals(7899 * 2 / HENE, single.getMaxPathDifference(), 1e-12);
    }

    @Test
    void filesOfDifferentSetUpsAreRefusedNamingFileAndField() throws Exception {
        Path first = file("a.tgic", 15798, 7899, 6.4);
        Path other = file("b.tgic", 15798, 7899, 10.0);
        ImportException e = assertThrows(ImportException.class,
                () -> ContainerInstrument.describe(List.of(first, other), "Bench analyzer 2", "TB-0007"));
        assertEquals(other.toString(), e.source());
        assertTrue(e.getMessage().contains("path.length.m"), e.getMessage());
    }
}
