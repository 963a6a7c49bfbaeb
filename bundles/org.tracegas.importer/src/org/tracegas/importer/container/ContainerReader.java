package org.tracegas.importer.container;

import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.FloatBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.Arrays;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.zip.CRC32;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.UncheckedImportException;
import org.tracegas.importer.internal.Numbers;
import org.tracegas.spectrum.internal.HandedOverSamples;

/**
 * Streams the records of a container file one at a time: only the current record is in memory, so files far
 * larger than memory can be read. Errors name the file, the 1-based record number and the field; through the
 * {@link Iterator} they arrive as {@link UncheckedImportException}.
 */
public final class ContainerReader implements Iterator<ContainerRecord>, Closeable {

    /** Samples read per chunk: bounds the read buffer whatever a record's length. */
    private static final int CHUNK_POINTS = 1 << 16;

    private final InputStream in;
    /**
     * The read buffer, kept for the next record: a batch reads records of a few hundred KiB each, and fresh
     * buffers of that size per record made the collector run for them alone.
     */
    private byte[] chunk = new byte[0];
    private final String source;
    private long number;
    private ContainerRecord ahead;

    private ContainerReader(InputStream in, String source) throws ImportException {
        this.in = in.markSupported() ? in : new BufferedInputStream(in, 1 << 16);
        this.source = source;
        byte[] header = readFully(ContainerFormat.FILE_HEADER_BYTES, "file header", 0);
        if (header == null || !Arrays.equals(Arrays.copyOf(header, 8), ContainerFormat.MAGIC)) {
            throw new ImportException(source, 0, "magic", "not an interferogram container (magic bytes differ)");
        }
        ByteBuffer b = ByteBuffer.wrap(header).order(ByteOrder.LITTLE_ENDIAN);
        int version = Short.toUnsignedInt(b.getShort(8));
        if (version != ContainerFormat.VERSION) {
            throw new ImportException(source, 0, "version", "version " + version + " is not supported (reads "
                    + ContainerFormat.VERSION + ")");
        }
        if (b.getShort(10) != 0) {
            throw new ImportException(source, 0, "flags", "unknown flags " + Short.toUnsignedInt(b.getShort(10)));
        }
    }

    /** Opens a file; close the reader when done. */
    public static ContainerReader open(Path file) throws ImportException {
        InputStream in;
        try {
            in = Files.newInputStream(file);
        } catch (IOException e) {
            throw new ImportException(file.toString(), 0, "file", "cannot be read: " + e.getMessage(), e);
        }
        try {
            return new ContainerReader(in, file.toString());
        } catch (ImportException | RuntimeException e) {
            closeQuietly(in);
            throw e;
        }
    }

    /** Reads from a stream; {@code source} names it in errors. Closing the reader closes the stream. */
    public static ContainerReader open(InputStream in, String source) throws ImportException {
        return new ContainerReader(in, source);
    }

    /** The next record, or null at the end of the file. */
    public ContainerRecord readNext() throws ImportException {
        if (ahead != null) {
            ContainerRecord r = ahead;
            ahead = null;
            return r;
        }
        long n = number + 1;
        CRC32 crc = new CRC32();
        byte[] head = readFully(8, "record marker", n);
        if (head == null) {
            return null;
        }
        if (!Arrays.equals(Arrays.copyOf(head, 4), ContainerFormat.RECORD_MARKER)) {
            throw new ImportException(source, n, "record marker", "expected 'IFGR' (damaged or misaligned file)");
        }
        crc.update(head);
        int headerBytes = ByteBuffer.wrap(head).order(ByteOrder.LITTLE_ENDIAN).getInt(4);
        if (headerBytes < 0 || headerBytes > ContainerFormat.MAX_HEADER_BYTES) {
            throw new ImportException(source, n, "header length", Integer.toUnsignedString(headerBytes)
                    + " bytes lies outside 0.." + ContainerFormat.MAX_HEADER_BYTES);
        }
        byte[] text = require(headerBytes, "header", n);
        crc.update(text);
        byte[] countBytes = require(4, "point count", n);
        crc.update(countBytes);
        int points = ByteBuffer.wrap(countBytes).order(ByteOrder.LITTLE_ENDIAN).getInt();
        if (points < 2 || points > ContainerFormat.MAX_POINTS) {
            throw new ImportException(source, n, "point count", Integer.toUnsignedString(points)
                    + " lies outside 2.." + ContainerFormat.MAX_POINTS);
        }
        Map<String, String> fields = parseHeader(text, n);
        double[] samples = readSamples(points, crc, n);
        byte[] sum = require(4, "crc32", n);
        int stored = ByteBuffer.wrap(sum).order(ByteOrder.LITTLE_ENDIAN).getInt();
        if (stored != (int) crc.getValue()) {
            throw new ImportException(source, n, "crc32", String.format("stored %08x but the record gives %08x",
                    stored, (int) crc.getValue()));
        }
        number = n;
        return toRecord(n, fields, samples);
    }

    @Override
    public boolean hasNext() {
        if (ahead == null) {
            try {
                ahead = readNext();
            } catch (ImportException e) {
                throw new UncheckedImportException(e);
            }
        }
        return ahead != null;
    }

    @Override
    public ContainerRecord next() {
        if (!hasNext()) {
            throw new NoSuchElementException("no record after record " + number + " of " + source);
        }
        ContainerRecord r = ahead;
        ahead = null;
        return r;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }

    private double[] readSamples(int points, CRC32 crc, long n) throws ImportException {
        double[] samples = new double[points];
        int chunkPoints = Math.min(points, CHUNK_POINTS);
        if (chunk.length < 4 * chunkPoints) {
            chunk = new byte[4 * chunkPoints];
        }
        int done = 0;
        while (done < points) {
            int count = Math.min(points - done, chunkPoints);
            fill(chunk, 4 * count, "data", n);
            crc.update(chunk, 0, 4 * count);
            FloatBuffer floats = ByteBuffer.wrap(chunk, 0, 4 * count).order(ByteOrder.LITTLE_ENDIAN).asFloatBuffer();
            for (int i = 0; i < count; i++) {
                float v = floats.get(i);
                if (!Float.isFinite(v)) {
                    throw new ImportException(source, n, "data", "sample " + (done + i) + " is not finite: " + v);
                }
                samples[done + i] = v;
            }
            done += count;
        }
        return samples;
    }

    private Map<String, String> parseHeader(byte[] text, long n) throws ImportException {
        String s;
        try {
            s = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(text)).toString();
        } catch (CharacterCodingException e) {
            throw new ImportException(source, n, "header", "not valid UTF-8");
        }
        Map<String, String> fields = new LinkedHashMap<>();
        for (String line : s.split("\n")) {
            if (line.isEmpty()) {
                continue;
            }
            int eq = line.indexOf('=');
            if (eq < 1) {
                throw new ImportException(source, n, "header", "line '" + line + "' is not key=value");
            }
            String key = line.substring(0, eq);
            if (fields.put(key, line.substring(eq + 1)) != null) {
                throw new ImportException(source, n, key, "key appears twice");
            }
        }
        return fields;
    }

    private ContainerRecord toRecord(long n, Map<String, String> fields, double[] samples) throws ImportException {
        double laser = real(fields, ContainerFormat.LASER, n);
        int sampling = (int) integer(fields, ContainerFormat.SAMPLING, n);
        int zpd = (int) integer(fields, ContainerFormat.ZPD, n);
        String kindText = required(fields, ContainerFormat.KIND, n);
        SampleKind kind = switch (kindText) {
            case "sample" -> SampleKind.SAMPLE;
            case "background" -> SampleKind.BACKGROUND;
            default -> throw new ImportException(source, n, ContainerFormat.KIND, "'" + kindText
                    + "' is neither sample nor background");
        };
        Instant time;
        try {
            time = Instant.parse(required(fields, ContainerFormat.TIME, n));
        } catch (DateTimeParseException e) {
            throw new ImportException(source, n, ContainerFormat.TIME, "not an ISO-8601 UTC time: '"
                    + fields.get(ContainerFormat.TIME) + "'");
        }
        Map<String, String> extra = new LinkedHashMap<>(fields);
        extra.keySet().removeAll(ContainerFormat.RESERVED_KEYS);
        try {
            AcquisitionHeader header = new AcquisitionHeader(zpd, kind, time, real(fields, ContainerFormat.TEMPERATURE, n),
                    real(fields, ContainerFormat.PRESSURE, n), real(fields, ContainerFormat.PATH, n), extra);
            // the array was read for this record alone: handed over, not copied a second time
            return new ContainerRecord(n, header, HandedOverSamples.interferogram(samples, laser, sampling));
        } catch (IllegalArgumentException e) {
            throw new ImportException(source, n, "header", e.getMessage());
        }
    }

    private String required(Map<String, String> fields, String key, long n) throws ImportException {
        String v = fields.get(key);
        if (v == null) {
            throw new ImportException(source, n, key, "required key is missing");
        }
        return v;
    }

    private double real(Map<String, String> fields, String key, long n) throws ImportException {
        String v = required(fields, key, n);
        Double d = Numbers.parseDecimal(v);
        if (d == null || !Double.isFinite(d)) {
            throw new ImportException(source, n, key, "not a finite number: '" + Numbers.shown(v) + "'");
        }
        return d;
    }

    private long integer(Map<String, String> fields, String key, long n) throws ImportException {
        String v = required(fields, key, n);
        try {
            return Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new ImportException(source, n, key, "not an integer: '" + v + "'");
        }
    }

    /** Exactly {@code length} bytes, or null at a clean end of file before the first byte. */
    private byte[] readFully(int length, String field, long n) throws ImportException {
        try {
            in.mark(1);
            if (in.read() < 0) {
                return null;
            }
            in.reset();
        } catch (IOException e) {
            throw new ImportException(source, n, field, "cannot be read: " + e.getMessage(), e);
        }
        return require(length, field, n);
    }

    private byte[] require(int length, String field, long n) throws ImportException {
        byte[] b = new byte[length];
        fill(b, field, n);
        return b;
    }

    private void fill(byte[] b, String field, long n) throws ImportException {
        fill(b, b.length, field, n);
    }

    private void fill(byte[] b, int length, String field, long n) throws ImportException {
        try {
            int got = in.readNBytes(b, 0, length);
            if (got < length) {
                throw new EOFException();
            }
        } catch (EOFException e) {
            throw new ImportException(source, n, field, "file ends inside the record (truncated file)");
        } catch (IOException e) {
            throw new ImportException(source, n, field, "cannot be read: " + e.getMessage(), e);
        }
    }

    private static void closeQuietly(InputStream in) {
        try {
            in.close();
        } catch (IOException e) {
            // the open failure is the error to report
        }
    }
}
