package org.tracegas.store.internal;

import java.nio.file.Path;
import java.util.Map;

import org.tracegas.audit.VerificationReport;
import org.tracegas.store.BlockService;
import org.tracegas.store.ProjectService;
import org.tracegas.store.QaService;
import org.tracegas.store.ResultService;
import org.tracegas.store.SpectrumService;
import org.tracegas.store.UserService;
import org.tracegas.store.VersionService;
import org.tracegas.store.WorkUnitService;
import org.tracegas.store.WorkspaceStore;

/**
 * Declarative Services component (OSGI-INF/org.tracegas.store.workspace.xml) that provides the
 * {@link WorkspaceStore}. Configuration (PID org.tracegas.store.workspace): {@code url}, {@code user},
 * {@code password} for a PostgreSQL server; otherwise {@code folder} for the embedded H2 database
 * (default: {@code tracegas-workspace} in the user's home); {@code maxFailedLogins} (default 5).
 */
public final class WorkspaceStoreComponent implements WorkspaceStore {

    private JdbcWorkspaceStore store;

    void activate(Map<String, ?> properties) {
        int maxFailed = properties.get("maxFailedLogins") == null ? JdbcWorkspaceStore.DEFAULT_MAX_FAILED_LOGINS
                : Integer.parseInt(String.valueOf(properties.get("maxFailedLogins")));
        Object url = properties.get("url");
        if (url != null) {
            store = JdbcWorkspaceStore.openPostgres(url.toString(), text(properties, "user"),
                    text(properties, "password"), maxFailed);
        } else {
            Object folder = properties.get("folder");
            store = JdbcWorkspaceStore.openH2(folder != null ? Path.of(folder.toString())
                    : Path.of(System.getProperty("user.home"), "tracegas-workspace"), maxFailed);
        }
    }

    void deactivate() {
        if (store != null) {
            store.close();
            store = null;
        }
    }

    private static String text(Map<String, ?> properties, String key) {
        Object value = properties.get(key);
        return value == null ? null : value.toString();
    }

    @Override
    public UserService users() {
        return store.users();
    }

    @Override
    public ProjectService projects() {
        return store.projects();
    }

    @Override
    public SpectrumService spectra() {
        return store.spectra();
    }

    @Override
    public VersionService versions() {
        return store.versions();
    }

    @Override
    public QaService qa() {
        return store.qa();
    }

    @Override
    public org.tracegas.store.ReviewService reviews() { return store.reviews(); }

    @Override
    public org.tracegas.store.ImportService imports() {
        return store.imports();
    }

    @Override
    public org.tracegas.store.AnalysisService analyses() {
        return store.analyses();
    }

    @Override
    public ResultService results() {
        return store.results();
    }

    @Override
    public BlockService blocks() {
        return store.blocks();
    }

    @Override
    public WorkUnitService workUnits() {
        return store.workUnits();
    }

    @Override
    public org.tracegas.store.AuditService audit() {
        return store.audit();
    }

    @Override
    public VerificationReport verifyAuditTrail() {
        return store.verifyAuditTrail();
    }

    /** The framework closes the store through {@link #deactivate()}; clients must not. */
    @Override
    public void close() {
        throw new UnsupportedOperationException("the workspace store service is closed by the framework");
    }
}
