package org.tracegas.importer;

/**
 * A file could not be imported. The message always names the file, the line (or record) and the field
 * that is wrong, and why. A reader that throws has imported nothing.
 */
public final class ImportException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String source;
    private final long line;
    private final String field;
    private final String reason;

    /**
     * @param source name of the file (or stream) being read
     * @param line   1-based line (text formats) or record number (binary formats); 0 when the whole file is meant
     * @param field  the field, label or column at fault
     * @param reason why the content is rejected
     */
    public ImportException(String source, long line, String field, String reason) {
        this(source, line, field, reason, null);
    }

    public ImportException(String source, long line, String field, String reason, Throwable cause) {
        super(format(source, line, field, reason), cause);
        this.source = source;
        this.line = line;
        this.field = field;
        this.reason = reason;
    }

    private static String format(String source, long line, String field, String reason) {
        return source + ", line " + line + ", field " + field + ": " + reason;
    }

    public String source() {
        return source;
    }

    /** 1-based line or record number; 0 when the error concerns the whole file. */
    public long line() {
        return line;
    }

    public String field() {
        return field;
    }

    public String reason() {
        return reason;
    }
}
