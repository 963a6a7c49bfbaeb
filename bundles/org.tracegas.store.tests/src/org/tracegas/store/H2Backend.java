package org.tracegas.store;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;

import org.h2.jdbcx.JdbcDataSource;

/** An H2 database file in a test's temporary folder. */
final class H2Backend implements TestBackend {

    private final Path folder;

    H2Backend(Path folder) {
        this.folder = folder;
    }

    @Override
    public WorkspaceStore open() {
        return Workspaces.openH2(folder);
    }

    @Override
    public Connection raw() throws SQLException {
        JdbcDataSource ds = new JdbcDataSource();
        // same file and settings as the store, so the open in-process database is shared
        ds.setURL("jdbc:h2:file:" + folder.toAbsolutePath().resolve("workspace")
                + ";DB_CLOSE_DELAY=-1;LAZY_QUERY_EXECUTION=TRUE;LOCK_TIMEOUT=30000;CACHE_SIZE=16384");
        return ds.getConnection();
    }

    @Override
    public void close() {
        // the temporary folder is removed by JUnit
    }
}
