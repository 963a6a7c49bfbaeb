package org.tracegas.importer.internal;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;

/** Reading of whole-file formats, with the size limit that keeps a huge file out of memory. */
public final class WholeFile {

    private WholeFile() {
    }

    /** The file's text; UTF-8 when valid, otherwise ISO-8859-1 (older instrument exports). */
    public static String readText(Path file, ImportOptions options) throws ImportException {
        String name = String.valueOf(file);
        long size;
        try {
            size = Files.size(file);
        } catch (IOException e) {
            throw new ImportException(name, 0, "file", "cannot be read: " + e.getMessage(), e);
        }
        if (size > options.maxWholeFileBytes()) {
            throw new ImportException(name, 0, "file size", size + " bytes exceed the limit of "
                    + options.maxWholeFileBytes() + " bytes for this whole-file format");
        }
        if (size == 0) {
            throw new ImportException(name, 0, "file", "is empty");
        }
        try {
            return decode(Files.readAllBytes(file));
        } catch (IOException e) {
            throw new ImportException(name, 0, "file", "cannot be read: " + e.getMessage(), e);
        }
    }

    public static String decode(byte[] bytes) {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            return new String(bytes, StandardCharsets.ISO_8859_1);
        }
    }

    /** The head decoded as text for recognition (a cut multi-byte character at the end does no harm). */
    public static String headText(byte[] head) {
        return new String(head, StandardCharsets.ISO_8859_1);
    }
}
