package org.tracegas.ui.views;

import org.eclipse.swt.widgets.Composite;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;

/** The views' contents without a workbench site, for tests of other packages that show them in a shell. */
public final class ViewContents {

    private ViewContents() {
    }

    /** The workspace tree as the navigator view fills it, reading the desk's workspace again when it changes. */
    public static WorkspaceNavigator navigator(Composite parent) {
        return new NavigatorView().createContent(parent);
    }

    /** The time-series view; {@link TimeSeriesView#selected} shows a project's stored results. */
    public static TimeSeriesView timeSeries(Composite parent) {
        TimeSeriesView view = new TimeSeriesView();
        view.createContent(parent);
        return view;
    }

    /** The panel of a time-series view made by {@link #timeSeries}. */
    public static TimeSeriesPanel panel(TimeSeriesView view) {
        return view.panel();
    }
}
