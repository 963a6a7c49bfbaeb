package org.tracegas.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.function.Consumer;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.quantify.BackgroundAge;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.Sample;
import org.tracegas.store.BlockService;
import org.tracegas.store.EncodedBlock;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * The batch path of a campaign: streams the interferograms of container files one record at a time,
 * transforms, ratios and fits them on all cores, and stores the measurements with their absorbance and
 * their results in blocks, each block in one transaction, written while the next block is read and fitted.
 * Nothing holds more than the records in flight and a few blocks, so a year of data runs in constant memory.
 */
public final class StackProcessor {

    /**
     * Spectra stored per transaction by default: large enough that a transaction's fixed cost (connection,
     * access check, audit chain lock) is spread thin, small enough that a block is a few MiB.
     */
    public static final int DEFAULT_BLOCK_SIZE = 64;

    private final WorkspaceStore store;
    private final Session actor;
    private final String projectId;
    private final SpectrumChain chain;
    private final BatchQuantifier quantifier;
    private final AnalysisVersions versions;
    private final ResultCorrection correction;
    private final String instrumentId;
    private final int blockSize;

    /** A processor storing blocks of {@link #DEFAULT_BLOCK_SIZE} spectra. */
    public StackProcessor(WorkspaceStore store, Session actor, String projectId, SpectrumChain chain,
            BatchQuantifier quantifier, AnalysisVersions versions) {
        this(store, actor, projectId, chain, quantifier, versions, DEFAULT_BLOCK_SIZE);
    }

    /**
     * @param blockSize spectra stored per transaction, at least 1
     * @throws IllegalArgumentException if the block size is below 1
     */
    public StackProcessor(WorkspaceStore store, Session actor, String projectId, SpectrumChain chain,
            BatchQuantifier quantifier, AnalysisVersions versions, int blockSize) {
        this(store, actor, projectId, chain, quantifier, versions, ResultCorrection.none(), null, blockSize);
    }

    /**
     * @param correction   corrects each result to the conditions of the cell its spectrum was recorded in
     * @param instrumentId the stored instrument that recorded the files, or null when not known: every
     *                     measurement is stored with it (one stream of container records is one instrument's)
     */
    StackProcessor(WorkspaceStore store, Session actor, String projectId, SpectrumChain chain,
            BatchQuantifier quantifier, AnalysisVersions versions, ResultCorrection correction, String instrumentId,
            int blockSize) {
        if (blockSize < 1) {
            throw new IllegalArgumentException("blockSize must be at least 1, was " + blockSize);
        }
        this.store = store;
        this.actor = actor;
        this.projectId = projectId;
        this.chain = chain;
        this.quantifier = quantifier;
        this.versions = versions;
        this.correction = correction;
        this.instrumentId = instrumentId;
        this.blockSize = blockSize;
    }

    /**
     * Processes the files in order and stores the spectra block by block. The spectra fitted so far are
     * stored also when the run is cancelled or a record cannot be processed (before that error is thrown), so
     * everything fitted in order before the stop is in the workspace. A block the workspace refuses stops the
     * run with its error; the blocks before it stay stored, none after it is, so a later run resumes there.
     *
     * @param expected number of interferograms, for progress
     * @param progress told after each stored block, with the number of spectra stored so far
     * @return how many spectra were processed and stored, and whether the run was cancelled
     */
    public BatchOutcome run(List<Path> files, long expected, ProgressListener progress, CancellationFlag cancel) {
        BlockService blocks = store.blocks();
        BlockBuffer.Sink<EncodedBlock> sink = new BlockBuffer.Sink<>() {
            @Override
            public EncodedBlock encode(List<ProcessedSpectrum> block) {
                return blocks.encode(actor, projectId, block);
            }

            @Override
            public void store(EncodedBlock block) {
                blocks.store(block);
            }
        };
        try (BlockBuffer<EncodedBlock> buffer = new BlockBuffer<>(blockSize, sink, progress, expected)) {
            BatchOutcome fitted;
            try {
                fitted = fit(files, expected, buffer::add, cancel);
            } catch (RuntimeException e) {
                if (!buffer.failed()) {
                    try {
                        buffer.finish();
                    } catch (RuntimeException storing) {
                        e.addSuppressed(storing);
                    }
                }
                throw e;
            }
            buffer.finish();
            return new BatchOutcome(buffer.stored(), fitted.cancelled());
        }
    }

    /**
     * Processes the files in order without storing anything: the spectra as {@link #run} would store them.
     * This is the processing of one work unit, whose block is stored together with the unit's completion.
     *
     * @return the processed spectra in input order; when cancelled, only the first ones
     */
    public List<ProcessedSpectrum> process(List<Path> files, CancellationFlag cancel) {
        List<ProcessedSpectrum> processed = new ArrayList<>();
        fit(files, -1, processed::add, cancel);
        return processed;
    }

    /**
     * Reads the records on the calling thread and leaves everything else to the quantifier's workers: the
     * transform, the ratio, the fit and the making of the processed spectrum, so that all of it runs on all
     * cores and the reading thread only reads.
     */
    private BatchOutcome fit(List<Path> files, long expected, Consumer<ProcessedSpectrum> consumer,
            CancellationFlag cancel) {
        String noiseOrigin = ResultCorrection.transformOrigin(chain.transformSettings());
        return quantifier.map(new RecordIterator(files), expected, (fitter, record) -> {
            MeasuredSpectrum measured = chain.process(record);
            Sample sample = new Sample(measured.ratio().spectrum(),
                    new BackgroundAge(measured.ratio().backgroundAge(), chain.backgroundAgeLimit()),
                    ResultCorrection.noiseCorrelation(measured.noiseFactor()))
                    .inCell(measured.cellTemperatureK(), measured.cellPressureKPa());
            return ProcessedSpectra.of(measured, fitter.quantify(sample), versions, correction, noiseOrigin,
                    instrumentId);
        }, consumer, ProgressListener.NONE, cancel);
    }

    /** Reads the files lazily, one record at a time. */
    private static final class RecordIterator implements Iterator<ContainerRecord> {

        private final Iterator<Path> files;
        private ContainerReader reader;

        RecordIterator(List<Path> files) {
            this.files = files.iterator();
        }

        @Override
        public boolean hasNext() {
            try {
                while (reader == null || !reader.hasNext()) {
                    if (reader != null) {
                        reader.close();
                        reader = null;
                    }
                    if (!files.hasNext()) {
                        return false;
                    }
                    reader = ContainerReader.open(files.next());
                }
                return true;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } catch (ImportException e) {
                throw new IllegalStateException(e.getMessage(), e);
            }
        }

        @Override
        public ContainerRecord next() {
            if (!hasNext()) {
                throw new NoSuchElementException();
            }
            return reader.next();
        }
    }
}
