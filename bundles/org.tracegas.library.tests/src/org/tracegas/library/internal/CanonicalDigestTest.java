package org.tracegas.library.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;

import org.junit.jupiter.api.Test;

class CanonicalDigestTest {

    /** The serialization is documented, so its digest can be rebuilt by hand with the platform's SHA-256. */
    @Test
    void digestIsSha256OfTheDocumentedSerialization() throws Exception {
        String expected = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                .digest("s4:name5:stackd11:temperature5:296.0".getBytes(StandardCharsets.UTF_8)));
        assertEquals(expected, new CanonicalDigest().text("name", "stack").number("temperature", 296.0).hex());
    }

    /** SHA-256("abc") from FIPS 180-2, appendix B.1 (from memory), checks the platform digest used above. */
    @Test
    void platformSha256MatchesTheStandardExample() throws Exception {
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", HexFormat.of()
                .formatHex(MessageDigest.getInstance("SHA-256").digest("abc".getBytes(StandardCharsets.US_ASCII))));
    }

    @Test
    void fieldBoundariesAndSignedZeroMatter() {
        assertNotEquals(new CanonicalDigest().text("a", "bc").hex(), new CanonicalDigest().text("ab", "c").hex());
        assertNotEquals(new CanonicalDigest().number("x", 0.0).hex(), new CanonicalDigest().number("x", -0.0).hex());
        assertNotEquals(new CanonicalDigest().numbers("v", new double[] {1, 2}).hex(),
                new CanonicalDigest().numbers("v", new double[] {1, 2, 0}).hex());
    }
}
