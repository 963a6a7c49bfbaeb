package org.tracegas.importer.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;

import org.junit.jupiter.api.Test;

class NumbersTest {

    @Test
    void plainDecimalsOnly() {
        assertEquals(-1.5e-3, Numbers.parseDecimal("-1.5E-3"));
        assertEquals(0.25, Numbers.parseDecimal(".25"));
        assertEquals(3.0, Numbers.parseDecimal("+3."));
        // Double.parseDouble would accept all of these; the text formats do not
        for (String s : new String[] {"NaN", "Infinity", "0x1p3", "1d", "1f", "", "1.2.3", "E5", "1e"}) {
            assertNull(Numbers.parseDecimal(s), s);
        }
    }

    @Test
    void longMalformedTokensAreRejectedInLinearTime() {
        String token = "1".repeat(200_000) + "x";
        assertTimeoutPreemptively(Duration.ofSeconds(2), () -> assertNull(Numbers.parseDecimal(token)));
    }

    @Test
    void longTextIsCutInMessages() {
        assertEquals("abc", Numbers.shown("abc"));
        assertEquals("1".repeat(40) + "... (100 characters)", Numbers.shown("1".repeat(100)));
    }
}
