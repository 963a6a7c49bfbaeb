package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

import org.eclipse.core.runtime.Platform;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.tracegas.ui.dialogs.LoginDialog;
import org.tracegas.ui.internal.DeskWorkbenchAdvisor;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;
import org.tracegas.ui.session.WorkspaceLocation;

/**
 * The product's workbench started as the application starts it: the log-in dialog on an existing workspace
 * folder, then {@link PlatformUI#createAndRunWorkbench} with the product's advisor (the analysis desk, its menus
 * and views from plugin.xml). A test drives the open window and the workbench closes after it.
 */
final class StartedWorkbench {

    /** What a test does in the open window, in the UI thread. */
    interface Drive {
        void drive(Display display, IWorkbenchWindow window) throws Exception;
    }

    private StartedWorkbench() {
    }

    /** Logs {@code login} in on the workspace in {@code workspaceFolder}, starts the workbench and drives it. */
    static void run(Path workspaceFolder, String login, String password, Drive drive) throws Exception {
        Display display = Display.getDefault();
        WorkspaceAccess access = WorkspaceAccess.openExisting(new WorkspaceLocation.Folder(workspaceFolder));
        try {
            Shell parent = new Shell(display);
            LoginDialog dialog = new LoginDialog(parent, access.store().users(), access.location().description());
            dialog.setBlockOnOpen(false);
            dialog.open();
            dialog.loginField().setText(login);
            dialog.passwordField().setText(password);
            dialog.okButton().notifyListeners(SWT.Selection, new Event());
            assertNotNull(dialog.session(), login + " is logged in");
            parent.dispose();
            Desk.get().start(access, dialog.session());
            // each start shows the product's first layout, not the one an earlier start left behind
            Files.deleteIfExists(Path.of(Platform.getInstanceLocation().getURL().getFile(), ".metadata", ".plugins",
                    "org.eclipse.e4.workbench", "workbench.xmi"));

            AtomicReference<Throwable> failure = new AtomicReference<>();
            Runnable[] whenOpen = new Runnable[1];
            whenOpen[0] = () -> {
                if (!PlatformUI.isWorkbenchRunning()
                        || PlatformUI.getWorkbench().getActiveWorkbenchWindow() == null) {
                    display.timerExec(200, whenOpen[0]);
                    return;
                }
                try {
                    drive.drive(display, PlatformUI.getWorkbench().getActiveWorkbenchWindow());
                } catch (Throwable t) {
                    failure.set(t);
                } finally {
                    PlatformUI.getWorkbench().close();
                }
            };
            display.timerExec(200, whenOpen[0]);
            int code = PlatformUI.createAndRunWorkbench(display, new DeskWorkbenchAdvisor(login));
            if (failure.get() != null) {
                throw new AssertionError("driving the workbench failed", failure.get());
            }
            assertEquals(PlatformUI.RETURN_OK, code);
        } finally {
            access.close();
        }
    }

    /**
     * Fails when a visible control below {@code parent} reaches past its parent's client area, where the window
     * would cut it off (a pixel of rounding allowed). What a scrolled composite holds may be larger than it: it
     * scrolls.
     */
    static void assertInside(Composite parent) {
        if (parent instanceof ScrolledComposite) {
            return;
        }
        Rectangle area = parent.getClientArea();
        for (Control c : parent.getChildren()) {
            if (!c.isVisible()) {
                continue;
            }
            Rectangle b = c.getBounds();
            assertTrue(b.x + b.width <= area.x + area.width + 1 && b.y + b.height <= area.y + area.height + 1,
                    c + " at " + b + " reaches past " + parent + "'s " + area);
            if (c instanceof Composite k) {
                assertInside(k);
            }
        }
    }

    /** The first control of a type below a composite, depth first. */
    static <T extends Control> T find(Composite parent, Class<T> type) {
        for (Control c : parent.getChildren()) {
            if (type.isInstance(c)) {
                return type.cast(c);
            }
            if (c instanceof Composite k) {
                T found = find(k, type);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
