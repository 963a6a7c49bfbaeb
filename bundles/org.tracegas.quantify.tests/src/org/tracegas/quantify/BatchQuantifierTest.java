package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

class BatchQuantifierTest {

    private static Quantifier quantifier;
    private static List<Sample> samples;

    @BeforeAll
    static void prepare() {
        quantifier = new Quantifier(PreparedMethod.prepare(Mixture.method().build(), SyntheticGas.AXIS), "lib-7",
                "2.3.1", false);
        double[] clean = Mixture.clean(Mixture.TRUTH);
        Random random = new Random(99);
        samples = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            samples.add(Sample.of(Mixture.noisy(clean, random)));
        }
    }

    private static List<SpectrumResult> run(int threads) {
        List<SpectrumResult> out = new ArrayList<>();
        BatchOutcome outcome = new BatchQuantifier(quantifier, threads).run(samples.spliterator(), out::add,
                ProgressListener.NONE, new CancellationFlag());
        assertEquals(new BatchOutcome(samples.size(), false), outcome);
        return out;
    }

    /** Same inputs and versions give bit-identical numbers on 1, 3 and 8 threads and in a plain loop. */
    @Test
    void resultsAreBitIdenticalWhateverTheThreadCount() {
        List<SpectrumResult> one = run(1);
        List<SpectrumResult> three = run(3);
        List<SpectrumResult> eight = run(8);
        for (int i = 0; i < samples.size(); i++) {
            SpectrumResult direct = quantifier.quantify(samples.get(i));
            assertEquals(direct, one.get(i), "sample " + i);
            assertEquals(one.get(i), three.get(i), "sample " + i);
            assertEquals(one.get(i), eight.get(i), "sample " + i);
            for (int c = 0; c < direct.compounds().size(); c++) {
                assertEquals(Double.doubleToRawLongBits(one.get(i).compounds().get(c).concentration()),
                        Double.doubleToRawLongBits(eight.get(i).compounds().get(c).concentration()));
                assertEquals(Double.doubleToRawLongBits(one.get(i).compounds().get(c).standardUncertainty()),
                        Double.doubleToRawLongBits(eight.get(i).compounds().get(c).standardUncertainty()));
            }
        }
    }

    @Test
    void deliversInInputOrderAndReportsProgress() {
        List<SpectrumResult> out = new ArrayList<>();
        List<long[]> progress = new ArrayList<>();
        new BatchQuantifier(quantifier, 4).run(samples.iterator(), samples.size(), out::add,
                (done, total) -> progress.add(new long[] {done, total}), new CancellationFlag());
        for (int i = 0; i < samples.size(); i++) {
            assertEquals(quantifier.quantify(samples.get(i)).record().inputHash(), out.get(i).record().inputHash());
            assertEquals(i + 1, progress.get(i)[0]);
            assertEquals(samples.size(), progress.get(i)[1]);
        }
        assertEquals(samples.size(), progress.size());
    }

    /**
     * Items made into samples on the workers: the calling thread only hands them out, each outcome comes back in
     * input order, and its numbers are those of a plain loop bit for bit.
     */
    @Test
    void mapMakesSamplesOnTheWorkersAndDeliversInOrder() {
        Thread caller = Thread.currentThread();
        Set<Thread> workers = ConcurrentHashMap.newKeySet();
        List<SpectrumResult> out = new ArrayList<>();
        BatchOutcome outcome = new BatchQuantifier(quantifier, 3).map(samples.stream().map(Sample::absorbance)
                .iterator(), samples.size(), (fitter, absorbance) -> {
                    workers.add(Thread.currentThread());
                    return fitter.quantify(Sample.of(absorbance));
                }, out::add, ProgressListener.NONE, new CancellationFlag());
        assertEquals(new BatchOutcome(samples.size(), false), outcome);
        assertFalse(workers.contains(caller));
        for (int i = 0; i < samples.size(); i++) {
            assertEquals(quantifier.quantify(samples.get(i)), out.get(i), "sample " + i);
        }
    }

    /**
     * Runs one after the other (the batch path's work units) use the quantifier's own workers, started once and no
     * more than its thread count; a cancelled run leaves them to the next, which delivers everything.
     */
    @Test
    void runsOneAfterTheOtherShareTheWorkers() {
        BatchQuantifier batch = new BatchQuantifier(quantifier, 2);
        List<Set<Thread>> workersOfRun = new ArrayList<>();
        for (int run = 0; run < 3; run++) {
            Set<Thread> workers = ConcurrentHashMap.newKeySet();
            workersOfRun.add(workers);
            CancellationFlag cancel = new CancellationFlag();
            List<SpectrumResult> out = new ArrayList<>();
            BatchOutcome outcome = batch.map(samples.iterator(), samples.size(), (fitter, sample) -> {
                workers.add(Thread.currentThread());
                return fitter.quantify(sample);
            }, result -> {
                out.add(result);
                if (workersOfRun.size() == 2 && out.size() == 3) {
                    cancel.cancel();
                }
            }, ProgressListener.NONE, cancel);
            assertEquals(workersOfRun.size() == 2 ? new BatchOutcome(3, true)
                    : new BatchOutcome(samples.size(), false), outcome);
        }
        Set<Thread> all = ConcurrentHashMap.newKeySet();
        workersOfRun.forEach(all::addAll);
        // a pool per run would have started at least one thread for each of the three
        assertTrue(all.size() <= 2, "workers " + all);
    }

    /** Cancelled after the fifth result: exactly five delivered, nothing after the flag was set. */
    @Test
    void cancellationStopsDeliveryAtOnce() {
        CancellationFlag flag = new CancellationFlag();
        List<SpectrumResult> out = new ArrayList<>();
        BatchOutcome outcome = new BatchQuantifier(quantifier, 4).run(samples.iterator(), -1, r -> {
            out.add(r);
            if (out.size() == 5) {
                flag.cancel();
            }
        }, ProgressListener.NONE, flag);
        assertEquals(new BatchOutcome(5, true), outcome);
        assertEquals(5, out.size());
        for (int i = 0; i < 5; i++) {
            assertEquals(quantifier.quantify(samples.get(i)), out.get(i));
        }
        CancellationFlag early = new CancellationFlag();
        early.cancel();
        List<SpectrumResult> none = new ArrayList<>();
        assertEquals(new BatchOutcome(0, true), new BatchQuantifier(quantifier, 2).run(samples.iterator(), -1,
                none::add, ProgressListener.NONE, early));
        assertTrue(none.isEmpty());
    }

    @Test
    void badSampleStopsTheBatchNamingItsIndex() {
        List<Sample> withBad = new ArrayList<>(samples.subList(0, 10));
        withBad.set(7, Sample.of(new Spectrum(SyntheticGas.AXIS, new double[SyntheticGas.AXIS.size()],
                Ordinate.TRANSMITTANCE)));
        List<SpectrumResult> out = new ArrayList<>();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BatchQuantifier(quantifier, 3).run(withBad.iterator(), 10, out::add, ProgressListener.NONE,
                        new CancellationFlag()));
        assertTrue(e.getMessage().startsWith("sample 7: "), e.getMessage());
        assertTrue(e.getMessage().contains("ABSORBANCE"), e.getMessage());
        assertEquals(7, out.size());
        assertFalse(out.contains(null));
    }

    @Test
    void refusesNoThreads() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BatchQuantifier(quantifier, 0));
        assertTrue(e.getMessage().contains("threads"));
    }
}
