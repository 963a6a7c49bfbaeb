package org.tracegas.library.io;

import java.io.IOException;
import java.nio.file.Path;

/** A file that does not follow its format; the message names the file, the line and the field. */
public class FileFormatException extends IOException {

    private static final long serialVersionUID = 1L;

    private final transient Path file;
    private final int line;
    private final String field;

    /**
     * @param file   the file that is wrong
     * @param line   1-based line number, or 0 when the problem is not on one line
     * @param field  the field or column that is wrong, or an empty text
     * @param reason what is wrong
     */
    public FileFormatException(Path file, int line, String field, String reason) {
        super(file + (line > 0 ? ", line " + line : "") + (field.isEmpty() ? "" : ", field '" + field + "'")
                + ": " + reason);
        this.file = file;
        this.line = line;
        this.field = field;
    }

    public Path file() {
        return file;
    }

    public int line() {
        return line;
    }

    public String field() {
        return field;
    }
}
