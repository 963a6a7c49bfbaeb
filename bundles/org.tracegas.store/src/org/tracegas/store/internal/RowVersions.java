package org.tracegas.store.internal;

import java.sql.SQLException;
import java.util.Arrays;

import org.tracegas.store.ConcurrentChangeException;
import org.tracegas.store.NoSuchObjectException;

/**
 * Optimistic locking: an update applies only when the row still has the version the writer read, and
 * then increments it. A concurrent writer's row lock makes the second update wait and then find the new
 * version, so it never overwrites.
 */
final class RowVersions {

    private RowVersions() {
    }

    /**
     * Runs {@code UPDATE table SET <assignments>, row_version = row_version + 1 WHERE id = ? AND
     * row_version = ?}.
     *
     * @return the new row version
     * @throws ConcurrentChangeException naming the object and both versions if the row has another version
     * @throws NoSuchObjectException     if there is no such row
     */
    static long update(Tx tx, String table, String objectType, String id, long expectedVersion,
            String assignments, Object... values) throws SQLException {
        Object[] params = Arrays.copyOf(values, values.length + 2);
        params[values.length] = id;
        params[values.length + 1] = expectedVersion;
        int updated = tx.update("UPDATE " + table + " SET " + assignments + ", row_version = row_version + 1"
                + " WHERE id = ? AND row_version = ?", params);
        if (updated == 1) {
            return expectedVersion + 1;
        }
        long current = tx.queryOne("SELECT row_version FROM " + table + " WHERE id = ?", rs -> rs.getLong(1), id)
                .orElseThrow(() -> new NoSuchObjectException(objectType, id));
        throw new ConcurrentChangeException(objectType, id, expectedVersion, current);
    }
}
