package org.tracegas.store;

import org.tracegas.audit.VerificationReport;

/**
 * An open workspace store: the services through which all stored data is read and changed. Each
 * service call is one transaction; every change writes its audit record in that same transaction.
 * Obtain one from {@link Workspaces} or as an OSGi service.
 */
public interface WorkspaceStore extends AutoCloseable {

    UserService users();

    ProjectService projects();

    /** A client's sites and their emission sources, and the source a project measures. */
    SiteService sites();

    /** The lab's instruments and which of them made a measurement. */
    InstrumentService instruments();

    SpectrumService spectra();

    VersionService versions();

    ResultService results();

    QaService qa();

    /** Review and approval signatures of reports, by content hash, and of stored results. */
    ReviewService reviews();

    /** Blocks of processed spectra, each block in one transaction. */
    BlockService blocks();

    /** Batches shared by several runner processes, unit by unit. */
    WorkUnitService workUnits();

    /** The lab's own files, kept whole by content hash, and the measurements imported from them. */
    ImportService imports();

    /** Analyses of measurements already in a project, each result naming the recipe that ran. */
    AnalysisService analyses();

    /** The reports issued from a project, each with its content hash, issuer and versions. */
    ReportService reports();

    /** Releases the database (an embedded H2 database is shut down and its files unlocked). */
    @Override
    void close();

    /** Reading the audit trail for review and copying, and verifying its chain. */
    AuditService audit();

    /**
     * Walks the whole audit chain and reports every record that was altered, removed, inserted or reordered;
     * the same as {@code audit().verify()}.
     */
    VerificationReport verifyAuditTrail();
}
