package org.tracegas.ui.flows;

import java.nio.file.Path;

import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.tracegas.model.Project;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The desk on {@link LimeKilnLab}'s real H2 workspace, signed in as its analyst (no demo model: the views read
 * the store), with a window to show the views in.
 */
final class LabDesk implements AutoCloseable {

    final Display display = Display.getDefault();
    final Shell shell = new Shell(display);
    final WorkspaceAccess access;
    final LimeKilnLab lab;

    LabDesk(Path folder, int width, int height) throws Exception {
        access = WorkspaceAccess.openH2(folder.resolve("ws"));
        lab = new LimeKilnLab(access.store(), folder);
        Desk.get().start(access, lab.analyst, null);
        shell.setText("Tracegas Workbench — " + LimeKilnLab.ANALYST);
        shell.setLayout(new FillLayout());
        shell.setSize(width, height);
    }

    /** The lab's project as the tree shows it, or null while the tree is being read. */
    static Project project(WorkspaceNavigator nav) {
        if (nav.workspace() == null) {
            return null;
        }
        return nav.workspace().getClients().stream().flatMap(c -> c.getProjects().stream())
                .filter(p -> p.getCode().equals(LimeKilnLab.CODE)).findFirst().orElse(null);
    }

    @Override
    public void close() {
        shell.dispose();
        access.close();
    }
}
