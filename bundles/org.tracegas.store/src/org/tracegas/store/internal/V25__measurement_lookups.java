package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

import org.flywaydb.core.api.migration.BaseJavaMigration;
import org.flywaydb.core.api.migration.Context;

/**
 * Lets a measurement's spectra and results be found without reading its whole project: an index on the
 * measurement of each on PostgreSQL. H2 has them already, as the indexes it makes for the foreign keys to
 * {@code measurement}; a second one there would only slow every insert.
 */
public final class V25__measurement_lookups extends BaseJavaMigration {

    @Override
    public void migrate(Context context) throws SQLException {
        Connection c = context.getConnection();
        if ("H2".equals(c.getMetaData().getDatabaseProductName())) {
            return;
        }
        try (Statement st = c.createStatement()) {
            st.execute("CREATE INDEX spectral_data_measurement ON spectral_data (measurement_id)");
            st.execute("CREATE INDEX analysis_result_measurement ON analysis_result (measurement_id)");
        }
    }
}
