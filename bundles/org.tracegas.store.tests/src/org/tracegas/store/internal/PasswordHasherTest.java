package org.tracegas.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.HexFormat;

import org.junit.jupiter.api.Test;

class PasswordHasherTest {

    @Test
    void derivesThePbkdf2HmacSha256TestVectors() {
        // RFC 7914 (scrypt), section 11, PBKDF2-HMAC-SHA-256 test vectors (from memory)
        assertEquals("55ac046e56e3089fec1691c22544b605f94185216dde0465e68b9d57c20dacbc"
                + "49ca9cccf179b645991664b39d77ef317c71b845b1e30bd509112041d3a19783",
                hex(PasswordHasher.hash("passwd".toCharArray(), ascii("salt"), 1, 64)));
        assertEquals("4ddcd8f60b98be21830cee5ef22701f9641a4418d04c0414aeff08876b34ab56"
                + "a1d425a1225833549adb841b51c9b3176a272bdebba1d078478f62b397f33c8d",
                hex(PasswordHasher.hash("Password".toCharArray(), ascii("NaCl"), 80_000, 64)));
    }

    @Test
    void verifyAcceptsOnlyTheSamePasswordAndSalt() {
        byte[] salt = PasswordHasher.newSalt();
        byte[] hash = PasswordHasher.hash("correct horse".toCharArray(), salt, 1000, PasswordHasher.HASH_BYTES);
        assertTrue(PasswordHasher.verify("correct horse".toCharArray(), salt, 1000, hash));
        assertFalse(PasswordHasher.verify("correct horsE".toCharArray(), salt, 1000, hash));
        assertFalse(PasswordHasher.verify("correct horse".toCharArray(), PasswordHasher.newSalt(), 1000, hash));
        assertFalse(PasswordHasher.verify("correct horse".toCharArray(), salt, 1001, hash));
    }

    @Test
    void saltsAreRandomAndIterationsMeetTheFloor() {
        assertFalse(Arrays.equals(PasswordHasher.newSalt(), PasswordHasher.newSalt()));
        assertEquals(16, PasswordHasher.newSalt().length);
        // OWASP Password Storage Cheat Sheet (2023): at least 210,000 iterations (from memory)
        assertTrue(PasswordHasher.ITERATIONS >= 210_000);
        assertTrue(PasswordHasher.MIN_ITERATIONS >= 210_000);
    }

    @Test
    void shortPasswordIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PasswordHasher.checkStrength("short".toCharArray()));
        assertTrue(e.getMessage().contains("password"), e.getMessage());
    }

    private static byte[] ascii(String s) {
        return s.getBytes(StandardCharsets.US_ASCII);
    }

    private static String hex(byte[] b) {
        return HexFormat.of().formatHex(b);
    }
}
