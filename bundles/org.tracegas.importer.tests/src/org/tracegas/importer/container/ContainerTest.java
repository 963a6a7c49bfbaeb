package org.tracegas.importer.container;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Arrays;
import java.util.Map;
import java.util.zip.CRC32;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedInterferogram;
import org.tracegas.importer.UncheckedImportException;
import org.tracegas.spectrum.Interferogram;

class ContainerTest {

    @TempDir
    Path dir;

    static AcquisitionHeader header(int i) {
        return new AcquisitionHeader(3, i % 2 == 0 ? SampleKind.BACKGROUND : SampleKind.SAMPLE,
                Instant.parse("2026-11-30T10:15:00Z").plusSeconds(60L * i), 308.15, 1013.25, 10.0,
                Map.of("instrument.serial", "A-17", "scans.coadded", Integer.toString(8 + i)));
    }

    static Interferogram interferogram(int i, int n) {
        double[] s = new double[n];
        for (int k = 0; k < n; k++) {
            s[k] = Math.cos(0.3 * (k - 3) + i) * 0.25 + i; // float32 keeps these to 2^-24 relative
        }
        return new Interferogram(s, 15798.0, 2);
    }

    private Path write(int records, int points) throws IOException {
        Path f = dir.resolve("run.tgic");
        try (ContainerWriter w = ContainerWriter.create(f)) {
            for (int i = 0; i < records; i++) {
                w.append(header(i), interferogram(i, points));
            }
            w.commit();
        }
        return f;
    }

    @Test
    void recordsStreamBackInOrderWithTheirHeaders() throws Exception {
        Path f = write(5, 64);
        // 16 + 5 * (4 + 4 + H + 4 + 64*4 + 4) bytes: the layout of CONTAINER-FORMAT.md
        long expectedSize = 16;
        for (int i = 0; i < 5; i++) {
            expectedSize += 16 + 256 + ContainerWriter.headerText(header(i), interferogram(i, 64)).getBytes("UTF-8").length;
        }
        assertEquals(expectedSize, Files.size(f));
        try (ContainerReader r = ContainerReader.open(f)) {
            int i = 0;
            while (r.hasNext()) {
                ContainerRecord rec = r.next();
                assertEquals(i + 1, rec.number());
                assertEquals(header(i), rec.header());
                double[] expected = interferogram(i, 64).toArray();
                for (int k = 0; k < expected.length; k++) {
                    assertEquals((float) expected[k], rec.interferogram().get(k), 0.0);
                }
                assertEquals(15798.0, rec.interferogram().laserWavenumber());
                assertEquals(2, rec.interferogram().samplingInterval());
                i++;
            }
            assertEquals(5, i);
        }
    }

    @Test
    void littleEndianFloatsAndCrcAsDocumented() throws Exception {
        Path f = write(1, 4);
        byte[] b = Files.readAllBytes(f);
        assertArrayEquals(new byte[] {(byte) 0x89, 'T', 'G', 'I', 'C', '\r', '\n', 0x1A}, Arrays.copyOf(b, 8));
        ByteBuffer le = ByteBuffer.wrap(b).order(ByteOrder.LITTLE_ENDIAN);
        int headerLength = le.getInt(20);
        int dataAt = 16 + 8 + headerLength + 4;
        assertEquals(4, le.getInt(dataAt - 4));
        assertEquals((float) interferogram(0, 4).get(1), le.getFloat(dataAt + 4), 0.0);
        CRC32 crc = new CRC32();
        crc.update(b, 16, b.length - 16 - 4);
        assertEquals((int) crc.getValue(), le.getInt(b.length - 4));
    }

    @Test
    void wholeFileImportAndItsSizeLimit() throws Exception {
        Path f = write(3, 32);
        ContainerImportReader reader = new ContainerImportReader();
        assertEquals(1.0, reader.recognise(Files.readAllBytes(f), "x.bin").confidence());
        ImportedData d = reader.read(f, ImportOptions.defaults());
        assertEquals(3, d.records().size());
        ImportedInterferogram second = (ImportedInterferogram) d.records().get(1);
        assertEquals("sample", second.metadata().get("kind"));
        assertEquals("A-17", second.metadata().get("instrument.serial"));
        assertEquals(2, second.firstLine());
        ImportException e = assertThrows(ImportException.class,
                () -> reader.read(f, ImportOptions.defaults().withMaxWholeFileBytes(100)));
        assertEquals("file size", e.field());
    }

    @Test
    void closingWithoutCommitLeavesNoFile() throws Exception {
        Path f = dir.resolve("aborted.tgic");
        try (ContainerWriter w = ContainerWriter.create(f)) {
            w.append(header(0), interferogram(0, 8));
            assertThrows(IllegalArgumentException.class, () -> w.append(header(0), interferogram(0, 2)));
        }
        assertFalse(Files.exists(f));
        try (var files = Files.list(dir)) {
            assertEquals(0, files.count());
        }
    }

    @Test
    void truncatedFileNamesRecordAndField() throws Exception {
        Path f = write(3, 32);
        byte[] b = Files.readAllBytes(f);
        Files.write(f, Arrays.copyOf(b, b.length - 10));
        try (ContainerReader r = ContainerReader.open(f)) {
            assertEquals(1, r.readNext().number());
            assertEquals(2, r.readNext().number());
            ImportException e = assertThrows(ImportException.class, r::readNext);
            assertEquals(3, e.line());
            assertEquals("data", e.field());
            assertTrue(e.getMessage().startsWith(f + ", line 3, field data: "), e.getMessage());
        }
    }

    @Test
    void corruptedSampleFailsTheCrc() throws Exception {
        Path f = write(2, 32);
        byte[] b = Files.readAllBytes(f);
        b[b.length - 20] ^= 0x01;
        Files.write(f, b);
        try (ContainerReader r = ContainerReader.open(f)) {
            r.next();
            UncheckedImportException e = assertThrows(UncheckedImportException.class, r::hasNext);
            assertEquals("crc32", e.getCause().field());
            assertEquals(2, e.getCause().line());
        }
    }

    @Test
    void notANumberSampleAndWrongMagicAndEmptyFile() throws Exception {
        Path f = write(1, 4);
        byte[] b = Files.readAllBytes(f);
        ByteBuffer.wrap(b).order(ByteOrder.LITTLE_ENDIAN).putFloat(b.length - 8, Float.NaN);
        Files.write(f, b);
        try (ContainerReader r = ContainerReader.open(f)) {
            assertEquals("data", assertThrows(ImportException.class, r::readNext).field());
        }
        Files.writeString(f, "##TITLE=not a container\n");
        assertEquals("magic", assertThrows(ImportException.class, () -> ContainerReader.open(f)).field());
        Files.write(f, new byte[0]);
        assertEquals("magic", assertThrows(ImportException.class, () -> ContainerReader.open(f)).field());
        Files.write(f, Arrays.copyOf(b, 16));
        try (ContainerReader r = ContainerReader.open(f)) {
            assertNull(r.readNext());
        }
        assertEquals("records", assertThrows(ImportException.class,
                () -> new ContainerImportReader().read(f, ImportOptions.defaults())).field());
    }

    @Test
    void missingHeaderKeyIsNamed() throws Exception {
        Path f = write(1, 4);
        byte[] b = Files.readAllBytes(f);
        String text = new String(b, "ISO-8859-1").replace("kind=background", "kynd=background");
        // the CRC now fails first; fix it so the header check is reached
        byte[] changed = text.getBytes("ISO-8859-1");
        CRC32 crc = new CRC32();
        crc.update(changed, 16, changed.length - 20);
        ByteBuffer.wrap(changed).order(ByteOrder.LITTLE_ENDIAN).putInt(changed.length - 4, (int) crc.getValue());
        Files.write(f, changed);
        try (ContainerReader r = ContainerReader.open(f)) {
            ImportException e = assertThrows(ImportException.class, r::readNext);
            assertEquals("kind", e.field());
        }
    }
}
