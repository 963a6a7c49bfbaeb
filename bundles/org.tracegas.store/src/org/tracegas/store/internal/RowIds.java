package org.tracegas.store.internal;

import java.security.SecureRandom;
import java.util.UUID;

/**
 * Ids of the rows a batch writes in bulk (measurements, spectra, results), as time-ordered UUIDs of version 7
 * (RFC 9562, section 5.7): 48 bits of milliseconds since the epoch, then random bits. Ids made later sort
 * after earlier ones, so the rows of a block and their bindings go to the end of each key index instead of
 * to random pages all over it, and a commit rewrites a few index pages rather than one per row.
 */
final class RowIds {

    private static final SecureRandom RANDOM = new SecureRandom();

    private RowIds() {
    }

    /** A new id: the time now, then 74 random bits. */
    static String next() {
        return of(System.currentTimeMillis(), RANDOM.nextLong(), RANDOM.nextLong());
    }

    /** The id of a millisecond and random bits: version 7, variant 10 (RFC 9562). */
    static String of(long epochMillis, long randomA, long randomB) {
        long msb = (epochMillis << 16) | 0x7000L | (randomA & 0x0FFFL);
        long lsb = (randomB & 0x3FFF_FFFF_FFFF_FFFFL) | 0x8000_0000_0000_0000L;
        return new UUID(msb, lsb).toString();
    }
}
