package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.runner.NearestName;
import org.tracegas.runner.UsageException;

/** The "--name value" options of a command line, checked against the names a command accepts. */
public final class Options {

    private final Map<String, String> values;

    private Options(Map<String, String> values) {
        this.values = values;
    }

    public static Options parse(List<String> arguments, List<String> accepted) throws UsageException {
        Map<String, String> values = new HashMap<>();
        for (int i = 0; i < arguments.size(); i++) {
            String name = arguments.get(i);
            if (!accepted.contains(name)) {
                throw new UsageException("unknown option '" + name + "'"
                        + NearestName.of(name, accepted).map(n -> "; did you mean " + n + "?").orElse("")
                        + " Accepted: " + String.join(", ", accepted));
            }
            if (i + 1 >= arguments.size()) {
                throw new UsageException("option " + name + " needs a value");
            }
            values.put(name, arguments.get(++i));
        }
        return new Options(values);
    }

    /**
     * Takes every value of an option that may repeat out of a command line.
     *
     * @param rest receives the other arguments, in order
     */
    static List<Path> repeated(List<String> arguments, String name, List<String> rest) throws UsageException {
        return repeatedText(arguments, name, rest).stream().map(v -> Path.of(v).toAbsolutePath()).toList();
    }

    /** As {@link #repeated}, the values as given. */
    static List<String> repeatedText(List<String> arguments, String name, List<String> rest) throws UsageException {
        List<String> values = new java.util.ArrayList<>();
        for (int i = 0; i < arguments.size(); i++) {
            if (arguments.get(i).equals(name)) {
                if (i + 1 >= arguments.size()) {
                    throw new UsageException("option " + name + " needs a value");
                }
                values.add(arguments.get(++i));
            } else {
                rest.add(arguments.get(i));
            }
        }
        return values;
    }

    boolean has(String name) {
        return values.containsKey(name);
    }

    String text(String name) throws UsageException {
        String v = values.get(name);
        if (v == null || v.isBlank()) {
            throw new UsageException("option " + name + " is required");
        }
        return v;
    }

    /** @throws UsageException naming the option if its value is not a whole number of at least 1 */
    int positiveInteger(String name) throws UsageException {
        String v = text(name);
        try {
            int n = Integer.parseInt(v.strip());
            if (n >= 1) {
                return n;
            }
        } catch (NumberFormatException e) {
            // named below
        }
        throw new UsageException("option " + name + " needs a whole number of at least 1, was '" + v + "'");
    }

    /**
     * A duration given in seconds, decimals allowed (e.g. 0.5), or the default when the option is absent.
     *
     * @throws UsageException naming the option if its value is not a positive number
     */
    Duration seconds(String name, Duration byDefault) throws UsageException {
        if (!has(name)) {
            return byDefault;
        }
        String v = text(name);
        try {
            double s = Double.parseDouble(v.strip());
            if (s >= 0.001 && s <= 86_400) {
                return Duration.ofMillis(Math.round(s * 1000));
            }
        } catch (NumberFormatException e) {
            // named below
        }
        throw new UsageException("option " + name + " needs a number of seconds from 0.001 to 86400, was '" + v
                + "'");
    }

    public Path path(String name) throws UsageException {
        return Path.of(text(name)).toAbsolutePath();
    }
}
