package org.tracegas.importer.container;

import java.io.BufferedOutputStream;
import java.io.Closeable;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.zip.CRC32;

import org.tracegas.spectrum.Interferogram;

/**
 * Writes a container file record by record. The records go to a temporary file beside the target, which
 * {@link #commit()} moves into place; closing without commit deletes it, so a failed write leaves no partial
 * file. Samples are stored as float32: about seven significant digits.
 */
public final class ContainerWriter implements Closeable {

    private final Path target;
    private final Path temporary;
    private final OutputStream out;
    private boolean finished;
    private long records;

    private ContainerWriter(Path target) throws IOException {
        this.target = target;
        Path dir = target.toAbsolutePath().getParent();
        this.temporary = Files.createTempFile(dir, ".tgic-", ".tmp");
        this.out = new BufferedOutputStream(Files.newOutputStream(temporary), 1 << 16);
        ByteBuffer header = ByteBuffer.allocate(ContainerFormat.FILE_HEADER_BYTES).order(ByteOrder.LITTLE_ENDIAN);
        header.put(ContainerFormat.MAGIC).putShort((short) ContainerFormat.VERSION).putShort((short) 0).putInt(0);
        out.write(header.array());
    }

    public static ContainerWriter create(Path target) throws IOException {
        return new ContainerWriter(target);
    }

    /**
     * Appends one interferogram.
     *
     * @throws IllegalArgumentException if the ZPD index lies outside the samples or a sample exceeds float32
     */
    public void append(AcquisitionHeader header, Interferogram interferogram) throws IOException {
        if (finished) {
            throw new IllegalStateException("writer of " + target + " is already committed or closed");
        }
        new ContainerRecord(records + 1, header, interferogram); // validates the ZPD index
        byte[] text = headerText(header, interferogram).getBytes(StandardCharsets.UTF_8);
        if (text.length > ContainerFormat.MAX_HEADER_BYTES) {
            throw new IllegalArgumentException("header of record " + (records + 1) + " exceeds "
                    + ContainerFormat.MAX_HEADER_BYTES + " bytes");
        }
        CRC32 crc = new CRC32();
        ByteBuffer head = ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN);
        head.put(ContainerFormat.RECORD_MARKER).putInt(text.length);
        write(head.array(), crc);
        write(text, crc);
        ByteBuffer count = ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(interferogram.size());
        write(count.array(), crc);
        ByteBuffer data = ByteBuffer.allocate(4 * Math.min(interferogram.size(), 1 << 16)).order(ByteOrder.LITTLE_ENDIAN);
        for (int i = 0; i < interferogram.size(); i++) {
            double v = interferogram.get(i);
            if (Math.abs(v) > Float.MAX_VALUE) {
                throw new IllegalArgumentException("sample " + i + " = " + v + " exceeds the float32 range");
            }
            data.putFloat((float) v);
            if (!data.hasRemaining()) {
                write(data.array(), crc);
                data.clear();
            }
        }
        out.write(data.array(), 0, data.position());
        crc.update(data.array(), 0, data.position());
        ByteBuffer sum = ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt((int) crc.getValue());
        out.write(sum.array());
        records++;
    }

    /** Finishes the file and moves it into place, replacing an older file. */
    public void commit() throws IOException {
        if (finished) {
            throw new IllegalStateException("writer of " + target + " is already committed or closed");
        }
        finished = true;
        out.close();
        Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    /** Discards the file unless it was committed. */
    @Override
    public void close() throws IOException {
        if (!finished) {
            finished = true;
            out.close();
        }
        Files.deleteIfExists(temporary);
    }

    private void write(byte[] bytes, CRC32 crc) throws IOException {
        out.write(bytes);
        crc.update(bytes);
    }

    static String headerText(AcquisitionHeader h, Interferogram ifg) {
        StringBuilder b = new StringBuilder();
        line(b, ContainerFormat.LASER, Double.toString(ifg.laserWavenumber()));
        line(b, ContainerFormat.SAMPLING, Integer.toString(ifg.samplingInterval()));
        line(b, ContainerFormat.ZPD, Integer.toString(h.zpdIndex()));
        line(b, ContainerFormat.KIND, h.kind().name().toLowerCase(java.util.Locale.ROOT));
        line(b, ContainerFormat.TIME, h.time().toString());
        line(b, ContainerFormat.TEMPERATURE, Double.toString(h.cellTemperatureK()));
        line(b, ContainerFormat.PRESSURE, Double.toString(h.cellPressureHpa()));
        line(b, ContainerFormat.PATH, Double.toString(h.pathLengthM()));
        h.extra().forEach((k, v) -> line(b, k, v));
        return b.toString();
    }

    private static void line(StringBuilder b, String key, String value) {
        b.append(key).append('=').append(value).append('\n');
    }
}
