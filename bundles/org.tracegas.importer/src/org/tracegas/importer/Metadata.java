package org.tracegas.importer;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/** Shared checks of the imported value objects. */
final class Metadata {

    private Metadata() {
    }

    /** An unmodifiable copy that keeps the order of the file. */
    static Map<String, String> copy(Map<String, String> metadata) {
        if (metadata == null) {
            throw new IllegalArgumentException("metadata must not be null");
        }
        return Collections.unmodifiableMap(new LinkedHashMap<>(metadata));
    }

    static void checkLines(long firstLine, long lastLine) {
        if (firstLine < 1 || lastLine < firstLine) {
            throw new IllegalArgumentException(
                    "lines must satisfy 1 <= firstLine <= lastLine, were " + firstLine + " and " + lastLine);
        }
    }
}
