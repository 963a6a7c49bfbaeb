package org.tracegas.importer.jcamp.internal;

import java.util.Arrays;
import java.util.Locale;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.internal.Numbers;

/**
 * Decodes one line of an ##XYDATA=(X++(Y..Y)) table written in the ASCII squeezed difference form (ASDF) or
 * in AFFN/PAC. Rules (IUPAC JCAMP-DX 4.24, McDonald & Wilks, Appl. Spectrosc. 42, 151 (1988); from memory):
 * <ul>
 * <li>AFFN: decimal numbers separated by blanks or commas; PAC: a '+' or '-' also starts a new number;</li>
 * <li>SQZ: the sign and first digit of a number become one letter, '@'=0, 'A'..'I'=+1..+9,
 * 'a'..'i'=-1..-9;</li>
 * <li>DIF: the same letters for differences to the previous ordinate, '%'=0, 'J'..'R'=+1..+9,
 * 'j'..'r'=-1..-9;</li>
 * <li>DUP: 'S'..'Z'=1..8, 's'=9 give how often the previous value or difference occurs in all,
 * counting the previous one itself.</li>
 * </ul>
 * The first number of a line is the abscissa. An 'E' directly followed by a sign and a digit inside an AFFN
 * number is taken as an exponent (common practice, no source), otherwise 'E' is the SQZ digit +5.
 */
public final class AsdfDecoder {

    /**
     * @param x         the abscissa at the start of the line
     * @param ys        the ordinates of the line in order
     * @param endsInDif whether the last ordinate was written as a difference (then the next line starts with a
     *                  Y check value)
     */
    public record DecodedLine(double x, double[] ys, boolean endsInDif) {
    }

    private enum Kind { NONE, AFFN, SQZ, DIF, DUP }

    private final String source;
    private final int lineNo;
    private final String field;
    private final long capacity;

    private double x = Double.NaN;
    private boolean haveX;
    private double[] ys = new double[16];
    private int count;
    private boolean lastWasDif;
    private boolean lastWasDup;
    private double lastDif;
    private Kind pending = Kind.NONE;
    private final StringBuilder digits = new StringBuilder();

    private AsdfDecoder(String source, int lineNo, String field, long capacity) {
        this.source = source;
        this.lineNo = lineNo;
        this.field = field;
        this.capacity = capacity;
    }

    /**
     * @param capacity most ordinates this line may hold (guards against a repeat count that would fill memory)
     */
    public static DecodedLine decode(String line, String source, int lineNo, String field, long capacity)
            throws ImportException {
        return new AsdfDecoder(source, lineNo, field, capacity).run(line);
    }

    private DecodedLine run(String line) throws ImportException {
        String lower = line.toLowerCase(Locale.ROOT);
        if (lower.contains("nan") || lower.contains("inf")) {
            throw error("not a finite number (NaN or infinity) in the table");
        }
        int n = line.length();
        for (int i = 0; i < n; i++) {
            char c = line.charAt(i);
            if (c == ' ' || c == ',' || c == '\t' || c == ';') {
                finish();
            } else if (c == '+' || c == '-') {
                finish();
                pending = Kind.AFFN;
                digits.append(c);
            } else if ((c >= '0' && c <= '9') || c == '.') {
                if (pending == Kind.NONE || pending == Kind.DUP && c == '.') {
                    finish();
                    pending = Kind.AFFN;
                }
                digits.append(c);
            } else if ((c == 'E' || c == 'e') && pending == Kind.AFFN && i + 2 < n
                    && (line.charAt(i + 1) == '+' || line.charAt(i + 1) == '-') && Character.isDigit(line.charAt(i + 2))) {
                digits.append('E').append(line.charAt(i + 1));
                i++;
            } else if (c == '@' || (c >= 'A' && c <= 'I') || (c >= 'a' && c <= 'i')) {
                start(Kind.SQZ, c == '@' ? 0 : c <= 'I' ? c - 'A' + 1 : -(c - 'a' + 1));
            } else if (c == '%' || (c >= 'J' && c <= 'R') || (c >= 'j' && c <= 'r')) {
                start(Kind.DIF, c == '%' ? 0 : c <= 'R' ? c - 'J' + 1 : -(c - 'j' + 1));
            } else if ((c >= 'S' && c <= 'Z') || c == 's') {
                start(Kind.DUP, c == 's' ? 9 : c - 'S' + 1);
            } else if (c == '?') {
                throw error("missing value '?' at column " + (i + 1) + " is not supported");
            } else {
                throw error("unexpected character '" + c + "' at column " + (i + 1));
            }
        }
        finish();
        if (!haveX) {
            throw error("data line without abscissa");
        }
        return new DecodedLine(x, Arrays.copyOf(ys, count), lastWasDif);
    }

    private void start(Kind kind, int signedDigit) throws ImportException {
        finish();
        pending = kind;
        if (signedDigit < 0) {
            digits.append('-').append(-signedDigit);
        } else {
            digits.append(signedDigit);
        }
    }

    private void finish() throws ImportException {
        if (pending == Kind.NONE) {
            return;
        }
        Kind kind = pending;
        String text = digits.toString();
        pending = Kind.NONE;
        digits.setLength(0);
        if (kind == Kind.DUP) {
            repeat(text);
            return;
        }
        double v;
        try {
            v = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw error("malformed number '" + Numbers.shown(text) + "'");
        }
        if (!Double.isFinite(v)) {
            throw error("number '" + Numbers.shown(text) + "' is not finite");
        }
        if (kind == Kind.DIF) {
            if (count == 0) {
                throw error("difference (DIF) without a preceding ordinate on this line");
            }
            add(ys[count - 1] + v);
            lastDif = v;
            lastWasDif = true;
        } else if (!haveX) {
            x = v;
            haveX = true;
        } else {
            add(v);
            lastWasDif = false;
        }
        lastWasDup = false;
    }

    private void repeat(String text) throws ImportException {
        if (count == 0) {
            throw error("repeat count (DUP) without a preceding ordinate on this line");
        }
        if (lastWasDup) {
            throw error("repeat count (DUP) follows another repeat count");
        }
        if (text.length() > 9) {
            throw error("repeat count " + Numbers.shown(text) + " is too large");
        }
        int times = Integer.parseInt(text);
        if (times < 1) {
            throw error("repeat count must be at least 1, was " + times);
        }
        for (int k = 1; k < times; k++) {
            add(lastWasDif ? ys[count - 1] + lastDif : ys[count - 1]);
        }
        lastWasDup = true;
    }

    private void add(double v) throws ImportException {
        if (count >= capacity) {
            throw error("the line holds more ordinates than ##NPOINTS allows");
        }
        if (count == ys.length) {
            ys = Arrays.copyOf(ys, (int) Math.min(Integer.MAX_VALUE - 8, 2L * ys.length));
        }
        ys[count++] = v;
    }

    private ImportException error(String reason) {
        return new ImportException(source, lineNo, field, reason);
    }
}
