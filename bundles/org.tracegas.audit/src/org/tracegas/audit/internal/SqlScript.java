package org.tracegas.audit.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Statements of a DDL script stored beside this class, separated by lines holding only "/". */
public final class SqlScript {

    private SqlScript() {
    }

    /** @throws UncheckedIOException when the resource is missing from the bundle (names it) */
    public static List<String> statements(String resource) {
        try (InputStream in = SqlScript.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new UncheckedIOException(new IOException(resource + ": missing beside " + SqlScript.class.getName()));
            }
            List<String> statements = new ArrayList<>();
            StringBuilder current = new StringBuilder();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.strip().equals("/")) {
                    statements.add(current.toString().strip());
                    current.setLength(0);
                } else if (!line.startsWith("--")) {
                    current.append(line).append('\n');
                }
            }
            if (!current.toString().isBlank()) {
                statements.add(current.toString().strip());
            }
            return List.copyOf(statements);
        } catch (IOException e) {
            throw new UncheckedIOException(resource + ": cannot be read", e);
        }
    }
}
