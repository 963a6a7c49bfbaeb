package org.tracegas.report.campaign;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes a file whole or not at all: to a temporary sibling first, then moved into place. */
public final class WholeFile {

    /** What goes into the file. */
    public interface Body {
        void write(OutputStream out) throws IOException;
    }

    private WholeFile() {
    }

    public static void write(Path target, Body body) throws IOException {
        Path partial = target.resolveSibling(target.getFileName() + ".part");
        try (OutputStream out = Files.newOutputStream(partial)) {
            body.write(out);
        }
        Files.move(partial, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }
}
