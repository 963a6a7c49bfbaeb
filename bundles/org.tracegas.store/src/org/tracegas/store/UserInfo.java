package org.tracegas.store;

import java.util.Set;

import org.tracegas.model.Role;

/**
 * A stored user without credentials.
 *
 * @param rowVersion version for optimistic locking of changes to this user
 * @param locked     whether log-in is locked after repeated failures
 */
public record UserInfo(String id, String login, String displayName, Set<Role> roles, boolean locked,
        long rowVersion) {

    public UserInfo {
        roles = Set.copyOf(roles);
    }
}
