package org.tracegas.campaign;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Queue;
import java.util.concurrent.ConcurrentLinkedQueue;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.SpectralContent;
import org.tracegas.quantify.BackgroundAge;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.store.NewResult;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.WorkspaceStore;

/**
 * The batch path of a campaign: streams the interferograms of container files one record at a time,
 * transforms and ratios them, fits them on all cores, and stores each measurement with its absorbance and
 * its results. Nothing holds more than the records in flight, so a year of data runs in constant memory.
 */
public final class StackProcessor {

    private final WorkspaceStore store;
    private final Session actor;
    private final String projectId;
    private final SpectrumChain chain;
    private final BatchQuantifier quantifier;
    private final AnalysisVersions versions;

    public StackProcessor(WorkspaceStore store, Session actor, String projectId, SpectrumChain chain,
            BatchQuantifier quantifier, AnalysisVersions versions) {
        this.store = store;
        this.actor = actor;
        this.projectId = projectId;
        this.chain = chain;
        this.quantifier = quantifier;
        this.versions = versions;
    }

    /**
     * Processes the files in order.
     *
     * @param expected number of interferograms, for progress
     * @return how many spectra were processed and stored, and whether the run was cancelled
     */
    public BatchOutcome run(List<Path> files, long expected, ProgressListener progress, CancellationFlag cancel) {
        Queue<MeasuredSpectrum> inFlight = new ConcurrentLinkedQueue<>();
        Iterator<Sample> samples = new SampleIterator(files, inFlight);
        return quantifier.run(samples, expected, result -> store(inFlight.remove(), result), progress, cancel);
    }

    private void store(MeasuredSpectrum measured, SpectrumResult result) {
        String measurementId = store.projects().recordMeasurement(actor, projectId, MeasurementKind.SAMPLE,
                measured.time(), measured.cellTemperatureK(), measured.cellPressureKPa() * 10.0);
        store.spectra().store(actor, projectId, new SpectrumInput(measurementId, SpectralContent.ABSORBANCE,
                measured.ratio().spectrum(), SampleEncoding.FLOAT32_LE));
        List<NewResult> rows = new ArrayList<>();
        for (CompoundResult c : result.compounds()) {
            rows.add(new NewResult(measurementId, c.compound(), c.concentration(), c.standardUncertainty(),
                    c.detectionLimit(), "ppm", FlagMapping.toStored(c.flags()), versions.methodVersionId(),
                    versions.libraryVersionId(), result.record().softwareVersion(), result.record().inputHash()));
        }
        store.results().recordAll(actor, projectId, rows);
    }

    /** Reads the files lazily, one record at a time, and turns each record into a sample to fit. */
    private final class SampleIterator implements Iterator<Sample> {

        private final Iterator<Path> files;
        private final Queue<MeasuredSpectrum> inFlight;
        private ContainerReader reader;

        SampleIterator(List<Path> files, Queue<MeasuredSpectrum> inFlight) {
            this.files = files.iterator();
            this.inFlight = inFlight;
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
        public Sample next() {
            if (!hasNext()) {
                throw new NoSuchElementException();
            }
            ContainerRecord record = reader.next();
            MeasuredSpectrum measured = chain.process(record);
            inFlight.add(measured);
            return new Sample(measured.ratio().spectrum(),
                    new BackgroundAge(measured.ratio().backgroundAge(), chain.backgroundAgeLimit()));
        }
    }
}
