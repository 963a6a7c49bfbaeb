package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.audit.CanonicalRow.Column;
import org.tracegas.audit.CanonicalRow.Type;

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
                Arrays.copyOf(expected.array(), expected.position())));

        String got = CanonicalRow.of("result").text("CO₂").integer(-5L).real(0.1).bool(true).real(null)
                .bytes(new byte[] {7, 8, 9}).time(1_773_734_400_000_000L).sha256Hex();
        assertEquals(want, got);
        // the same row from the values as a writer binds them: 1_773_734_400 s after the epoch is 2026-03-17T08:00Z
        List<Column> columns = List.of(new Column("compound", Type.TEXT), new Column("n", Type.INTEGER),
                new Column("c", Type.REAL), new Column("ok", Type.BOOLEAN), new Column("u", Type.REAL),
                new Column("b", Type.BYTES), new Column("at", Type.TIME));
        assertEquals(want, CanonicalRow.sha256("result", columns, Arrays.asList("CO₂", -5, 0.1, true, null,
                new byte[] {7, 8, 9}, Instant.parse("2026-03-17T08:00:00Z"))));
        assertEquals(want, CanonicalRow.sha256("result", columns, Arrays.asList("CO₂", -5L, 0.1, true, null,
                new byte[] {7, 8, 9}, OffsetDateTime.parse("2026-03-17T09:00:00+01:00"))));
    }

    @Test
    void aValueOfTheWrongTypeIsRefusedNamingItsColumn() {
        List<Column> columns = List.of(new Column("kind", Type.TEXT));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CanonicalRow.sha256("measurement", columns, List.of(Type.TEXT)));
        assertEquals("value of column kind: a Type is not a TEXT value", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> CanonicalRow.sha256("measurement", columns,
                List.of()));
        assertEquals("values: 0 given for 1 columns of measurement", e.getMessage());
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
