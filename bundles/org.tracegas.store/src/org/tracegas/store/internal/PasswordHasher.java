package org.tracegas.store.internal;

import java.security.GeneralSecurityException;
import java.security.MessageDigest;
import java.security.SecureRandom;
import java.util.Arrays;
import javax.crypto.SecretKeyFactory;
import javax.crypto.spec.PBEKeySpec;

/**
 * Salted password hashes with PBKDF2-HMAC-SHA256 (RFC 8018, section 5.2) from the JDK. The iteration
 * count is stored with each hash so it can be raised later without invalidating old passwords.
 */
final class PasswordHasher {

    /**
     * Iterations for new hashes. The OWASP Password Storage Cheat Sheet (2023) asks for 600,000 with
     * HMAC-SHA256 and 210,000 with HMAC-SHA512 (from memory); the SHA-256 figure is used, well above the
     * 210,000 floor.
     */
    static final int ITERATIONS = 600_000;
    /** Stored counts below this are refused as tampered or legacy. */
    static final int MIN_ITERATIONS = 210_000;
    static final int SALT_BYTES = 16;
    static final int HASH_BYTES = 32;
    static final int MIN_PASSWORD_LENGTH = 8;

    private static final SecureRandom RANDOM = new SecureRandom();

    private PasswordHasher() {
    }

    static byte[] newSalt() {
        byte[] salt = new byte[SALT_BYTES];
        RANDOM.nextBytes(salt);
        return salt;
    }

    static byte[] hash(char[] password, byte[] salt, int iterations, int bytes) {
        PBEKeySpec spec = new PBEKeySpec(password, salt, iterations, bytes * 8);
        try {
            return SecretKeyFactory.getInstance("PBKDF2WithHmacSHA256").generateSecret(spec).getEncoded();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("PBKDF2WithHmacSHA256 is not available in this Java runtime", e);
        } finally {
            spec.clearPassword();
        }
    }

    /** Compares in constant time. */
    static boolean verify(char[] password, byte[] salt, int iterations, byte[] expected) {
        byte[] actual = hash(password, salt, iterations, expected.length);
        try {
            return MessageDigest.isEqual(actual, expected);
        } finally {
            Arrays.fill(actual, (byte) 0);
        }
    }

    /** @throws IllegalArgumentException if the password is missing or shorter than the minimum */
    static void checkStrength(char[] password) {
        if (password == null || password.length < MIN_PASSWORD_LENGTH) {
            throw new IllegalArgumentException("password must have at least " + MIN_PASSWORD_LENGTH
                    + " characters");
        }
    }
}
