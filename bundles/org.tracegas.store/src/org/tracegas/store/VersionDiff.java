package org.tracegas.store;

import java.util.Collections;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Field-by-field comparison of two versions whose canonical content is {@code key=value} lines.
 *
 * @param added   keys only in the newer version, with their values
 * @param removed keys only in the older version, with their values
 * @param changed keys in both with different values: key to {older, newer}
 */
public record VersionDiff(String olderId, String newerId, SortedMap<String, String> added,
        SortedMap<String, String> removed, SortedMap<String, Change> changed) {

    /** The value of a key in the older and the newer version. */
    public record Change(String older, String newer) {
    }

    public VersionDiff {
        added = Collections.unmodifiableSortedMap(new TreeMap<>(added));
        removed = Collections.unmodifiableSortedMap(new TreeMap<>(removed));
        changed = Collections.unmodifiableSortedMap(new TreeMap<>(changed));
    }

    /** True when both versions hold the same fields with the same values. */
    public boolean isEmpty() {
        return added.isEmpty() && removed.isEmpty() && changed.isEmpty();
    }

    /**
     * Compares two contents line by line.
     *
     * @throws IllegalArgumentException naming the version and line that is not {@code key=value}, or a
     *                                  key that occurs twice
     */
    public static VersionDiff of(String olderId, String olderContent, String newerId, String newerContent) {
        Map<String, String> older = fields(olderId, olderContent);
        Map<String, String> newer = fields(newerId, newerContent);
        SortedMap<String, String> added = new TreeMap<>();
        SortedMap<String, String> removed = new TreeMap<>();
        SortedMap<String, Change> changed = new TreeMap<>();
        for (Map.Entry<String, String> e : newer.entrySet()) {
            String before = older.get(e.getKey());
            if (before == null) {
                added.put(e.getKey(), e.getValue());
            } else if (!before.equals(e.getValue())) {
                changed.put(e.getKey(), new Change(before, e.getValue()));
            }
        }
        for (Map.Entry<String, String> e : older.entrySet()) {
            if (!newer.containsKey(e.getKey())) {
                removed.put(e.getKey(), e.getValue());
            }
        }
        return new VersionDiff(olderId, newerId, added, removed, changed);
    }

    private static Map<String, String> fields(String versionId, String content) {
        Map<String, String> fields = new TreeMap<>();
        String[] lines = content.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (line.isEmpty()) {
                continue;
            }
            int eq = line.indexOf('=');
            if (eq <= 0) {
                throw new IllegalArgumentException("version " + versionId + ", line " + (i + 1)
                        + ": not a key=value line: '" + line + "'");
            }
            if (fields.put(line.substring(0, eq), line.substring(eq + 1)) != null) {
                throw new IllegalArgumentException("version " + versionId + ", line " + (i + 1) + ": key '"
                        + line.substring(0, eq) + "' occurs twice");
            }
        }
        return fields;
    }
}
