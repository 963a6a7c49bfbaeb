package org.tracegas.store.internal;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Collection;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.Role;
import org.tracegas.model.User;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.AccessDeniedException;
import org.tracegas.store.LoginFailedException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.Session;
import org.tracegas.store.UserService;

final class JdbcUserService implements UserService {

    private static final String USER_COLUMNS = "id, login, display_name, roles, locked, row_version";

    private final Transactions transactions;
    private final int maxFailedLogins;

    JdbcUserService(Transactions transactions, int maxFailedLogins) {
        if (maxFailedLogins < 1) {
            throw new IllegalArgumentException("maxFailedLogins must be at least 1, was " + maxFailedLogins);
        }
        this.transactions = transactions;
        this.maxFailedLogins = maxFailedLogins;
    }

    @Override
    public Session createFirstAdministrator(String login, String displayName, char[] password) {
        return transactions.run("creating the first administrator", tx -> {
            long users = tx.queryOne("SELECT COUNT(*) FROM app_user", rs -> rs.getLong(1)).orElseThrow();
            if (users > 0) {
                throw new AccessDeniedException("the workspace has users already; an administrator creates more");
            }
            User admin = insert(tx, login, displayName, Set.of(Role.ADMINISTRATOR), password);
            tx.audit(created(admin.getId(), admin));
            return new Session(admin.getId(), admin.getLogin(), Set.copyOf(admin.getRoles()));
        });
    }

    @Override
    public User createUser(Session actor, String login, String displayName, Set<Role> roles, char[] password) {
        return transactions.run("creating user " + login, tx -> {
            Guard.requireRole(tx, actor, "create users", Role.ADMINISTRATOR);
            User user = insert(tx, login, displayName, roles, password);
            tx.audit(created(actor.userId(), user));
            return user;
        });
    }

    private static User insert(Tx tx, String login, String displayName, Set<Role> roles, char[] password)
            throws SQLException {
        requireText("login", login);
        requireText("displayName", displayName);
        if (roles == null || roles.isEmpty()) {
            throw new IllegalArgumentException("roles must name at least one role for user '" + login + "'");
        }
        PasswordHasher.checkStrength(password);
        byte[] salt = PasswordHasher.newSalt();
        byte[] hash = PasswordHasher.hash(password, salt, PasswordHasher.ITERATIONS, PasswordHasher.HASH_BYTES);
        String id = UUID.randomUUID().toString();
        tx.update("INSERT INTO app_user (id, login, display_name, roles, password_salt, password_hash,"
                + " password_iterations, failed_logins, locked, row_version) VALUES (?, ?, ?, ?, ?, ?, ?, 0, FALSE, 0)",
                id, login, displayName, RoleSets.format(roles), salt, hash, PasswordHasher.ITERATIONS);
        tx.wrote(DataKind.USER, id);
        return user(id, login, displayName, roles, false, 0);
    }

    /** What a log-in attempt found; the transaction commits the failure count before the refusal is thrown. */
    private record Attempt(Session session, boolean locked) {
    }

    /** The credential columns of one user. */
    private record Credentials(String id, String roles, byte[] salt, byte[] hash, int iterations, int failures,
            boolean locked) {
    }

    @Override
    public Session logIn(String login, char[] password) {
        Attempt attempt = transactions.run("log-in of " + login, tx -> {
            // FOR UPDATE: concurrent wrong attempts must all count
            Credentials stored = tx.queryOne("SELECT id, roles, password_salt, password_hash, password_iterations,"
                    + " failed_logins, locked FROM app_user WHERE login = ? FOR UPDATE",
                    rs -> new Credentials(rs.getString("id"), rs.getString("roles"), rs.getBytes("password_salt"),
                            rs.getBytes("password_hash"), rs.getInt("password_iterations"),
                            rs.getInt("failed_logins"), rs.getBoolean("locked")), login).orElse(null);
            if (stored == null) {
                // still hash once, so that an unknown login takes as long as a wrong password
                PasswordHasher.hash(password == null ? new char[0] : password, PasswordHasher.newSalt(),
                        PasswordHasher.ITERATIONS, PasswordHasher.HASH_BYTES);
                tx.audit(AuditEntry.builder(login, AuditAction.REFUSED, "user", login)
                        .reason("log-in with an unknown login").build());
                return new Attempt(null, false);
            }
            if (stored.locked()) {
                tx.audit(AuditEntry.builder(stored.id(), AuditAction.REFUSED, "user", stored.id())
                        .reason("log-in to a locked account").build());
                return new Attempt(null, true);
            }
            if (stored.iterations() < PasswordHasher.MIN_ITERATIONS) {
                throw new IllegalStateException("stored password hash of user " + stored.id() + " has only "
                        + stored.iterations() + " iterations, fewer than " + PasswordHasher.MIN_ITERATIONS);
            }
            boolean ok = password != null
                    && PasswordHasher.verify(password, stored.salt(), stored.iterations(), stored.hash());
            if (ok) {
                tx.update("UPDATE app_user SET failed_logins = 0 WHERE id = ?", stored.id());
                tx.wrote(DataKind.USER, stored.id());
                tx.audit(AuditEntry.builder(stored.id(), AuditAction.LOGIN, "user", stored.id()).build());
                return new Attempt(new Session(stored.id(), login, RoleSets.parse(stored.roles())), false);
            }
            int failures = stored.failures() + 1;
            boolean lock = failures >= maxFailedLogins;
            tx.update("UPDATE app_user SET failed_logins = ?, locked = ? WHERE id = ?", failures, lock, stored.id());
            tx.wrote(DataKind.USER, stored.id());
            tx.audit(AuditEntry.builder(stored.id(), AuditAction.REFUSED, "user", stored.id())
                    .reason("wrong password, failure " + failures + " of " + maxFailedLogins
                            + (lock ? "; account locked" : ""))
                    .build());
            return new Attempt(null, lock);
        });
        if (attempt.session() == null) {
            throw new LoginFailedException(login, attempt.locked());
        }
        return attempt.session();
    }

    @Override
    public User changeRoles(Session actor, String userId, long expectedVersion, Set<Role> roles) {
        if (roles == null || roles.isEmpty()) {
            throw new IllegalArgumentException("roles must name at least one role for user " + userId);
        }
        return transactions.run("changing the roles of user " + userId, tx -> {
            Guard.requireRole(tx, actor, "change roles", Role.ADMINISTRATOR);
            User before = load(tx, userId);
            long version = RowVersions.update(tx, "app_user", "user", userId, expectedVersion, "roles = ?",
                    RoleSets.format(roles));
            tx.wrote(DataKind.USER, userId);
            User after = user(before.getId(), before.getLogin(), before.getDisplayName(), roles, before.isLocked(),
                    version);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "user", userId).version(version)
                    .oldValue(values(before)).newValue(values(after)).build());
            return after;
        });
    }

    @Override
    public User unlock(Session actor, String userId) {
        return transactions.run("unlocking user " + userId, tx -> {
            Guard.requireRole(tx, actor, "unlock users", Role.ADMINISTRATOR);
            User before = load(tx, userId);
            long version = RowVersions.update(tx, "app_user", "user", userId, before.getRowVersion(),
                    "locked = FALSE, failed_logins = 0");
            tx.wrote(DataKind.USER, userId);
            User after = user(before.getId(), before.getLogin(), before.getDisplayName(), before.getRoles(), false,
                    version);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "user", userId).version(version)
                    .oldValue(values(before)).newValue(values(after)).reason("account unlocked").build());
            return after;
        });
    }

    @Override
    public User user(String userId) {
        return transactions.run("reading user " + userId, tx -> load(tx, userId));
    }

    @Override
    public Optional<User> findByLogin(String login) {
        return transactions.run("finding user " + login,
                tx -> tx.queryOne("SELECT " + USER_COLUMNS + " FROM app_user WHERE login = ?", JdbcUserService::map,
                        login));
    }

    private static User load(Tx tx, String userId) throws SQLException {
        return tx.queryOne("SELECT " + USER_COLUMNS + " FROM app_user WHERE id = ?", JdbcUserService::map, userId)
                .orElseThrow(() -> new NoSuchObjectException("user", userId));
    }

    private static User map(ResultSet rs) throws SQLException {
        return user(rs.getString("id"), rs.getString("login"), rs.getString("display_name"),
                RoleSets.parse(rs.getString("roles")), rs.getBoolean("locked"), rs.getLong("row_version"));
    }

    /** A fresh model object of what the store keeps of a user, credentials left out; roles in declaration order. */
    private static User user(String id, String login, String displayName, Collection<Role> roles, boolean locked,
            long rowVersion) {
        User u = WorkspaceFactory.eINSTANCE.createUser();
        u.setId(id);
        u.setLogin(login);
        u.setDisplayName(displayName);
        u.getRoles().addAll(EnumSet.copyOf(roles));
        u.setLocked(locked);
        u.setRowVersion(rowVersion);
        return u;
    }

    private static AuditEntry created(String actorId, User user) {
        return AuditEntry.builder(actorId, AuditAction.CREATE, "user", user.getId()).newValue(values(user)).build();
    }

    private static String values(User u) {
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("login", u.getLogin());
        fields.put("displayName", u.getDisplayName());
        fields.put("roles", RoleSets.format(u.getRoles()));
        fields.put("locked", u.isLocked());
        return AuditValues.canonical(fields);
    }

    static void requireText(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
    }

    @Override
    public boolean hasUsers() {
        return transactions.run("counting users",
                tx -> tx.queryOne("SELECT COUNT(*) FROM app_user", rs -> rs.getLong(1)).orElseThrow() > 0);
    }
}
