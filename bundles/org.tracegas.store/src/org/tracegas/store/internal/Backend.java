package org.tracegas.store.internal;

/** The database products the store runs on, and the little SQL that differs between them. */
enum Backend {
    /**
     * Embedded H2. Its planner prefers the single-column index of the project foreign key and would then
     * sort, which gathers the whole result before the first row; the hint keeps the read a streamed
     * walk along (project_id, seq).
     */
    H2("FROM spectral_data USE INDEX (spectral_data_project)"),
    /** PostgreSQL; with a fetch size inside a transaction the driver reads through a cursor. */
    POSTGRESQL("FROM spectral_data");

    private final String spectraSource;

    Backend(String spectraSource) {
        this.spectraSource = spectraSource;
    }

    /** Query of all spectra of one project (parameter 1) in storage order. */
    String spectraOfProject() {
        return "SELECT " + SpectrumRows.COLUMNS + " " + spectraSource
                + " WHERE project_id = ? ORDER BY project_id, seq";
    }
}
