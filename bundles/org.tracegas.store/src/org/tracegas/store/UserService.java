package org.tracegas.store;

import java.util.Optional;
import java.util.Set;

import org.tracegas.model.Role;
import org.tracegas.model.User;

/**
 * Users, roles and log-in. Passwords are kept as salted PBKDF2-HMAC-SHA256 hashes; an account is
 * locked after a number of consecutive failed log-ins. A user is returned as a fresh model {@link User}, read
 * from its row, without its password hash, salt or failure count.
 */
public interface UserService {

    /**
     * Creates the first user, an administrator, in an empty workspace.
     *
     * @throws AccessDeniedException if any user exists already
     */
    Session createFirstAdministrator(String login, String displayName, char[] password);

    /**
     * @throws AccessDeniedException    unless the actor is an administrator
     * @throws IllegalArgumentException naming a blank login or display name, no role, or a short password
     */
    User createUser(Session actor, String login, String displayName, Set<Role> roles, char[] password);

    /**
     * Checks the password. A failure counts towards the lock-out; a success resets the count.
     *
     * @throws LoginFailedException for an unknown login, a wrong password or a locked account
     */
    Session logIn(String login, char[] password);

    /**
     * @param expectedVersion the user's row version the change was made on
     * @throws ConcurrentChangeException if the user was changed since
     * @throws AccessDeniedException     unless the actor is an administrator
     */
    User changeRoles(Session actor, String userId, long expectedVersion, Set<Role> roles);

    /**
     * Unlocks an account and resets its failure count.
     *
     * @throws AccessDeniedException unless the actor is an administrator
     */
    User unlock(Session actor, String userId);

    /** @throws NoSuchObjectException if there is no such user */
    User user(String userId);

    /** The user with this login, if any; for an administrator's commands that name users by login. */
    Optional<User> findByLogin(String login);

    /** Whether the workspace has any user yet (before the first administrator, it has none). */
    boolean hasUsers();
}
