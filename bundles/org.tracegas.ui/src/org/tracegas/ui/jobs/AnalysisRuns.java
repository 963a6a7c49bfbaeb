package org.tracegas.ui.jobs;

import org.tracegas.installation.InstalledSoftware;

/** The software version that results and reports made at the desk record. */
public final class AnalysisRuns {

    /** Software version recorded with results made at the desk outside an installed product. */
    public static final String SOFTWARE = "Tracegas Workbench 0.1.0";

    private AnalysisRuns() {
    }

    /**
     * Software version recorded with results made at the desk: the installation's release and its add-ons with
     * versions (see InstalledSoftware), or {@link #SOFTWARE} outside an installed product.
     */
    public static String software() {
        return InstalledSoftware.describeRunning(SOFTWARE);
    }
}
