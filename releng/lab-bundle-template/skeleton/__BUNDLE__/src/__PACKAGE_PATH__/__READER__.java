package @PACKAGE@;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportReader;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.Recognition;

/**
 * Reads the files of @NAME@. Recognition is in place: a file whose first line starts with {@link #HEADER} is
 * this reader's. Reading is yours to write: return every record of the file with its metadata and the lines
 * it came from, or throw an {@link ImportException} naming file, line and field; never return part of a file.
 * The workbench's example reader (org.tracegas.importer.example) shows a complete one.
 */
public final class @READER@ implements ImportReader {

    static final String HEADER = "@HEADER@";

    @Override
    public Recognition recognise(byte[] head, String fileName) {
        String text = new String(head, StandardCharsets.ISO_8859_1);
        if (text.startsWith(HEADER)) {
            return new Recognition(0.95, "first line is the @NAME@ header");
        }
        return Recognition.no("first line is not the @NAME@ header");
    }

    @Override
    public ImportedData read(Path file, ImportOptions options) throws ImportException {
        throw new ImportException(file.toString(), 1, "format", "reading @NAME@ files is not written yet");
    }
}
