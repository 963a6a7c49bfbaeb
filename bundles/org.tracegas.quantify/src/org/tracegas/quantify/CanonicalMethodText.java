package org.tracegas.quantify;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Writes the canonical text of a method and reads it back. Numbers are written with
 * {@link Double#toHexString(double)}: exact, and unlike the decimal form unchanged across Java versions, so that a
 * hash stays valid for years and a method read back from its text is the very same method.
 */
final class CanonicalMethodText {

    private static final String FORMAT = "tracegas-quantification-method 1";
    private static final int VALUES_PER_LINE = 8;

    private CanonicalMethodText() {
    }

    static String write(QuantificationMethod m) {
        StringBuilder s = new StringBuilder(1 << 16);
        s.append(FORMAT).append('\n');
        s.append("name ").append(quote(m.name())).append('\n');
        s.append("path_length_m ").append(num(m.pathLengthMetres())).append('\n');
        s.append("reporting_unit ").append(m.reportingUnit().name()).append('\n');
        s.append("nonlinearity ").append(m.nonlinearity()).append('\n');
        s.append("shift_term ").append(m.shiftTerm().name()).append('\n');
        s.append("max_absorbance ").append(num(m.maxAbsorbance())).append('\n');
        s.append("tolerance ").append(num(m.tolerance())).append('\n');
        s.append("max_iterations ").append(m.maxIterations()).append('\n');
        if (!m.algorithm().equals(FitAlgorithm.CLASSICAL_LEAST_SQUARES)) {
            // written only when not the default, so that the texts and hashes of earlier methods stay as they were;
            // in the upper-case form the first stored texts gave the built-in algorithms (CURVE_OF_GROWTH)
            s.append("algorithm ").append(storedName(m.algorithm())).append('\n');
        }
        for (AlgorithmSetting setting : m.algorithmSettings()) {
            s.append("setting ").append(setting.key()).append(' ').append(quote(setting.value())).append('\n');
        }
        for (Analyte a : m.analytes()) {
            s.append("analyte ").append(a.compound()).append('\n');
            for (String i : a.interferents()) {
                s.append(" interferent ").append(i).append('\n');
            }
            for (AnalysisRegion r : a.regions()) {
                s.append(" region baseline_order ").append(r.baselineOrder()).append(" residual_rms_limit ")
                        .append(num(r.residualRmsLimit())).append('\n');
                for (WavenumberWindow w : r.windows()) {
                    s.append("  window ").append(num(w.low())).append(' ').append(num(w.high())).append('\n');
                }
            }
        }
        for (ReferenceSpectrum r : m.references()) {
            s.append("reference ").append(r.compound()).append(" ppm_m ").append(num(r.ppmMetres())).append('\n');
            spectrum(s, r.absorbance());
        }
        m.weights().ifPresent(w -> {
            s.append("weights\n");
            spectrum(s, w);
        });
        s.append("end\n");
        return s.toString();
    }

    /** An algorithm's name as the text holds it: upper case, '_' for '-' (CURVE_OF_GROWTH). */
    static String storedName(FitAlgorithm algorithm) {
        return algorithm.name().toUpperCase(Locale.ROOT).replace('-', '_');
    }

    private static void spectrum(StringBuilder s, Spectrum spectrum) {
        SpectralAxis axis = spectrum.axis();
        s.append(" axis ").append(axis.unit().name()).append(' ').append(axis.size());
        if (axis.isUniform()) {
            s.append(" uniform ").append(num(axis.first())).append(' ').append(num(axis.step())).append('\n');
        } else {
            s.append(" explicit\n");
            values(s, axis.toArray());
        }
        s.append(" ordinate ").append(spectrum.ordinate().name()).append('\n');
        values(s, spectrum.toArray());
    }

    private static void values(StringBuilder s, double[] v) {
        for (int i = 0; i < v.length; i++) {
            s.append(i % VALUES_PER_LINE == 0 ? "  " : " ").append(num(v[i]));
            if (i % VALUES_PER_LINE == VALUES_PER_LINE - 1 || i == v.length - 1) {
                s.append('\n');
            }
        }
    }

    private static String num(double v) {
        return Double.toHexString(v);
    }

    private static String quote(String text) {
        return '"' + text.replace("\\", "\\\\").replace("\"", "\\\"") + '"';
    }

    /**
     * Rebuilds the method a canonical text describes.
     *
     * @throws IllegalArgumentException whose message names the line and the field at fault
     */
    static QuantificationMethod read(String text, FitAlgorithmRegistry algorithms) {
        if (algorithms == null) {
            throw new IllegalArgumentException("algorithms must not be null");
        }
        return new Reader(text, algorithms).method();
    }

    /** Reads the lines of a canonical text in order; every error names the line and the field. */
    private static final class Reader {

        private final String[] lines;
        private final FitAlgorithmRegistry algorithms;
        private int next;

        Reader(String text, FitAlgorithmRegistry algorithms) {
            this.algorithms = algorithms;
            if (text == null) {
                throw new IllegalArgumentException("method text must not be null");
            }
            this.lines = text.split("\n"); // trailing empty lines dropped
        }

        QuantificationMethod method() {
            String[] format = expect("format");
            if (!String.join(" ", format).equals(FORMAT)) {
                throw error("format", "expected '" + FORMAT + "', found '" + String.join(" ", format) + "'");
            }
            expect("name");
            QuantificationMethod.Builder b = QuantificationMethod.builder(unquote(lines[next - 1].substring(5)));
            b.pathLengthMetres(number(single("path_length_m"), "path_length_m"));
            b.reportingUnit(constant(ReportingUnit.class, single("reporting_unit"), "reporting_unit"));
            String nonlinear = single("nonlinearity");
            if (!nonlinear.equals("true") && !nonlinear.equals("false")) {
                throw error("nonlinearity", "expected true or false, found '" + nonlinear + "'");
            }
            b.nonlinearity(Boolean.parseBoolean(nonlinear));
            b.shiftTerm(constant(ShiftTerm.class, single("shift_term"), "shift_term"));
            b.maxAbsorbance(number(single("max_absorbance"), "max_absorbance"));
            b.tolerance(number(single("tolerance"), "tolerance"));
            b.maxIterations(integer(single("max_iterations"), "max_iterations"));
            if (peek("algorithm")) {
                String stored = single("algorithm");
                try {
                    b.algorithm(algorithms.get(stored.toLowerCase(Locale.ROOT).replace('_', '-')));
                } catch (IllegalArgumentException e) {
                    throw error("algorithm", e.getMessage());
                }
            }
            while (peek("setting")) {
                int line = next + 1;
                String[] f = expect("setting");
                String quoted = String.join(" ", java.util.Arrays.copyOfRange(f, Math.min(2, f.length), f.length));
                if (f.length < 3 || quoted.length() < 2 || !quoted.startsWith("\"") || !quoted.endsWith("\"")) {
                    throw error(line, "setting", "expected 'setting <key> \"<value>\"'");
                }
                try {
                    b.algorithmSetting(new AlgorithmSetting(f[1], unquote(quoted)));
                } catch (IllegalArgumentException e) {
                    throw error(line, "setting", e.getMessage());
                }
            }
            while (peek("analyte")) {
                b.analyte(analyte());
            }
            while (peek("reference")) {
                int line = next + 1;
                String[] f = expect("reference");
                if (f.length != 4 || !f[2].equals("ppm_m")) {
                    throw error(line, "reference", "expected 'reference <compound> ppm_m <number>'");
                }
                Spectrum absorbance = spectrum("reference " + f[1]);
                try {
                    b.reference(new ReferenceSpectrum(f[1], absorbance, number(f[3], line, "ppm_m")));
                } catch (IllegalArgumentException e) {
                    throw error(line, "reference", e.getMessage());
                }
            }
            if (peek("weights")) {
                expect("weights");
                b.weights(spectrum("weights"));
            }
            expect("end");
            if (next < lines.length) {
                throw error(next + 1, "", "text after 'end'");
            }
            try {
                return b.build();
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("method text: " + e.getMessage(), e);
            }
        }

        private Analyte analyte() {
            int line = next + 1;
            String compound = single("analyte");
            List<String> interferents = new ArrayList<>();
            while (peek("interferent")) {
                interferents.add(single("interferent"));
            }
            List<AnalysisRegion> regions = new ArrayList<>();
            while (peek("region")) {
                int regionLine = next + 1;
                String[] f = expect("region");
                if (f.length != 5 || !f[1].equals("baseline_order") || !f[3].equals("residual_rms_limit")) {
                    throw error(regionLine, "region",
                            "expected 'region baseline_order <n> residual_rms_limit <number>'");
                }
                List<WavenumberWindow> windows = new ArrayList<>();
                while (peek("window")) {
                    int windowLine = next + 1;
                    String[] w = expect("window");
                    if (w.length != 3) {
                        throw error(windowLine, "window", "expected 'window <low> <high>'");
                    }
                    try {
                        windows.add(new WavenumberWindow(number(w[1], windowLine, "window"),
                                number(w[2], windowLine, "window")));
                    } catch (IllegalArgumentException e) {
                        throw error(windowLine, "window", e.getMessage());
                    }
                }
                try {
                    regions.add(new AnalysisRegion(windows, integer(f[2], regionLine, "baseline_order"),
                            number(f[4], regionLine, "residual_rms_limit")));
                } catch (IllegalArgumentException e) {
                    throw e.getMessage().startsWith("line ") ? e : error(regionLine, "region", e.getMessage());
                }
            }
            try {
                return new Analyte(compound, interferents, regions);
            } catch (IllegalArgumentException e) {
                throw error(line, "analyte", e.getMessage());
            }
        }

        private Spectrum spectrum(String what) {
            int axisLine = next + 1;
            String[] a = expect("axis");
            AxisUnit unit = constant(AxisUnit.class, a.length > 1 ? a[1] : "", "axis");
            int size = a.length > 2 ? integer(a[2], axisLine, "axis") : 0;
            SpectralAxis axis;
            try {
                if (a.length == 6 && a[3].equals("uniform")) {
                    axis = SpectralAxis.uniform(unit, number(a[4], axisLine, "axis"), number(a[5], axisLine, "axis"),
                            size);
                } else if (a.length == 4 && a[3].equals("explicit")) {
                    axis = SpectralAxis.of(unit, values(size, "axis"));
                } else {
                    throw error(axisLine, "axis", "expected 'axis <unit> <size> uniform <first> <step>' or "
                            + "'axis <unit> <size> explicit'");
                }
            } catch (IllegalArgumentException e) {
                throw e.getMessage().startsWith("line ") ? e : error(axisLine, "axis", e.getMessage());
            }
            int ordinateLine = next + 1;
            Ordinate ordinate = constant(Ordinate.class, single("ordinate"), "ordinate");
            double[] values = values(size, "values of " + what);
            try {
                return new Spectrum(axis, values, ordinate);
            } catch (IllegalArgumentException e) {
                throw error(ordinateLine, "ordinate", e.getMessage());
            }
        }

        private double[] values(int size, String field) {
            double[] v = new double[size];
            int filled = 0;
            while (filled < size) {
                if (next >= lines.length || !lines[next].startsWith("  ") || lines[next].startsWith("   ")) {
                    throw error(next + 1, field, "expected " + size + " values, found " + filled);
                }
                int line = ++next;
                String[] words = lines[line - 1].strip().split(" ");
                // the writer puts eight values on a line, so a line of another count is damaged right there
                int expected = Math.min(VALUES_PER_LINE, size - filled);
                if (words.length != expected) {
                    throw error(line, field, "expected " + expected + " values on this line, found " + words.length);
                }
                for (String t : words) {
                    v[filled++] = number(t, line, field);
                }
            }
            return v;
        }

        /** Whether the next line is of a kind (its first word), whatever its indentation. */
        private boolean peek(String keyword) {
            if (next >= lines.length) {
                return false;
            }
            String t = lines[next].strip();
            return t.equals(keyword) || t.startsWith(keyword + " ");
        }

        /** The words of the next line, which must be of the given kind. */
        private String[] expect(String keyword) {
            if (next >= lines.length) {
                throw error(next + 1, keyword, "the text ends where '" + keyword + "' is expected");
            }
            String t = lines[next].strip();
            String[] words = t.split(" ");
            if (!keyword.equals("format") && !words[0].equals(keyword)) {
                throw error(next + 1, keyword, "expected '" + keyword + "', found '" + t + "'");
            }
            next++;
            return words;
        }

        /** The one value of a line "keyword value". */
        private String single(String keyword) {
            String[] words = expect(keyword);
            if (words.length != 2) {
                throw error(next, keyword, "expected '" + keyword + " <value>'");
            }
            return words[1];
        }

        private <E extends Enum<E>> E constant(Class<E> type, String text, String field) {
            try {
                return Enum.valueOf(type, text);
            } catch (IllegalArgumentException e) {
                throw error(field, "'" + text + "' is none of " + java.util.Arrays.toString(type.getEnumConstants()));
            }
        }

        private double number(String text, String field) {
            return number(text, next, field);
        }

        private double number(String text, int line, String field) {
            try {
                return Double.parseDouble(text);
            } catch (NumberFormatException e) {
                throw error(line, field, "'" + text + "' is not a number");
            }
        }

        private int integer(String text, String field) {
            return integer(text, next, field);
        }

        private int integer(String text, int line, String field) {
            try {
                return Integer.parseInt(text);
            } catch (NumberFormatException e) {
                throw error(line, field, "'" + text + "' is not an integer");
            }
        }

        private String unquote(String text) {
            if (text.length() < 2 || text.charAt(0) != '"' || text.charAt(text.length() - 1) != '"') {
                throw error("name", "expected a quoted name, found " + text);
            }
            StringBuilder s = new StringBuilder();
            for (int i = 1; i < text.length() - 1; i++) {
                char c = text.charAt(i);
                if (c == '\\' && i + 1 < text.length() - 1) {
                    c = text.charAt(++i);
                }
                s.append(c);
            }
            return s.toString();
        }

        /** An error on the line just read. */
        private IllegalArgumentException error(String field, String reason) {
            return error(next, field, reason);
        }

        private static IllegalArgumentException error(int line, String field, String reason) {
            return new IllegalArgumentException("line " + line + (field.isEmpty() ? "" : ", field '" + field + "'")
                    + ": " + reason);
        }
    }
}
