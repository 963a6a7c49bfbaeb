package org.tracegas.audit;

/**
 * Checks the two identification components entered at signing, user id and password
 * (21 CFR 11.200(a)(1)). Implemented by the user store with its password hashing.
 */
@FunctionalInterface
public interface CredentialCheck {

    /**
     * @param userId   the user id as typed at signing
     * @param password the password as typed; the implementation must not keep it
     * @return whether the pair belongs to an active user
     */
    boolean matches(String userId, char[] password);
}
