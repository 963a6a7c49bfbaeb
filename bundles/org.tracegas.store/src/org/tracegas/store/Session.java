package org.tracegas.store;

import java.util.EnumSet;
import java.util.Set;

import org.tracegas.model.Role;

/**
 * A signed-in user, as returned by {@link UserService#logIn}. The services check roles and project grants
 * against the stored user on every call, so a session is identification, not a permission.
 *
 * @param userId the user's id
 * @param login  the login name
 * @param roles  roles at log-in time (copied)
 */
public record Session(String userId, String login, Set<Role> roles) {

    public Session {
        if (userId == null || userId.isBlank()) {
            throw new IllegalArgumentException("userId must not be blank");
        }
        roles = roles.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(roles));
    }
}
