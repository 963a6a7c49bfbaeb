package org.tracegas.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;

import org.junit.jupiter.api.Test;
import org.tracegas.model.MeasurementKind;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.StoredMeasurement;
import org.tracegas.store.UncommittedBlock;

/** Blocks of a fixed size in order, the last one short, progress only for what the sink stored. */
class BlockBufferTest {

    private static ProcessedSpectrum spectrum(int i) {
        return new ProcessedSpectrum(MeasurementKind.SAMPLE, Instant.EPOCH.plusSeconds(60L * i), 438.15, 1013.0,
                new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 1, 2), new double[] {i, i},
                        Ordinate.ABSORBANCE), SampleEncoding.FLOAT32_LE, List.of(), null);
    }

    /** A sink whose encoding is the block itself and whose commit hands it to {@code commit}. */
    private static BlockBuffer.Sink<List<ProcessedSpectrum>> sink(Consumer<List<ProcessedSpectrum>> commit) {
        return sink(block -> { }, commit, block -> { });
    }

    /** A sink telling each block's insert, commit and roll-back; the commit is skipped once rolled back. */
    private static BlockBuffer.Sink<List<ProcessedSpectrum>> sink(Consumer<List<ProcessedSpectrum>> insert,
            Consumer<List<ProcessedSpectrum>> commit, Consumer<List<ProcessedSpectrum>> rollBack) {
        return new BlockBuffer.Sink<>() {
            @Override
            public List<ProcessedSpectrum> encode(List<ProcessedSpectrum> block) {
                return block;
            }

            @Override
            public UncommittedBlock insert(List<ProcessedSpectrum> block) {
                insert.accept(block);
                return new UncommittedBlock() {
                    private boolean ended;

                    @Override
                    public int size() {
                        return block.size();
                    }

                    @Override
                    public List<StoredMeasurement> commit() {
                        ended = true;
                        commit.accept(block);
                        return List.of();
                    }

                    @Override
                    public void close() {
                        if (!ended) {
                            ended = true;
                            rollBack.accept(block);
                        }
                    }
                };
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
        assertEquals(List.of(all.subList(0, 3), all.subList(3, 6), all.subList(6, 7)), blocks);
        assertSame(all.get(6), blocks.get(2).get(0));
        assertEquals(List.of("3/7", "6/7", "7/7"), told, "told once per stored block, on the caller's thread");
    }

    @Test
    void refusedBlockStopsTheStoringAndIsThrownToTheCaller() {
        List<List<ProcessedSpectrum>> blocks = new CopyOnWriteArrayList<>();
        List<String> told = new ArrayList<>();
        IllegalStateException refusal = new IllegalStateException("database down");
        try (BlockBuffer<List<ProcessedSpectrum>> buffer = new BlockBuffer<>(2, sink(block -> {
            if (block.get(0).time().equals(Instant.EPOCH.plusSeconds(120))) {
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
            assertEquals(2, buffer.stored());
        }
        assertEquals(1, blocks.size(), "no block after the refused one is stored");
        assertEquals(List.of("2/-1"), told);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BlockBuffer<>(0, sink(block -> { }), (done, total) -> { }, -1));
        assertTrue(e.getMessage().startsWith("blockSize"), e.getMessage());
    }

    /**
     * The next block is inserted while the previous one commits (the commit here waits until it is), and commits
     * only after it.
     */
    @Test
    void nextBlockIsInsertedWhileThePreviousCommits() {
        List<String> steps = new CopyOnWriteArrayList<>();
        CountDownLatch secondInserted = new CountDownLatch(1);
        try (BlockBuffer<List<ProcessedSpectrum>> buffer = new BlockBuffer<>(2, sink(block -> {
            steps.add("insert " + block.get(0).time().getEpochSecond() / 60);
            if (block.get(0).time().getEpochSecond() == 120) {
                secondInserted.countDown();
            }
        }, block -> {
            if (block.get(0).time().getEpochSecond() == 0) {
                await(secondInserted);
            }
            steps.add("commit " + block.get(0).time().getEpochSecond() / 60);
        }, block -> steps.add("roll back " + block.get(0).time().getEpochSecond() / 60)),
                (done, total) -> { }, 6)) {
            for (int i = 0; i < 6; i++) {
                buffer.add(spectrum(i));
            }
            buffer.finish();
            assertEquals(6, buffer.stored());
        }
        assertEquals(List.of("insert 0", "insert 2", "commit 0"), steps.subList(0, 3), "steps " + steps);
        // the last block may be inserted before or after the second commits, but commits after it
        assertEquals(6, steps.size(), "steps " + steps);
        assertTrue(steps.indexOf("commit 2") < steps.indexOf("commit 4"), "steps " + steps);
        assertEquals("commit 4", steps.get(5), "steps " + steps);
    }

    /**
     * A refused commit stops the storing: the block inserted meanwhile is rolled back, never committed, and the
     * refusal reaches the caller.
     */
    @Test
    void refusedCommitRollsBackTheBlockInsertedAfterIt() {
        List<String> steps = new CopyOnWriteArrayList<>();
        CountDownLatch secondInserted = new CountDownLatch(1);
        IllegalStateException refusal = new IllegalStateException("disk full");
        try (BlockBuffer<List<ProcessedSpectrum>> buffer = new BlockBuffer<>(2, sink(block -> {
            steps.add("insert " + block.get(0).time().getEpochSecond() / 60);
            if (block.get(0).time().getEpochSecond() == 240) {
                secondInserted.countDown();
            }
        }, block -> {
            if (block.get(0).time().getEpochSecond() == 120) {
                await(secondInserted);
                throw refusal;
            }
            steps.add("commit " + block.get(0).time().getEpochSecond() / 60);
        }, block -> steps.add("roll back " + block.get(0).time().getEpochSecond() / 60)),
                (done, total) -> { }, -1)) {
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> {
                for (int i = 0; i < 10; i++) {
                    buffer.add(spectrum(i));
                }
                buffer.finish();
            });
            assertSame(refusal, e);
            assertEquals(2, buffer.stored());
        }
        // the first commit may end before or after the second block is inserted
        assertEquals(5, steps.size(), "steps " + steps);
        assertEquals("insert 0", steps.get(0), "steps " + steps);
        assertTrue(steps.subList(1, 3).containsAll(List.of("commit 0", "insert 2")), "steps " + steps);
        assertEquals(List.of("insert 4", "roll back 4"), steps.subList(3, 5), "steps " + steps);
    }

    private static void await(CountDownLatch latch) {
        try {
            if (!latch.await(30, TimeUnit.SECONDS)) {
                throw new IllegalStateException("the next block was not inserted while this one committed");
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }
}
