package org.tracegas.ui.internal;

import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.tracegas.store.AccessDeniedException;
import org.tracegas.ui.dialogs.LoginDialog;
import org.tracegas.ui.prefs.DeskPreferences;
import org.tracegas.ui.session.DemoProject;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * Opens the workspace named in the preferences (a fresh one gets the demo project), asks for the log-in and
 * starts the workbench window.
 */
public final class WorkbenchApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        Display display = PlatformUI.createDisplay();
        IPreferenceStore prefs = new ScopedPreferenceStore(InstanceScope.INSTANCE, "org.tracegas.ui");
        DeskPreferences.setDefaults(prefs);
        try (WorkspaceAccess access = WorkspaceAccess.openH2(DeskPreferences.workspaceFolder(prefs))) {
            DemoProject.Seeded demo = null;
            try {
                demo = DemoProject.seed(access.store());
            } catch (AccessDeniedException alreadyInUse) {
                // users exist: the workspace is not fresh, nothing to seed
            }
            LoginDialog login = new LoginDialog(new Shell(display), access.store().users(),
                    access.folder().toString());
            if (login.open() != Window.OK) {
                return IApplication.EXIT_OK;
            }
            Desk.get().start(access, login.session(), demo);
            int code = PlatformUI.createAndRunWorkbench(display, new DeskWorkbenchAdvisor(login.session().login()));
            return code == PlatformUI.RETURN_RESTART ? IApplication.EXIT_RESTART : IApplication.EXIT_OK;
        } finally {
            display.dispose();
        }
    }

    @Override
    public void stop() {
        if (!PlatformUI.isWorkbenchRunning()) {
            return;
        }
        IWorkbench workbench = PlatformUI.getWorkbench();
        Display display = workbench.getDisplay();
        display.syncExec(() -> {
            if (!display.isDisposed()) {
                workbench.close();
            }
        });
    }
}
