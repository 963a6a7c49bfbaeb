package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;

import org.junit.jupiter.api.Test;

class CanonicalRowTest {

    /**
     * The documented encoding built by hand with java.nio.ByteBuffer (big-endian by default) and hashed with the
     * platform's SHA-256: the bit pattern of 0.1 is 0x3FB999999999999A (IEEE 754 binary64, from memory; the
     * nearest double to 0.1), written out here rather than taken from the code under test.
     */
    @Test
    void encodesEachTypeAsDocumented() throws Exception {
        byte[] kind = "result".getBytes(StandardCharsets.UTF_8);
        byte[] text = "CO₂".getBytes(StandardCharsets.UTF_8);
        ByteBuffer expected = ByteBuffer.allocate(256);
        expected.put((byte) 1).putInt(kind.length).put(kind);
        expected.put((byte) 1).putInt(text.length).put(text);
        expected.put((byte) 2).putLong(-5L);
        expected.put((byte) 3).putLong(0x3FB999999999999AL);
        expected.put((byte) 4).put((byte) 1);
        expected.put((byte) 0);
        expected.put((byte) 5).putInt(3).put(new byte[] {7, 8, 9});
        expected.put((byte) 6).putLong(1_773_734_400_000_000L);
        String want = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(
                java.util.Arrays.copyOf(expected.array(), expected.position())));

        String got = CanonicalRow.of("result").text("CO₂").integer(-5L).real(0.1).bool(true).real(null)
                .bytes(new byte[] {7, 8, 9}).time(1_773_734_400_000_000L).sha256Hex();
        assertEquals(want, got);
    }

    @Test
    void aHalvedNumberOrItsLastBitChangesTheHash() {
        String full = CanonicalRow.of("result").real(12.5).sha256Hex();
        assertNotEquals(full, CanonicalRow.of("result").real(6.25).sha256Hex());
        assertNotEquals(full, CanonicalRow.of("result").real(Math.nextUp(12.5)).sha256Hex());
        assertNotEquals(CanonicalRow.of("result").real(0.0).sha256Hex(),
                CanonicalRow.of("result").real(-0.0).sha256Hex());
    }

    @Test
    void nullsBoundariesAndKindsAreTold() {
        assertNotEquals(CanonicalRow.of("user").text(null).sha256Hex(), CanonicalRow.of("user").text("").sha256Hex());
        assertNotEquals(CanonicalRow.of("user").text("ab").text("c").sha256Hex(),
                CanonicalRow.of("user").text("a").text("bc").sha256Hex());
        assertNotEquals(CanonicalRow.of("user").text("x").sha256Hex(),
                CanonicalRow.of("client").text("x").sha256Hex());
        assertNotEquals(CanonicalRow.of("user").integer(1L).sha256Hex(),
                CanonicalRow.of("user").real(Double.longBitsToDouble(1L)).sha256Hex());
    }

    @Test
    void refusesABlankKindOrColumn() {
        assertEquals("kind: must not be blank",
                assertThrows(IllegalArgumentException.class, () -> CanonicalRow.of(" ")).getMessage());
        assertEquals("type: must not be null (column c)",
                assertThrows(IllegalArgumentException.class, () -> new CanonicalRow.Column("c", null)).getMessage());
    }
}
