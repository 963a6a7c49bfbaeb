package org.tracegas.ui.internal;

import java.io.IOException;

import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.tracegas.installation.InstalledSoftware;
import org.tracegas.store.StoreException;
import org.tracegas.ui.dialogs.LoginDialog;
import org.tracegas.ui.prefs.DeskPreferences;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;
import org.tracegas.ui.session.WorkspaceLocation;

/**
 * Opens the workspace named in the preferences, on the lab server or in the local folder, asks for the log-in
 * and starts the workbench window. A folder without a workspace is refused with what to run: the workbench
 * creates no workspace and no users (the runner's workspace-init and demo commands do).
 */
public final class WorkbenchApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        Display display = PlatformUI.createDisplay();
        IPreferenceStore prefs = new ScopedPreferenceStore(InstanceScope.INSTANCE, "org.tracegas.ui");
        DeskPreferences.setDefaults(prefs);
        WorkspaceLocation location = DeskPreferences.location(prefs, System.getenv());
        WorkspaceAccess opened;
        try {
            opened = WorkspaceAccess.openExisting(location);
        } catch (StoreException e) {
            MessageDialog.openError(null, "Tracegas Workbench", "The " + location.description()
                    + " could not be opened: " + e.getMessage());
            display.dispose();
            return IApplication.EXIT_OK;
        }
        try (WorkspaceAccess access = opened) {
            LoginDialog login = new LoginDialog(new Shell(display), access.store().users(), location.description());
            if (login.open() != Window.OK) {
                return IApplication.EXIT_OK;
            }
            try {
                // a changed release or add-on set of this installation goes to the audit trail first
                InstalledSoftware.running().ifPresent(software -> software.recordIn(access.store(), login.session()));
            } catch (IOException e) {
                MessageDialog.openError(null, "Tracegas Workbench", "The installation's software could not be"
                        + " recorded in the audit trail: " + e.getMessage());
                return IApplication.EXIT_OK;
            }
            Desk.get().start(access, login.session());
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
