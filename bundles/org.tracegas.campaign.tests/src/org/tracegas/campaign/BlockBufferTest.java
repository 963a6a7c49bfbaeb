package org.tracegas.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.model.MeasurementKind;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.SampleEncoding;

/** Blocks of a fixed size, the last one short, progress only for what the sink took. */
class BlockBufferTest {

    private static ProcessedSpectrum spectrum(int i) {
        return new ProcessedSpectrum(MeasurementKind.SAMPLE, Instant.EPOCH.plusSeconds(60L * i), 438.15, 1013.0,
                new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 1, 2), new double[] {i, i},
                        Ordinate.ABSORBANCE), SampleEncoding.FLOAT32_LE, List.of());
    }

    @Test
    void fullBlocksGoAtOnceAndTheRestOnFlush() {
        List<List<ProcessedSpectrum>> blocks = new ArrayList<>();
        List<String> told = new ArrayList<>();
        BlockBuffer buffer = new BlockBuffer(3, blocks::add, (done, total) -> told.add(done + "/" + total), 7);
        List<ProcessedSpectrum> all = new ArrayList<>();
        for (int i = 0; i < 7; i++) {
            all.add(spectrum(i));
            buffer.add(all.get(i));
        }
        assertEquals(2, blocks.size());
        assertEquals(6, buffer.stored());
        buffer.flush();
        buffer.flush(); // nothing left: no empty block
        assertEquals(List.of(all.subList(0, 3), all.subList(3, 6), all.subList(6, 7)), blocks);
        assertSame(all.get(6), blocks.get(2).get(0));
        assertEquals(List.of("3/7", "6/7", "7/7"), told);
    }

    @Test
    void refusedBlockIsNotCountedAndMarksTheBufferFailed() {
        List<String> told = new ArrayList<>();
        BlockBuffer buffer = new BlockBuffer(2, block -> {
            throw new IllegalStateException("database down");
        }, (done, total) -> told.add(done + "/" + total), -1);
        buffer.add(spectrum(0));
        assertThrows(IllegalStateException.class, () -> buffer.add(spectrum(1)));
        assertTrue(buffer.failed());
        assertEquals(0, buffer.stored());
        assertEquals(List.of(), told);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BlockBuffer(0, block -> { }, (done, total) -> { }, -1));
        assertTrue(e.getMessage().startsWith("blockSize"), e.getMessage());
    }
}
