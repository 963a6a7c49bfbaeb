package org.tracegas.ui.internal;

import org.eclipse.swt.graphics.Point;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;
import org.tracegas.ui.AnalysisDeskLayout;

/** Opens the analysis desk first; the window carries the product's name and the signed-in user. */
public final class DeskWorkbenchAdvisor extends WorkbenchAdvisor {

    private final String user;

    public DeskWorkbenchAdvisor(String user) {
        this.user = user;
    }

    @Override
    public String getInitialWindowPerspectiveId() {
        return AnalysisDeskLayout.ID;
    }

    @Override
    public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        return new WorkbenchWindowAdvisor(configurer) {
            @Override
            public ActionBarAdvisor createActionBarAdvisor(IActionBarConfigurer bars) {
                return new DeskMenus(bars);
            }

            @Override
            public void preWindowOpen() {
                IWorkbenchWindowConfigurer c = getWindowConfigurer();
                c.setInitialSize(new Point(1280, 800)); // fits the smallest screen the desk is made for
                c.setShowCoolBar(true); // the Analysis toolbar
                c.setShowStatusLine(true);
                c.setShowPerspectiveBar(true);
                c.setShowProgressIndicator(true);
                c.setTitle("Tracegas Workbench — " + user);
            }
        };
    }
}
