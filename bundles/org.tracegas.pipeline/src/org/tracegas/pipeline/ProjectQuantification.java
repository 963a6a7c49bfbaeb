package org.tracegas.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.preprocess.Background;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Processes a project's stack files with a stored method version on all cores into the workspace: each sample
 * is transformed as the version says, ratioed against the last background before it and fitted, and stored with
 * its results pointing at the method and library versions.
 */
public final class ProjectQuantification {

    private final WorkspaceStore store;
    private final Session actor;
    private final String projectId;
    private final String software;
    private final String instrumentId;

    /**
     * @param instrumentId the stored instrument that recorded the files ({@link ContainerInstrument}), stored with
     *                     each measurement in its block's write; null when not known
     */
    public ProjectQuantification(WorkspaceStore store, Session actor, String projectId, String software,
            String instrumentId) {
        this.store = store;
        this.actor = actor;
        this.projectId = projectId;
        this.software = software;
        this.instrumentId = instrumentId;
    }

    /** Whether the project holds results of a method version already (processing again would repeat them). */
    public boolean hasResults(String methodVersionId) {
        return store.results().results(actor, projectId).stream()
                .anyMatch(r -> r.getProvenance().methodVersionId().equals(methodVersionId));
    }

    /**
     * Reads every file once before anything is stored, so that a damaged file or a background among the samples
     * stops the run before it starts.
     *
     * @throws ImportException naming the file, the record and the field at fault
     */
    public static long countSamples(List<Path> files) throws ImportException, IOException {
        long count = 0;
        for (Path file : files) {
            try (ContainerReader reader = ContainerReader.open(file)) {
                for (ContainerRecord r = reader.readNext(); r != null; r = reader.readNext()) {
                    if (r.header().kind() == SampleKind.BACKGROUND) {
                        throw new ImportException(file.toString(), r.number(), "kind",
                                "a background among the samples; give backgrounds in their own file");
                    }
                    count++;
                }
            }
        }
        return count;
    }

    /**
     * @param backgrounds at least one, taken before the first sample
     * @param samples     number of samples in the files (from {@link #countSamples})
     */
    public BatchOutcome run(ContentVersion methodVersion, StoredMethod method, List<Path> files, long samples,
            List<Background> backgrounds, ProgressListener progress, CancellationFlag cancel) {
        return run(methodVersion, method, files, samples, backgrounds, OptionalDouble.empty(), progress, cancel);
    }

    /**
     * @param ctsPathM the effective path of the campaign's CTS readings ({@code CtsPath}), for a method whose path
     *                 source is CTS-derived; empty for one of nominal path
     * @see QuantificationSetup
     */
    public BatchOutcome run(ContentVersion methodVersion, StoredMethod method, List<Path> files, long samples,
            List<Background> backgrounds, OptionalDouble ctsPathM, ProgressListener progress,
            CancellationFlag cancel) {
        return new QuantificationSetup(methodVersion, method, backgrounds, software, ctsPathM)
                .processor(store, actor, projectId, instrumentId).run(files, samples, progress, cancel);
    }
}
