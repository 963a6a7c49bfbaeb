package org.tracegas.report.campaign;

/**
 * A report id that is issued or signed already on another project of the workspace: a report id names one
 * report, and the signatures given on it would otherwise cover two.
 */
public final class ReportIdTakenException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String reportId;
    private final String otherProject;

    /**
     * @param reportId     the report id of the report being made
     * @param otherProject the code of the project whose report was issued or signed under that id
     */
    public ReportIdTakenException(String reportId, String otherProject) {
        super("report id " + reportId + " is issued or signed already on project " + otherProject + " of this workspace");
        this.reportId = reportId;
        this.otherProject = otherProject;
    }

    public String reportId() {
        return reportId;
    }

    public String otherProject() {
        return otherProject;
    }
}
