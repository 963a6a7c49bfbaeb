package org.tracegas.audit;

import java.nio.charset.StandardCharsets;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.List;

import org.tracegas.audit.internal.ChainHash;

/**
 * The one canonical encoding of a stored data row (or of any list of values) whose SHA-256 an audit record
 * vouches for. The same bytes come from the values as written and from the row as read back from H2 or
 * PostgreSQL, so a hash taken when the row was written can be compared with one taken later.
 *
 * <p>Encoding: first the row's kind as a text field, then each field in the order the caller declares
 * them (for a table: {@link Column} order, never the database's column order). Each field is one tag byte
 * followed by its value:
 * <ul>
 * <li>{@code 0}: null, of any type (no value bytes);</li>
 * <li>{@code 1} text: 4-byte big-endian length in bytes, then UTF-8 (no trimming, no case folding);</li>
 * <li>{@code 2} integer (any SQL integral type): 8-byte big-endian two's complement;</li>
 * <li>{@code 3} real (DOUBLE PRECISION): the 8 bytes of IEEE 754 binary64, big-endian, as
 * {@link Double#doubleToLongBits} gives them: the number exactly, never a decimal rendering, so halving a
 * value or changing its last bit changes the hash; all NaNs are one value, -0.0 differs from 0.0;</li>
 * <li>{@code 4} boolean: one byte, 0 or 1;</li>
 * <li>{@code 5} bytes (BYTEA, binary blobs): 4-byte big-endian length, then the bytes;</li>
 * <li>{@code 6} time (TIMESTAMP WITH TIME ZONE): 8-byte big-endian microseconds since 1970-01-01T00:00Z,
 * the precision both databases store.</li>
 * </ul>
 * Lengths make the encoding prefix-free, so no two different rows share it. Not thread-safe; one instance
 * per row.
 */
public final class CanonicalRow {

    /** How a column's value is encoded. */
    public enum Type {
        TEXT, INTEGER, REAL, BOOLEAN, BYTES, TIME
    }

    /** A column of a data table and its encoding. */
    public record Column(String name, Type type) {

        /** @throws IllegalArgumentException if the name is blank or the type missing */
        public Column {
            if (name == null || name.isBlank()) {
                throw new IllegalArgumentException("name: must not be blank");
            }
            if (type == null) {
                throw new IllegalArgumentException("type: must not be null (column " + name + ")");
            }
        }
    }

    private static final byte NULL = 0;

    private final java.security.MessageDigest sha = ChainHash.newSha256();
    private final byte[] buffer = new byte[9];

    private CanonicalRow(String kind) {
        text(kind);
    }

    /** Starts the encoding of one row of {@code kind}, e.g. "result". */
    public static CanonicalRow of(String kind) {
        if (kind == null || kind.isBlank()) {
            throw new IllegalArgumentException("kind: must not be blank");
        }
        return new CanonicalRow(kind);
    }

    /** SHA-256 (lower-case hex) of the current row of {@code rs}, read by column name in {@code columns}' order. */
    public static String sha256(String kind, List<Column> columns, ResultSet rs) throws SQLException {
        CanonicalRow row = of(kind);
        for (Column col : columns) {
            row.value(col, read(col, rs));
        }
        return row.sha256Hex();
    }

    /**
     * SHA-256 (lower-case hex) of a row from the values it is written with, {@code values.get(i)} being the
     * value of {@code columns.get(i)} (see {@link #value}): the hash {@link #sha256(String, List, ResultSet)}
     * gives once the row is stored, taken without reading it back.
     *
     * @throws IllegalArgumentException if the counts differ or a value is not of its column's type
     */
    public static String sha256(String kind, List<Column> columns, List<?> values) {
        if (values.size() != columns.size()) {
            throw new IllegalArgumentException("values: " + values.size() + " given for " + columns.size()
                    + " columns of " + kind);
        }
        CanonicalRow row = of(kind);
        for (int i = 0; i < columns.size(); i++) {
            row.value(columns.get(i), values.get(i));
        }
        return row.sha256Hex();
    }

    /** The value of a column of the current row, as {@link #value} takes it. */
    private static Object read(Column col, ResultSet rs) throws SQLException {
        Object v = switch (col.type()) {
            case TEXT -> rs.getString(col.name());
            case INTEGER -> rs.getLong(col.name());
            case REAL -> rs.getDouble(col.name());
            case BOOLEAN -> rs.getBoolean(col.name());
            case BYTES -> rs.getBytes(col.name());
            case TIME -> rs.getObject(col.name(), OffsetDateTime.class);
        };
        return rs.wasNull() ? null : v;
    }

    /**
     * Appends one field of a column's type, from its value as written to or read from the database: a
     * {@link String} for text, an integral {@link Number} for integer, a {@link Number} for real (its double
     * value), a {@link Boolean}, a {@code byte[]} for bytes, an {@link Instant} or {@link OffsetDateTime} for
     * time (whole microseconds: a value written must already be truncated to them, as both databases keep no
     * more); null for SQL NULL of any type. The one encoding of a row's values, whether before they are
     * written or read back.
     *
     * @throws IllegalArgumentException naming the column if the value is not of its type
     */
    public CanonicalRow value(Column column, Object value) {
        if (value == null) {
            return nul();
        }
        switch (column.type()) {
            case TEXT -> {
                if (value instanceof String s) {
                    return text(s);
                }
            }
            case INTEGER -> {
                if (value instanceof Long || value instanceof Integer || value instanceof Short
                        || value instanceof Byte) {
                    return integer(((Number) value).longValue());
                }
            }
            case REAL -> {
                if (value instanceof Number n) {
                    return real(n.doubleValue());
                }
            }
            case BOOLEAN -> {
                if (value instanceof Boolean b) {
                    return bool(b);
                }
            }
            case BYTES -> {
                if (value instanceof byte[] b) {
                    return bytes(b);
                }
            }
            case TIME -> {
                if (value instanceof Instant t) {
                    return time(ChainHash.micros(t));
                }
                if (value instanceof OffsetDateTime t) {
                    return time(ChainHash.micros(t.toInstant()));
                }
            }
        }
        throw new IllegalArgumentException("value of column " + column.name() + ": a " + value.getClass()
                .getSimpleName() + " is not a " + column.type() + " value");
    }

    public CanonicalRow text(String value) {
        return value == null ? nul() : bytes(1, value.getBytes(StandardCharsets.UTF_8));
    }

    public CanonicalRow integer(Long value) {
        return value == null ? nul() : eight(2, value);
    }

    public CanonicalRow real(Double value) {
        return value == null ? nul() : eight(3, Double.doubleToLongBits(value));
    }

    public CanonicalRow bool(Boolean value) {
        if (value == null) {
            return nul();
        }
        buffer[0] = 4;
        buffer[1] = (byte) (value ? 1 : 0);
        sha.update(buffer, 0, 2);
        return this;
    }

    public CanonicalRow bytes(byte[] value) {
        return value == null ? nul() : bytes(5, value);
    }

    /** @param micros microseconds since the epoch (UTC), or null */
    public CanonicalRow time(Long micros) {
        return micros == null ? nul() : eight(6, micros);
    }

    /** The SHA-256 of the fields so far, lower-case hex; ends this row. */
    public String sha256Hex() {
        return ChainHash.hex(sha.digest());
    }

    private CanonicalRow nul() {
        sha.update(NULL);
        return this;
    }

    private CanonicalRow bytes(int tag, byte[] value) {
        buffer[0] = (byte) tag;
        int n = value.length;
        buffer[1] = (byte) (n >>> 24);
        buffer[2] = (byte) (n >>> 16);
        buffer[3] = (byte) (n >>> 8);
        buffer[4] = (byte) n;
        sha.update(buffer, 0, 5);
        sha.update(value);
        return this;
    }

    private CanonicalRow eight(int tag, long v) {
        buffer[0] = (byte) tag;
        for (int i = 0; i < 8; i++) {
            buffer[1 + i] = (byte) (v >>> (56 - 8 * i));
        }
        sha.update(buffer, 0, 9);
        return this;
    }
}
