package org.tracegas.ui.internal;

import org.eclipse.swt.graphics.Point;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;
import org.tracegas.ui.AnalysisDeskLayout;

/** Opens the analysis desk first; the window carries the product's name. */
final class DeskWorkbenchAdvisor extends WorkbenchAdvisor {

    @Override
    public String getInitialWindowPerspectiveId() {
        return AnalysisDeskLayout.ID;
    }

    @Override
    public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        return new WorkbenchWindowAdvisor(configurer) {
            @Override
            public void preWindowOpen() {
                IWorkbenchWindowConfigurer c = getWindowConfigurer();
                c.setInitialSize(new Point(1280, 860));
                c.setShowCoolBar(false);
                c.setShowStatusLine(true);
                c.setShowPerspectiveBar(true);
                c.setTitle("Tracegas Workbench");
            }
        };
    }
}
