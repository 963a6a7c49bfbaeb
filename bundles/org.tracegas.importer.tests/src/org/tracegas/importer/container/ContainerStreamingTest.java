package org.tracegas.importer.container;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.InputStream;
import java.lang.ref.WeakReference;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.spectrum.Interferogram;

/**
 * A long container streams through the reader holding one record at a time. The stream below produces its bytes
 * on the fly (one real record repeated), so the test itself holds no file in memory; the reader must let go of
 * each record once the next one is read, which a reader that loads the whole file cannot do. Run with a heap
 * smaller than the stream (for example -Xmx128m) the same test reads more bytes than the heap holds.
 */
class ContainerStreamingTest {

    /** Repeats one record's bytes after the file header until {@code total} bytes are produced. */
    private static final class RepeatingContainer extends InputStream {
        private final byte[] fileHeader;
        private final byte[] record;
        private final long records;
        private long position;

        RepeatingContainer(byte[] file, long records) {
            this.fileHeader = Arrays.copyOf(file, 16);
            this.record = Arrays.copyOfRange(file, 16, file.length);
            this.records = records;
        }

        long size() {
            return 16 + records * record.length;
        }

        @Override
        public int read() {
            byte[] one = new byte[1];
            return read(one, 0, 1) < 0 ? -1 : one[0] & 0xff;
        }

        @Override
        public int read(byte[] b, int off, int len) {
            if (position >= size()) {
                return -1;
            }
            int n = 0;
            while (n < len && position < size()) {
                byte[] part;
                int at;
                if (position < 16) {
                    part = fileHeader;
                    at = (int) position;
                } else {
                    part = record;
                    at = (int) ((position - 16) % record.length);
                }
                int count = (int) Math.min(len - n, part.length - at);
                System.arraycopy(part, at, b, off + n, count);
                n += count;
                position += count;
            }
            return n;
        }
    }

    @Test
    void holdsOnlyTheCurrentRecord(@TempDir Path dir) throws Exception {
        Path one = dir.resolve("one.tgic");
        int points = 1 << 20; // 4 MiB of float32 per record
        try (ContainerWriter w = ContainerWriter.create(one)) {
            w.append(ContainerTest.header(1), ContainerTest.interferogram(1, points));
            w.commit();
        }
        byte[] file = Files.readAllBytes(one);
        long records = 64; // 256 MiB
        RepeatingContainer stream = new RepeatingContainer(file, records);
        long count = 0;
        double sum = 0;
        WeakReference<Interferogram> first = null;
        try (ContainerReader reader = ContainerReader.open(stream, "generated")) {
            while (reader.hasNext()) {
                ContainerRecord r = reader.next();
                count++;
                assertEquals(count, r.number());
                sum += r.interferogram().get(points - 1);
                if (count == 1) {
                    first = new WeakReference<>(r.interferogram());
                }
                if (count == 8) {
                    r = null;
                    collectGarbage(first);
                    assertNull(first.get(), "the reader still holds the first record after reading the eighth");
                }
            }
        }
        assertEquals(records, count);
        assertEquals(records * (double) (float) ContainerTest.interferogram(1, points).get(points - 1), sum,
                1e-6 * Math.abs(sum));
    }

    private static void collectGarbage(WeakReference<?> ref) throws InterruptedException {
        for (int i = 0; i < 20 && ref.get() != null; i++) {
            System.gc();
            Thread.sleep(10);
        }
    }
}
