package org.tracegas.library.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tracegas.library.synthesis.PartitionFunction;
import org.tracegas.library.synthesis.TabulatedPartitionFunction;

/**
 * A table of the partition function Q against temperature as text: lines starting with '#' are comments (the
 * first one says where the values come from), every other non-blank line holds a temperature in K and Q,
 * separated by blanks, the temperatures rising.
 */
public final class PartitionTableText {

    private PartitionTableText() {
    }

    /**
     * Reads a table; its description names the file and its first comment.
     *
     * @throws FileFormatException naming the file, line and column of the first error
     */
    public static TabulatedPartitionFunction read(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        List<double[]> rows = new ArrayList<>();
        String source = null;
        for (int i = 0; i < lines.size(); i++) {
            String t = lines.get(i).strip();
            if (t.startsWith("#")) {
                source = source == null ? t.substring(1).strip() : source;
                continue;
            }
            if (t.isEmpty()) {
                continue;
            }
            String[] f = t.split("\\s+");
            if (f.length != 2) {
                throw new FileFormatException(file, i + 1, "", "expected a temperature and Q, found " + f.length
                        + " fields");
            }
            double temperature = NumberField.parse(file, i + 1, "temperature", f[0]);
            double q = NumberField.parse(file, i + 1, "Q", f[1]);
            if (!(q > 0)) {
                throw new FileFormatException(file, i + 1, "Q", "must be positive, was " + f[1]);
            }
            if (!rows.isEmpty() && !(temperature > rows.get(rows.size() - 1)[0])) {
                throw new FileFormatException(file, i + 1, "temperature", "must rise, " + f[0] + " K follows "
                        + rows.get(rows.size() - 1)[0] + " K");
            }
            rows.add(new double[] {temperature, q});
        }
        if (rows.size() < 2) {
            throw new FileFormatException(file, 0, "", "a partition table needs at least 2 rows, found "
                    + rows.size());
        }
        double[] t = new double[rows.size()];
        double[] q = new double[rows.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = rows.get(i)[0];
            q[i] = rows.get(i)[1];
        }
        return new TabulatedPartitionFunction(t, q,
                "Q(T) table " + file.getFileName() + (source == null ? "" : " (" + source + ")"));
    }

    /**
     * The text of a table of Q from a partition function at from, from + step, ... up to to (K).
     *
     * @throws IllegalArgumentException if the range is empty or the step not positive
     */
    public static String of(PartitionFunction q, double from, double to, double step) {
        if (!(step > 0 && from > 0 && to > from)) {
            throw new IllegalArgumentException("need 0 < from < to and a positive step, were " + from + ", " + to
                    + ", " + step);
        }
        StringBuilder s = new StringBuilder("# ").append(q.description()).append("\n# temperature/K Q\n");
        int n = (int) Math.floor((to - from) / step + 1e-9);
        for (int i = 0; i <= n; i++) {
            double t = from + i * step;
            s.append(String.format(Locale.ROOT, "%s %.8g\n", stripped(t), q.value(t)));
        }
        return s.toString();
    }

    private static String stripped(double t) {
        return t == Math.rint(t) ? Long.toString((long) t) : Double.toString(t);
    }
}
