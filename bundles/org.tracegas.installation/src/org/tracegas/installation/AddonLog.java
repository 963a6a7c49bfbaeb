package org.tracegas.installation;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the log that {@code tracegas-addons} appends to ({@value #FILE} in the installation's p2 folder): one
 * line per completed change, tab-separated: time (ISO-8601 UTC), user, command, feature, repository.
 */
public final class AddonLog {

    /** The log's file name in the installation's {@code p2} folder. */
    public static final String FILE = "tracegas-addons.log";
    private static final int FIELDS = 5;

    private AddonLog() {
    }

    /**
     * @return the changes in the order logged; empty when the file does not exist
     * @throws IOException naming file, line and field when a line is malformed or the file cannot be read
     */
    public static List<AddonChange> read(Path file) throws IOException {
        if (!Files.exists(file)) {
            return List.of();
        }
        List<AddonChange> changes = new ArrayList<>();
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.isBlank()) {
                continue;
            }
            String[] f = line.split("\t", -1);
            if (f.length != FIELDS) {
                throw new IOException(file + ", line " + (i + 1) + ": expected " + FIELDS
                        + " tab-separated fields (time, user, command, feature, repository), found " + f.length);
            }
            Instant time;
            try {
                time = Instant.parse(f[0]);
            } catch (DateTimeParseException e) {
                throw new IOException(file + ", line " + (i + 1) + ", field time: not an ISO-8601 UTC time: " + f[0], e);
            }
            try {
                changes.add(new AddonChange(time, f[1], f[2], f[3], f[4]));
            } catch (IllegalArgumentException e) {
                throw new IOException(file + ", line " + (i + 1) + ", field " + e.getMessage(), e);
            }
        }
        return List.copyOf(changes);
    }

    static void requireText(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + ": must not be blank");
        }
    }
}
