package org.tracegas.method;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

import org.tracegas.library.io.FileFormatException;

/**
 * The plan and method files of a campaign: UTF-8 text of {@code key = value} lines, a head before the first
 * block and blocks opened by a {@code [name]} line, '#' comment lines and empty lines skipped (the layout of the
 * library manifest). Every value is read through a {@link Section}, whose errors name the file, the line and the
 * key.
 */
public final class KeyValueFile {

    /** One key = value line. */
    private record Entry(String key, String value, int line) {
    }

    private final Path file;
    private final Section head;
    private final List<Section> blocks;

    private KeyValueFile(Path file, Section head, List<Section> blocks) {
        this.file = file;
        this.head = head;
        this.blocks = blocks;
    }

    /** The word a plan file writes for a constant: its name in lower case, '-' for '_'. */
    static String word(Enum<?> constant) {
        return constant.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    public static KeyValueFile read(Path file) throws IOException {
        return parse(Files.readString(file, StandardCharsets.UTF_8), file);
    }

    /** @param source named in errors */
    public static KeyValueFile parse(String text, Path source) throws FileFormatException {
        Section head = new Section(source, "", 0);
        List<Section> blocks = new ArrayList<>();
        Section current = head;
        List<String> lines = text.lines().toList();
        for (int i = 0; i < lines.size(); i++) {
            String t = lines.get(i).strip();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            if (t.startsWith("[") && t.endsWith("]")) {
                current = new Section(source, t.substring(1, t.length() - 1).strip().toLowerCase(Locale.ROOT), i + 1);
                blocks.add(current);
                continue;
            }
            int eq = t.indexOf('=');
            if (eq < 1) {
                throw new FileFormatException(source, i + 1, "", "expected 'key = value' or '[block]', found '" + t
                        + "'");
            }
            current.entries.add(new Entry(t.substring(0, eq).strip().toLowerCase(Locale.ROOT),
                    t.substring(eq + 1).strip(), i + 1));
        }
        return new KeyValueFile(source, head, blocks);
    }

    public Path file() {
        return file;
    }

    /** The lines before the first block. */
    public Section head() {
        return head;
    }

    /** The blocks of a name, in file order. */
    public List<Section> blocks(String name) {
        return blocks.stream().filter(b -> b.name.equals(name)).toList();
    }

    /** @throws FileFormatException naming the line of a block whose name is not among the known ones */
    public void allowBlocks(Set<String> names) throws FileFormatException {
        for (Section b : blocks) {
            if (!names.contains(b.name)) {
                throw new FileFormatException(file, b.line, "[" + b.name + "]", "unknown block; known blocks are "
                        + new TreeSet<>(names));
            }
        }
    }

    /** A path a value names, relative to the file's folder. */
    public Path resolve(String relative) {
        return file.toAbsolutePath().getParent().resolve(relative);
    }

    /** The key = value lines of the head or of one block. */
    public static final class Section {

        private final Path file;
        private final String name;
        private final int line;
        private final List<Entry> entries = new ArrayList<>();

        private Section(Path file, String name, int line) {
            this.file = file;
            this.name = name;
            this.line = line;
        }

        /** The line of the block's header, 0 for the head. */
        public int line() {
            return line;
        }

        /** @throws FileFormatException naming the line of a key that is not among the known ones */
        public Section allow(Set<String> keys) throws FileFormatException {
            for (Entry e : entries) {
                if (!keys.contains(e.key)) {
                    throw new FileFormatException(file, e.line, e.key, "unknown key" + where() + "; known keys are "
                            + new TreeSet<>(keys));
                }
            }
            return this;
        }

        public boolean has(String key) {
            return entries.stream().anyMatch(e -> e.key.equals(key));
        }

        /** The value of a key that must appear once. */
        public String text(String key) throws FileFormatException {
            Entry e = entry(key);
            if (e == null) {
                throw new FileFormatException(file, line, key, "missing" + where());
            }
            return e.value;
        }

        public String text(String key, String otherwise) throws FileFormatException {
            Entry e = entry(key);
            return e == null ? otherwise : e.value;
        }

        /** Every value of a key that may repeat, with the error helper of its line. */
        public List<Value> all(String key) {
            return entries.stream().filter(e -> e.key.equals(key)).map(e -> new Value(this, e.key, e.value, e.line))
                    .toList();
        }

        public double number(String key) throws FileFormatException {
            return value(key).number();
        }

        public double number(String key, double otherwise) throws FileFormatException {
            return has(key) ? number(key) : otherwise;
        }

        public int integer(String key, int otherwise) throws FileFormatException {
            return has(key) ? value(key).integer() : otherwise;
        }

        /** yes/no, true/false. */
        public boolean flag(String key, boolean otherwise) throws FileFormatException {
            if (!has(key)) {
                return otherwise;
            }
            String v = text(key).toLowerCase(Locale.ROOT);
            if (v.equals("yes") || v.equals("true")) {
                return true;
            }
            if (v.equals("no") || v.equals("false")) {
                return false;
            }
            throw error(key, "'" + text(key) + "' is neither yes nor no");
        }

        /** A constant of an enumeration, written as its name in any case with '-' for '_'. */
        public <E extends Enum<E>> E constant(String key, Class<E> type) throws FileFormatException {
            return value(key).constant(type);
        }

        public <E extends Enum<E>> E constant(String key, Class<E> type, E otherwise) throws FileFormatException {
            return has(key) ? constant(key, type) : otherwise;
        }

        public Value value(String key) throws FileFormatException {
            Entry e = entry(key);
            if (e == null) {
                throw new FileFormatException(file, line, key, "missing" + where());
            }
            return new Value(this, e.key, e.value, e.line);
        }

        /** An error about a key, on its line (or the block's, when the key is missing). */
        public FileFormatException error(String key, String reason) {
            Entry e = entries.stream().filter(x -> x.key.equals(key)).findFirst().orElse(null);
            return new FileFormatException(file, e == null ? line : e.line, key, reason);
        }

        private Entry entry(String key) throws FileFormatException {
            Entry found = null;
            for (Entry e : entries) {
                if (e.key.equals(key)) {
                    if (found != null) {
                        throw new FileFormatException(file, e.line, key, "repeats line " + found.line);
                    }
                    found = e;
                }
            }
            if (found != null && found.value.isEmpty()) {
                throw new FileFormatException(file, found.line, key, "value is empty");
            }
            return found;
        }

        private String where() {
            return name.isEmpty() ? "" : " in the [" + name + "] block of line " + line;
        }
    }

    /** One value with its line, converted on request; errors name file, line and key. */
    public record Value(Section section, String key, String text, int line) {

        public FileFormatException error(String reason) {
            return new FileFormatException(section.file, line, key, reason);
        }

        public double number() throws FileFormatException {
            return parseNumber(text);
        }

        private double parseNumber(String t) throws FileFormatException {
            try {
                double v = Double.parseDouble(t);
                if (Double.isFinite(v)) {
                    return v;
                }
            } catch (NumberFormatException e) {
                // named below with the line
            }
            throw error("'" + t + "' is not a finite number");
        }

        public int integer() throws FileFormatException {
            try {
                return Integer.parseInt(text);
            } catch (NumberFormatException e) {
                throw error("'" + text + "' is not an integer");
            }
        }

        /** Numbers separated by commas or white space. */
        public List<Double> numbers() throws FileFormatException {
            List<Double> all = new ArrayList<>();
            for (String t : text.split("[,\\s]+")) {
                all.add(parseNumber(t));
            }
            return all;
        }

        /** Words separated by commas or white space. */
        public List<String> words() {
            return List.of(text.split("[,\\s]+"));
        }

        /** "low..high" in cm-1. */
        public double[] range() throws FileFormatException {
            return range(text);
        }

        public double[] range(String t) throws FileFormatException {
            String[] parts = t.split("\\.\\.", -1);
            if (parts.length != 2) {
                throw error("'" + t + "' is not a range low..high");
            }
            double low = parseNumber(parts[0].strip());
            // an open upper end is written as Infinity (a transform that keeps all up to the Nyquist wavenumber)
            double high = parts[1].strip().equals("Infinity") ? Double.POSITIVE_INFINITY
                    : parseNumber(parts[1].strip());
            if (!(high > low)) {
                throw error("range '" + t + "' must rise");
            }
            return new double[] { low, high };
        }

        /** A duration such as 30 min, 24 h or 1 d. */
        public Duration duration() throws FileFormatException {
            String[] parts = text.split("\\s+");
            if (parts.length == 2) {
                try {
                    long n = Long.parseLong(parts[0]);
                    switch (parts[1]) {
                        case "min":
                            return Duration.ofMinutes(n);
                        case "h":
                            return Duration.ofHours(n);
                        case "d":
                            return Duration.ofDays(n);
                        default:
                            break;
                    }
                } catch (NumberFormatException e) {
                    // named below
                }
            }
            throw error("'" + text + "' is not a duration such as '30 min', '24 h' or '1 d'");
        }

        public <E extends Enum<E>> E constant(Class<E> type) throws FileFormatException {
            String wanted = text.strip().replace('-', '_').toUpperCase(Locale.ROOT);
            for (E c : type.getEnumConstants()) {
                if (c.name().equals(wanted)) {
                    return c;
                }
            }
            List<String> known = new ArrayList<>();
            for (E c : type.getEnumConstants()) {
                known.add(word(c));
            }
            throw error("'" + text + "' is none of " + known);
        }
    }
}
