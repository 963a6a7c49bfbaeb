package org.tracegas.store.internal;

/** The database products the store runs on, and the little SQL that differs between them. */
enum Backend {
    /**
     * Embedded H2. Its planner prefers the single-column index of the project foreign key and would then
     * sort, which gathers the whole result before the first row; the hint keeps the read a streamed
     * walk along (project_id, seq).
     */
    H2("FROM spectral_data USE INDEX (spectral_data_project)", false),
    /** PostgreSQL; with a fetch size inside a transaction the driver reads through a cursor. */
    POSTGRESQL("FROM spectral_data", true);

    private final String spectraSource;
    private final boolean skipLockedWithLimit;

    Backend(String spectraSource, boolean skipLockedWithLimit) {
        this.spectraSource = spectraSource;
        this.skipLockedWithLimit = skipLockedWithLimit;
    }

    /**
     * Whether {@code ... ORDER BY ... LIMIT 1 FOR UPDATE SKIP LOCKED} returns the first row not locked by
     * another transaction. PostgreSQL skips locked rows before applying the limit; H2 2.3 applies the limit
     * first and then skips, so it returns nothing when the first candidate is locked: there the clause is
     * applied to one candidate row at a time.
     */
    boolean skipLockedWithLimit() {
        return skipLockedWithLimit;
    }

    /** Query of all spectra of one project (parameter 1) in storage order. */
    String spectraOfProject() {
        return "SELECT " + SpectrumRows.COLUMNS + " " + spectraSource
                + " WHERE project_id = ? ORDER BY project_id, seq";
    }
}
