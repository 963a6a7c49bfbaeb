package org.tracegas.ui.internal;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.GroupMarker;
import org.eclipse.jface.action.IContributionItem;
import org.eclipse.jface.action.IMenuManager;
import org.eclipse.jface.action.IStatusLineManager;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.ui.IWorkbenchActionConstants;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.actions.ActionFactory.IWorkbenchAction;
import org.eclipse.ui.actions.ContributionItemFactory;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;
import org.tracegas.ui.dialogs.AboutDialog;
import org.tracegas.ui.parts.Caution;

/**
 * File, Window and Help menus of the desk window, and its status line with the caution (once per window). The desk's own commands (File → Import…, Export results…, the
 * Analysis menu and the toolbar) come from plugin.xml into the "additions" groups left here for them.
 */
final class DeskMenus extends ActionBarAdvisor {

    private IWorkbenchAction quit;
    private IWorkbenchAction preferences;
    private IWorkbenchAction resetPerspective;
    private IContributionItem views;
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
        resetPerspective = ActionFactory.RESET_PERSPECTIVE.create(window);
        register(resetPerspective);
        views = ContributionItemFactory.VIEWS_SHORTLIST.create(window);
        about = new Action("About Tracegas Workbench") {
            @Override
            public void run() {
                new AboutDialog(window.getShell()).open();
            }
        };
    }

    @Override
    protected void fillStatusLine(IStatusLineManager line) {
        line.add(Caution.statusItem());
    }

    @Override
    protected void fillMenuBar(IMenuManager bar) {
        MenuManager file = new MenuManager("&File", IWorkbenchActionConstants.M_FILE);
        file.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));
        file.add(new Separator());
        file.add(quit);
        MenuManager windowMenu = new MenuManager("&Window", IWorkbenchActionConstants.M_WINDOW);
        MenuManager showView = new MenuManager("Show &View", "showView");
        showView.add(views);
        windowMenu.add(showView);
        windowMenu.add(resetPerspective);
        windowMenu.add(new Separator());
        windowMenu.add(preferences);
        MenuManager help = new MenuManager("&Help", IWorkbenchActionConstants.M_HELP);
        help.add(about);
        bar.add(file);
        bar.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));
        bar.add(windowMenu);
        bar.add(help);
    }
}
