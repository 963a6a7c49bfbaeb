package org.tracegas.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.junit.jupiter.api.Test;
import org.tracegas.model.MeasurementKind;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.SampleEncoding;

/** Blocks of a fixed size in order, the last one short, progress only for what the sink stored. */
class BlockBufferTest {

    private static ProcessedSpectrum spectrum(int i) {
        return new ProcessedSpectrum(MeasurementKind.SAMPLE, Instant.EPOCH.plusSeconds(60L * i), 438.15, 1013.0,
                new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 1, 2), new double[] {i, i},
                        Ordinate.ABSORBANCE), SampleEncoding.FLOAT32_LE, List.of(), null);
    }

    /** A sink whose encoding is the block itself. */
    private static BlockBuffer.Sink<List<ProcessedSpectrum>> sink(Consumer<List<ProcessedSpectrum>> store) {
        return new BlockBuffer.Sink<>() {
            @Override
            public List<ProcessedSpectrum> encode(List<ProcessedSpectrum> block) {
                return block;
            }

            @Override
            public void store(List<ProcessedSpectrum> block) {
                store.accept(block);
            }
        };
    }

    @Test
    void fullBlocksGoInOrderAndTheRestOnFinish() {
        List<List<ProcessedSpectrum>> blocks = new CopyOnWriteArrayList<>();
        List<String> told = new ArrayList<>();
        List<ProcessedSpectrum> all = new ArrayList<>();
        try (BlockBuffer<List<ProcessedSpectrum>> buffer = new BlockBuffer<>(3, sink(blocks::add),
                (done, total) -> told.add(done + "/" + total), 7)) {
            for (int i = 0; i < 7; i++) {
                all.add(spectrum(i));
                buffer.add(all.get(i));
            }
            buffer.finish();
            buffer.finish(); // nothing left: no empty block
            assertEquals(7, buffer.stored());
        }
        // the first block a single spectrum (3 / 8, at least 1), then twice as many up to the block size
        assertEquals(List.of(all.subList(0, 1), all.subList(1, 3), all.subList(3, 6), all.subList(6, 7)), blocks);
        assertSame(all.get(6), blocks.get(3).get(0));
        assertEquals(List.of("1/7", "3/7", "6/7", "7/7"), told, "told once per stored block, on the caller's thread");
    }

    @Test
    void refusedBlockStopsTheStoringAndIsThrownToTheCaller() {
        List<List<ProcessedSpectrum>> blocks = new CopyOnWriteArrayList<>();
        List<String> told = new ArrayList<>();
        IllegalStateException refusal = new IllegalStateException("database down");
        try (BlockBuffer<List<ProcessedSpectrum>> buffer = new BlockBuffer<>(2, sink(block -> {
            // blocks of 1, 2, 2, 2, 1 spectra: the third is refused
            if (block.get(0).time().equals(Instant.EPOCH.plusSeconds(180))) {
                throw refusal;
            }
            blocks.add(block);
        }), (done, total) -> told.add(done + "/" + total), -1)) {
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> {
                for (int i = 0; i < 8; i++) {
                    buffer.add(spectrum(i));
                }
                buffer.finish();
            });
            assertSame(refusal, e);
            assertTrue(buffer.failed());
            assertEquals(3, buffer.stored());
        }
        assertEquals(2, blocks.size(), "no block after the refused one is stored");
        assertEquals(List.of("1/-1", "3/-1"), told);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BlockBuffer<>(0, sink(block -> { }), (done, total) -> { }, -1));
        assertTrue(e.getMessage().startsWith("blockSize"), e.getMessage());
    }

    /** Blocks of 64: the first holds 8, then 16 and 32, and from then on 64, the last what is left. */
    @Test
    void theFirstBlocksAreSmallSoThatStoringStartsEarly() {
        List<Integer> sizes = new CopyOnWriteArrayList<>();
        try (BlockBuffer<List<ProcessedSpectrum>> buffer = new BlockBuffer<>(64, sink(block -> sizes.add(
                block.size())), (done, total) -> { }, 200)) {
            for (int i = 0; i < 200; i++) {
                buffer.add(spectrum(i));
            }
            buffer.finish();
            assertEquals(200, buffer.stored());
        }
        assertEquals(List.of(8, 16, 32, 64, 64, 16), sizes);
    }
}
