package org.tracegas.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.UUID;

import org.junit.jupiter.api.Test;

/** Row ids are UUIDs of version 7 as RFC 9562 lays them out, and sort by the millisecond they were made. */
class RowIdsTest {

    /**
     * RFC 9562 (2024), section 5.7, and its example of a UUIDv7 value in appendix A.6: unix_ts_ms
     * 0x017F22E279B0 (2022-02-22 14:22:22 at UTC-05:00), version 7, rand_a 0xCC3, variant 10 and rand_b
     * 0x18C4DC0C0C07398F give 017F22E2-79B0-7CC3-98C4-DC0C0C07398F.
     */
    @Test
    void theLayoutOfTheStandardsExample() {
        assertEquals("017f22e2-79b0-7cc3-98c4-dc0c0c07398f",
                RowIds.of(0x017F22E279B0L, 0xCC3L, 0x18C4DC0C0C07398FL));
        UUID id = UUID.fromString(RowIds.next());
        assertEquals(7, id.version());
        assertEquals(2, id.variant(), "variant 10 (binary), as java.util.UUID numbers it");
    }

    @Test
    void idsOfLaterMillisecondsSortAfter() {
        long now = System.currentTimeMillis();
        String earlier = RowIds.of(now, -1L, -1L);
        String later = RowIds.of(now + 1, 0L, 0L);
        assertTrue(earlier.compareTo(later) < 0, earlier + " before " + later);
        long before = System.currentTimeMillis();
        String made = RowIds.next();
        long after = System.currentTimeMillis();
        long millis = UUID.fromString(made).getMostSignificantBits() >>> 16;
        assertTrue(millis >= before && millis <= after, made);
    }
}
