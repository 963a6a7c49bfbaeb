package org.tracegas.importer.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;
import java.util.Random;
import java.util.regex.Pattern;

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

    /**
     * The hand-written check accepts exactly the language of the grammar [+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?
     * as the JDK's regular-expression engine reads it, on every string up to 5 characters over the characters that
     * matter and on random longer ones.
     */
    @Test
    void acceptsWhatTheGrammarAccepts() {
        Pattern grammar = Pattern.compile("[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?");
        char[] alphabet = "07+-.eEx ".toCharArray();
        int checked = 0;
        for (int length = 0; length <= 5; length++) {
            int[] digits = new int[length];
            while (true) {
                StringBuilder b = new StringBuilder();
                for (int d : digits) {
                    b.append(alphabet[d]);
                }
                String text = b.toString();
                assertEquals(grammar.matcher(text).matches(), Numbers.isDecimal(text), "'" + text + "'");
                checked++;
                int k = length - 1;
                while (k >= 0 && ++digits[k] == alphabet.length) {
                    digits[k--] = 0;
                }
                if (k < 0) {
                    break;
                }
            }
        }
        Random random = new Random(20261204L);
        for (int i = 0; i < 20_000; i++) {
            char[] c = new char[6 + random.nextInt(14)];
            for (int j = 0; j < c.length; j++) {
                c[j] = alphabet[random.nextInt(alphabet.length)];
            }
            String text = new String(c);
            assertEquals(grammar.matcher(text).matches(), Numbers.isDecimal(text), "'" + text + "'");
        }
        assertEquals(66_430, checked, "all strings of up to 5 of the 9 characters");
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
