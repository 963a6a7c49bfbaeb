package org.tracegas.ui.jobs;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.store.ImportedFile;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Imports the lab's files into a project in the background, as the runner's {@code import} command does: every
 * file is read by the reader that recognises it ({@link FileMeasurements#read}) before anything is stored, then
 * each is stored whole with its measurements in one audited transaction of the store's import service; a file
 * whose bytes the project holds already adds nothing and is counted as such. Cancelling while reading stores
 * nothing; cancelling while storing stops after the file in hand, and what was stored stays.
 */
public final class FileImportJob extends Job {

    /** What the import did; {@code files} in the order given, as the store keeps each. */
    public record Outcome(int added, int known, List<ImportedFile> files) {

        public Outcome {
            files = List.copyOf(files);
        }

        /** Measurements the import added. */
        public int measurementsAdded() {
            return files.stream().filter(ImportedFile::added).mapToInt(f -> f.measurementIds().size()).sum();
        }

        /** The sentence the desk shows, in the runner's words. */
        public String summary(String projectCode) {
            return "Imported " + added + " file(s) (" + measurementsAdded() + " measurement(s)) into project "
                    + projectCode + "; " + known + " already imported";
        }
    }

    private final WorkspaceStore store;
    private final Session actor;
    private final ProjectInfo project;
    private final ReaderRegistry readers;
    private final List<Path> files;
    private final FileMeasurements.Defaults defaults;
    private final Consumer<Outcome> whenDone;

    /**
     * @param defaults what the lab states for records whose files carry no kind, time or cell conditions
     * @param whenDone receives what was stored (also after cancelling, not after a file that cannot be read) in
     *                 the job's thread; UI code must pass it on with {@code Display.asyncExec}
     */
    public FileImportJob(WorkspaceStore store, Session actor, ProjectInfo project, ReaderRegistry readers,
            List<Path> files, FileMeasurements.Defaults defaults, Consumer<Outcome> whenDone) {
        super("Importing " + files.size() + " file(s) into " + project.code());
        if (files.isEmpty()) {
            throw new IllegalArgumentException("files must name at least one file to import");
        }
        this.store = store;
        this.actor = actor;
        this.project = project;
        this.readers = readers;
        this.files = List.copyOf(files);
        this.defaults = defaults;
        this.whenDone = whenDone;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, getName(), 2 * files.size());
        List<FileMeasurements.Read> read = new ArrayList<>(files.size());
        for (Path f : files) {
            if (progress.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            progress.subTask("Reading " + f.getFileName());
            try {
                read.add(FileMeasurements.read(readers, f, defaults));
            } catch (ImportException e) {
                return Status.error(e.getMessage() + "; nothing imported", e);
            }
            progress.worked(1);
        }
        int added = 0;
        int known = 0;
        List<ImportedFile> stored = new ArrayList<>(read.size());
        try {
            for (FileMeasurements.Read r : read) {
                if (progress.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                progress.subTask("Storing " + r.file().fileName());
                ImportedFile f = store.imports().importFile(actor, project.id(), r.file(), r.measurements());
                stored.add(f);
                if (f.added()) {
                    added++;
                } else {
                    known++;
                }
                progress.worked(1);
            }
            return Status.info(new Outcome(added, known, stored).summary(project.code()));
        } catch (RuntimeException e) {
            return Status.error("importing into " + project.code() + " failed after " + stored.size() + " of "
                    + read.size() + " file(s) (those stay stored): " + e.getMessage(), e);
        } finally {
            whenDone.accept(new Outcome(added, known, stored));
        }
    }
}
