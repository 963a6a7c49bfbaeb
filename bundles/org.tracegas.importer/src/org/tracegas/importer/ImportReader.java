package org.tracegas.importer;

import java.nio.file.Path;

/**
 * Reads the files of one format or instrument. Contributed through the extension point
 * {@code org.tracegas.importer.readers} or registered with {@link ReaderRegistry#register}. Implementations
 * must be stateless (one instance serves concurrent imports) and have a public no-argument constructor when
 * contributed through the extension point.
 */
public interface ImportReader {

    /** Bytes of a file's start given to {@link #recognise}. */
    int HEAD_BYTES = 4096;

    /**
     * Judges from content, not only from the name, whether this reader can read a file.
     *
     * @param head     the first {@link #HEAD_BYTES} bytes of the file (fewer for a short file)
     * @param fileName the file name without directories; may be used as a weak hint
     */
    Recognition recognise(byte[] head, String fileName);

    /**
     * Reads a whole file: returns every record, or throws and returns nothing.
     *
     * @throws ImportException naming file, line and field when the content is malformed, too large for this
     *                         format, or cannot be read
     */
    ImportedData read(Path file, ImportOptions options) throws ImportException;
}
