package org.tracegas.importer.container;

import java.util.Set;

/** Constants of the interferogram container; the layout is described in CONTAINER-FORMAT.md. */
public final class ContainerFormat {

    /** File magic: 0x89 "TGIC" CR LF 0x1A. The high first byte and the line ends reveal text-mode damage. */
    static final byte[] MAGIC = {(byte) 0x89, 'T', 'G', 'I', 'C', '\r', '\n', 0x1A};
    /** Marker at the start of each record. */
    static final byte[] RECORD_MARKER = {'I', 'F', 'G', 'R'};
    /** Version of the layout written. */
    public static final int VERSION = 1;
    /** Bytes of the file header: magic, version (uint16), flags (uint16), reserved (uint32). */
    static final int FILE_HEADER_BYTES = 16;
    /** Largest header text of a record. */
    static final int MAX_HEADER_BYTES = 1 << 20;
    /** Largest number of samples of one interferogram (2^28, 1 GiB of float32). */
    static final int MAX_POINTS = 1 << 28;

    static final String LASER = "laser.wavenumber";
    static final String SAMPLING = "sampling.interval";
    static final String ZPD = "zpd.index";
    static final String KIND = "kind";
    static final String TIME = "time.utc";
    static final String TEMPERATURE = "cell.temperature.K";
    static final String PRESSURE = "cell.pressure.hPa";
    static final String PATH = "path.length.m";

    /** Keys with a fixed meaning; all of them are required in each record. */
    public static final Set<String> RESERVED_KEYS = Set.of(LASER, SAMPLING, ZPD, KIND, TIME, TEMPERATURE, PRESSURE,
            PATH);

    private ContainerFormat() {
    }
}
