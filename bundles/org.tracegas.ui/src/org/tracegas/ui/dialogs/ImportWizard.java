package org.tracegas.ui.dialogs;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.jface.wizard.Wizard;
import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.store.ProjectInfo;

/**
 * File → Import…: which files go into which project, which reader reads each, and the cell conditions for
 * records whose files state none. Finishing hands over a {@link Request}; the import itself runs as a job (see
 * {@link org.tracegas.ui.jobs.FileImportJob}), so the window stays usable while large files are stored.
 */
public final class ImportWizard extends Wizard {

    /** What the user chose. */
    public record Request(ProjectInfo project, List<Path> files, FileMeasurements.Defaults defaults) {

        public Request {
            files = List.copyOf(files);
        }
    }

    private final ImportFilesPage page;
    private Request request;

    /**
     * @param projects the projects the user may import into
     * @param selected the project to offer first (e.g. the one selected in the tree), or null
     */
    public ImportWizard(ReaderRegistry readers, List<ProjectInfo> projects, ProjectInfo selected) {
        setWindowTitle("Import measurement files");
        setNeedsProgressMonitor(false);
        page = new ImportFilesPage(readers, projects, selected);
        addPage(page);
    }

    /** The one page: project, files with their readers, and conditions. */
    public ImportFilesPage page() {
        return page;
    }

    @Override
    public boolean performFinish() {
        request = new Request(page.project(), page.files(), page.defaults());
        return true;
    }

    /** What to import, once finished; null before or when cancelled. */
    public Request request() {
        return request;
    }
}
