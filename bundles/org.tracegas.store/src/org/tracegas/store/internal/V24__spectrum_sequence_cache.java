package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

import org.flywaydb.core.api.migration.BaseJavaMigration;
import org.flywaydb.core.api.migration.Context;

/**
 * Lets an H2 workspace hand out spectrum sequence numbers ({@code spectral_data.seq}) from a reserve of 1,024
 * instead of H2's 32. Each time H2 runs out of its reserve it writes the new reserve into the schema and commits
 * that on its own system session, which writes a chunk of the store file in the middle of the inserting
 * transaction: with 32, twice per block of 64 spectra, about a tenth of the storage thread's time. The
 * numbers stay increasing; after a crash, H2 goes on after the last reserve, so at most 1,024 numbers are
 * skipped, which nothing relies on (the column orders spectra, it does not count them). PostgreSQL is left as
 * it is: there a sequence number costs no write, and its reserve would be per connection, which the store
 * opens per operation.
 */
public final class V24__spectrum_sequence_cache extends BaseJavaMigration {

    /** Sequence numbers H2 reserves at once. */
    static final int RESERVE = 1024;

    @Override
    public void migrate(Context context) throws SQLException {
        Connection c = context.getConnection();
        if (!"H2".equals(c.getMetaData().getDatabaseProductName())) {
            return;
        }
        try (Statement st = c.createStatement()) {
            st.execute("ALTER TABLE spectral_data ALTER COLUMN seq SET CACHE " + RESERVE);
        }
    }
}
