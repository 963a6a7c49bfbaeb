package org.tracegas.store.internal;

import java.sql.SQLException;
import java.util.Arrays;
import java.util.Set;

import org.tracegas.model.AccessLevel;
import org.tracegas.model.Role;
import org.tracegas.store.AccessDeniedException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.Session;

/** Role and project-grant checks against the stored user, inside the operation's transaction. */
final class Guard {

    private Guard() {
    }

    static Set<Role> roles(Tx tx, Session actor) throws SQLException {
        if (actor == null) {
            throw new IllegalArgumentException("actor must not be null: sign in first");
        }
        return tx.queryOne("SELECT roles, locked FROM app_user WHERE id = ?", rs -> {
            if (rs.getBoolean("locked")) {
                throw new AccessDeniedException("user '" + actor.login() + "' is locked");
            }
            return RoleSets.parse(rs.getString("roles"));
        }, actor.userId()).orElseThrow(() -> new AccessDeniedException("user '" + actor.login()
                + "' (" + actor.userId() + ") does not exist in this workspace"));
    }

    /** @throws AccessDeniedException unless the actor has one of the roles */
    static void requireRole(Tx tx, Session actor, String action, Role... anyOf) throws SQLException {
        Set<Role> held = roles(tx, actor);
        for (Role r : anyOf) {
            if (held.contains(r)) {
                return;
            }
        }
        throw new AccessDeniedException("user '" + actor.login() + "' may not " + action + ": it needs one of "
                + Arrays.toString(anyOf) + ", has " + held);
    }

    /**
     * @throws NoSuchObjectException if the project does not exist
     * @throws AccessDeniedException if the actor's grant is missing or only READ when WRITE is needed
     */
    static void requireProject(Tx tx, Session actor, String projectId, AccessLevel needed) throws SQLException {
        roles(tx, actor);
        String code = tx.queryOne("SELECT code FROM project WHERE id = ?", rs -> rs.getString(1), projectId)
                .orElseThrow(() -> new NoSuchObjectException("project", projectId));
        AccessLevel granted = tx.queryOne("SELECT access FROM project_grant WHERE project_id = ? AND user_id = ?",
                rs -> AccessLevel.valueOf(rs.getString(1)), projectId, actor.userId()).orElse(null);
        if (granted == null || (needed == AccessLevel.WRITE && granted != AccessLevel.WRITE)) {
            throw new AccessDeniedException("user '" + actor.login() + "' has no " + needed.getLiteral().toLowerCase()
                    + " access to project " + code + " (" + projectId + ")");
        }
    }

    /**
     * Checks the actor's access to the project a row belongs to.
     *
     * @param table a table of the project's rows, with columns id and project_id (a constant of the store's)
     * @param what  what the row is, for the message
     * @return that project's id
     * @throws NoSuchObjectException if there is no such row
     * @throws AccessDeniedException as {@link #requireProject}
     */
    static String requireProjectOf(Tx tx, Session actor, String table, String what, String id, AccessLevel needed)
            throws SQLException {
        String projectId = tx.queryOne("SELECT project_id FROM " + table + " WHERE id = ?", rs -> rs.getString(1),
                id).orElseThrow(() -> new NoSuchObjectException(what, id));
        requireProject(tx, actor, projectId, needed);
        return projectId;
    }
}
