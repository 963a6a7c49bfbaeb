package org.tracegas.ui.internal;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.IMenuManager;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.actions.ActionFactory.IWorkbenchAction;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;
import org.tracegas.ui.dialogs.AboutDialog;

/** File, Window and Help menus of the desk window. */
final class DeskMenus extends ActionBarAdvisor {

    private IWorkbenchAction quit;
    private IWorkbenchAction preferences;
    private Action about;

    DeskMenus(IActionBarConfigurer configurer) {
        super(configurer);
    }

    @Override
    protected void makeActions(IWorkbenchWindow window) {
        quit = ActionFactory.QUIT.create(window);
        register(quit);
        preferences = ActionFactory.PREFERENCES.create(window);
        register(preferences);
        about = new Action("About Tracegas Workbench") {
            @Override
            public void run() {
                new AboutDialog(window.getShell()).open();
            }
        };
    }

    @Override
    protected void fillMenuBar(IMenuManager bar) {
        MenuManager file = new MenuManager("&File");
        file.add(quit);
        MenuManager windowMenu = new MenuManager("&Window");
        windowMenu.add(preferences);
        MenuManager help = new MenuManager("&Help");
        help.add(about);
        bar.add(file);
        bar.add(windowMenu);
        bar.add(help);
    }
}
