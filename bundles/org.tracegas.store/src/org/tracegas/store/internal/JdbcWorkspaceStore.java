package org.tracegas.store.internal;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import javax.sql.DataSource;

import org.h2.jdbcx.JdbcDataSource;
import org.postgresql.ds.PGSimpleDataSource;
import org.tracegas.audit.AuditSchema;
import org.tracegas.audit.VerificationReport;
import org.tracegas.store.AnalysisService;
import org.tracegas.store.AuditService;
import org.tracegas.store.BlockService;
import org.tracegas.store.ImportService;
import org.tracegas.store.InstrumentService;
import org.tracegas.store.ProjectService;
import org.tracegas.store.QaService;
import org.tracegas.store.ReportService;
import org.tracegas.store.ResultService;
import org.tracegas.store.SiteService;
import org.tracegas.store.SpectrumService;
import org.tracegas.store.StoreException;
import org.tracegas.store.UserService;
import org.tracegas.store.VersionService;
import org.tracegas.store.WorkUnitService;
import org.tracegas.store.WorkspaceStore;

/**
 * The workspace store on one database. Opening migrates the schema and installs the audit tables.
 * Data sources are created directly: inside OSGi, DriverManager does not see the drivers' bundles.
 */
public final class JdbcWorkspaceStore implements WorkspaceStore {

    /** Consecutive failed log-ins that lock an account. */
    public static final int DEFAULT_MAX_FAILED_LOGINS = 5;

    private final DataSource dataSource;
    private final Backend backend;
    private final UserService users;
    private final ProjectService projects;
    private final SiteService sites;
    private final InstrumentService instruments;
    private final SpectrumService spectra;
    private final VersionService versions;
    private final ResultService results;
    private final QaService qa;
    private final BlockService blocks;
    private final WorkUnitService workUnits;
    private final AuditService audit;
    private final ImportService imports;
    private final AnalysisService analyses;
    private final ReportService reports;

    private JdbcWorkspaceStore(DataSource dataSource, Backend backend, int maxFailedLogins) {
        this.dataSource = dataSource;
        this.backend = backend;
        Transactions transactions = new Transactions(dataSource);
        users = new JdbcUserService(transactions, maxFailedLogins);
        projects = new JdbcProjectService(transactions);
        sites = new JdbcSiteService(transactions);
        instruments = new JdbcInstrumentService(transactions);
        spectra = new JdbcSpectrumService(transactions, backend);
        JdbcVersionService versionService = new JdbcVersionService(transactions);
        versions = versionService;
        results = new JdbcResultService(transactions, versionService);
        qa = new JdbcQaService(transactions);
        blocks = new JdbcBlockService(transactions, versionService);
        workUnits = new JdbcWorkUnitService(transactions, backend, versionService);
        audit = new JdbcAuditService(transactions);
        imports = new JdbcImportService(transactions);
        analyses = new JdbcAnalysisService(transactions, versionService);
        reports = new JdbcReportService(transactions);
    }

    /** An embedded H2 database in {@code folder} (created when missing), file {@code workspace.mv.db}. */
    public static JdbcWorkspaceStore openH2(Path folder, int maxFailedLogins) {
        if (folder == null) {
            throw new IllegalArgumentException("folder must not be null");
        }
        JdbcDataSource ds = new JdbcDataSource();
        // DB_CLOSE_DELAY=-1 keeps the database open between the per-operation connections until close();
        // LAZY_QUERY_EXECUTION lets a streamed query read rows on demand instead of building the result first;
        // LOCK_TIMEOUT covers the longest audited transaction waiting for the audit chain head;
        // WRITE_DELAY=0 writes each commit at once, so a killed process loses no commit it reported;
        // CACHE_SIZE=16384 (16 MiB, H2's own default for this heap): 64 MiB stored the batch no faster.
        ds.setURL("jdbc:h2:file:" + folder.toAbsolutePath().resolve("workspace")
                + ";DB_CLOSE_DELAY=-1;LAZY_QUERY_EXECUTION=TRUE;LOCK_TIMEOUT=30000;CACHE_SIZE=16384;WRITE_DELAY=0");
        return open(ds, Backend.H2, maxFailedLogins);
    }

    /** A PostgreSQL database; the URL may name the schema with {@code currentSchema=}. */
    public static JdbcWorkspaceStore openPostgres(String url, String user, String password, int maxFailedLogins) {
        if (url == null || !url.startsWith("jdbc:postgresql:")) {
            throw new IllegalArgumentException("url must be a jdbc:postgresql: URL, was " + url);
        }
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(url);
        ds.setUser(user);
        ds.setPassword(password);
        return open(ds, Backend.POSTGRESQL, maxFailedLogins);
    }

    private static JdbcWorkspaceStore open(DataSource ds, Backend backend, int maxFailedLogins) {
        JdbcWorkspaceStore store = new JdbcWorkspaceStore(ds, backend, maxFailedLogins);
        try {
            Migrations.migrate(ds);
            try (Connection c = ds.getConnection()) {
                installAuditSchema(c);
            }
            DataBaseline.bindExistingData(new Transactions(ds));
        } catch (SQLException | RuntimeException e) {
            StoreException failure = new StoreException("opening the workspace failed: " + openingFailure(e), e);
            try {
                store.close();
            } catch (RuntimeException closing) {
                // the opening failure is what the user must see; closing a database that never opened fails too
                failure.addSuppressed(closing);
            }
            throw failure;
        }
        return store;
    }

    /**
     * Why a workspace did not open, as a sentence. H2 reports a database file locked by another process with
     * error code 90020 (DATABASE_ALREADY_OPEN_1 in H2's ErrorCode); the usual holder is the workbench.
     */
    private static String openingFailure(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLException sql && sql.getErrorCode() == 90020) {
                return "the database is in use by another program, for example the workbench with this "
                        + "workspace open; close it there and try again";
            }
            if (t.getCause() == t) {
                break;
            }
        }
        return e.getMessage();
    }

    /**
     * Installs or confirms the audit tables; on a lab server an everyday role that may not change the schema
     * (see {@link org.tracegas.store.LabServerRoles}) finds them installed by the owner and goes on.
     */
    private static void installAuditSchema(Connection c) throws SQLException {
        try {
            AuditSchema.install(c);
        } catch (SQLException e) {
            if (!"42501".equals(e.getSQLState())) {
                throw e;
            }
            try (Statement s = c.createStatement()) {
                s.executeQuery("SELECT last_seq FROM audit_chain_head").close();
            } catch (SQLException missing) {
                e.addSuppressed(missing);
                throw e; // not installed, and this role may not install it
            }
        }
    }

    @Override
    public UserService users() {
        return users;
    }

    @Override
    public ProjectService projects() {
        return projects;
    }

    @Override
    public SiteService sites() {
        return sites;
    }

    @Override
    public InstrumentService instruments() {
        return instruments;
    }

    @Override
    public SpectrumService spectra() {
        return spectra;
    }

    @Override
    public VersionService versions() {
        return versions;
    }

    @Override
    public QaService qa() {
        return qa;
    }

    @Override
    public BlockService blocks() {
        return blocks;
    }

    @Override
    public WorkUnitService workUnits() {
        return workUnits;
    }

    @Override
    public org.tracegas.store.ReviewService reviews() { return new JdbcReviewService(new Transactions(dataSource), users); }

    @Override
    public ImportService imports() {
        return imports;
    }

    @Override
    public AnalysisService analyses() {
        return analyses;
    }

    @Override
    public ReportService reports() {
        return reports;
    }

    @Override
    public ResultService results() {
        return results;
    }

    @Override
    public void close() {
        if (backend != Backend.H2) {
            return; // connections are per operation; nothing stays open
        }
        try (Connection c = dataSource.getConnection(); Statement s = c.createStatement()) {
            s.execute("SHUTDOWN");
        } catch (SQLException e) {
            throw new StoreException("closing the workspace database failed: " + e.getMessage(), e);
        }
    }

    @Override
    public AuditService audit() {
        return audit;
    }

    @Override
    public VerificationReport verifyAuditTrail() {
        return audit.verify();
    }
}
