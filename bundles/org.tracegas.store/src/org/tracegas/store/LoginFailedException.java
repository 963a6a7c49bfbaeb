package org.tracegas.store;

/**
 * Log-in refused. The message does not tell whether the login name exists; {@link #locked()} tells
 * whether the account is locked after repeated failures (an administrator unlocks it).
 */
public class LoginFailedException extends StoreException {

    private static final long serialVersionUID = 1L;

    private final boolean locked;

    public LoginFailedException(String login, boolean locked) {
        super(locked ? "account '" + login + "' is locked after repeated failed log-ins"
                : "log-in of '" + login + "' refused: unknown login or wrong password");
        this.locked = locked;
    }

    public boolean locked() {
        return locked;
    }
}
