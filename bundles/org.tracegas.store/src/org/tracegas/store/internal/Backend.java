package org.tracegas.store.internal;

/** The database products the store runs on, and the little SQL that differs between them. */
enum Backend {
    /**
     * Embedded H2. Its planner prefers the single-column index of the project foreign key and would then
     * sort, which gathers the whole result before the first row; the hint keeps the read a streamed
     * walk along (project_id, seq).
     */
    H2("FROM spectral_data USE INDEX (spectral_data_project)", false, "FOR UPDATE"),
    /**
     * PostgreSQL; with a fetch size inside a transaction the driver reads through a cursor. FOR NO KEY UPDATE
     * does not conflict with the key-share locks that inserts referencing the project take.
     */
    POSTGRESQL("FROM spectral_data", true, "FOR NO KEY UPDATE");

    private final String spectraSource;
    private final boolean skipLockedWithLimit;
    private final String rowLockClause;

    Backend(String spectraSource, boolean skipLockedWithLimit, String rowLockClause) {
        this.spectraSource = spectraSource;
        this.skipLockedWithLimit = skipLockedWithLimit;
        this.rowLockClause = rowLockClause;
    }

    /**
     * Query that locks the project row (parameter 1) until commit without keeping other transactions from
     * storing rows that reference the project: it serialises checks that span several rows of one project.
     */
    String lockProject() {
        return "SELECT id FROM project WHERE id = ? " + rowLockClause;
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
