package org.tracegas.importer.jcamp.internal;

import java.util.Arrays;

import org.tracegas.importer.ImportException;

/**
 * Decodes the lines of an ##XYDATA=(X++(Y..Y)) table into ordinates, checking each line's abscissa and the
 * Y check value (IUPAC JCAMP-DX 4.24, from memory): when a line ends in DIF form, the next line starts with
 * the last ordinate of that line again; the repeat is compared and dropped.
 */
public final class XyDataTable {

    private XyDataTable() {
    }

    /**
     * @param firstX  first abscissa in real units
     * @param deltaX  step between abscissae in real units
     * @param xFactor factor of the abscissae written at the start of each line
     * @param nPoints declared number of points
     * @return the ordinates as written (YFACTOR not applied), exactly nPoints of them
     */
    public static double[] decode(Ldr table, String source, double firstX, double deltaX, double xFactor, int nPoints)
            throws ImportException {
        String field = "##" + table.rawLabel();
        double[] y = new double[Math.min(nPoints, 1 << 16)];
        int n = 0;
        boolean previousEndsInDif = false;
        int lastDataLine = table.line();
        for (int i = 0; i < table.more().size(); i++) {
            String text = table.more().get(i);
            int lineNo = table.line() + 1 + i;
            if (text.isBlank()) {
                continue;
            }
            lastDataLine = lineNo;
            AsdfDecoder.DecodedLine line = AsdfDecoder.decode(text, source, lineNo, field,
                    (long) nPoints - n + 1);
            double[] ys = line.ys();
            if (ys.length == 0) {
                throw new ImportException(source, lineNo, field, "data line holds an abscissa but no ordinate");
            }
            int from = 0;
            int firstIndex = n;
            if (previousEndsInDif) {
                if (!sameValue(ys[0], y[n - 1])) {
                    throw new ImportException(source, lineNo, field + " Y check", "the line starts with "
                            + ys[0] + " but the previous line ended with " + y[n - 1]
                            + " (a line after DIF form must repeat the last ordinate)");
                }
                from = 1;
                firstIndex = n - 1;
            }
            if (nPoints > 1) {
                double expected = firstX + firstIndex * deltaX;
                double actual = line.x() * xFactor;
                if (Math.abs(actual - expected) > 0.5 * Math.abs(deltaX)) {
                    throw new ImportException(source, lineNo, field + " abscissa", "line starts at X=" + actual
                            + " but point " + (firstIndex + 1) + " lies at X=" + expected
                            + " (from ##FIRSTX and the step); a line is missing or misplaced");
                }
            }
            int add = ys.length - from;
            if (n + add > nPoints) {
                throw new ImportException(source, lineNo, field, "the table holds more than the " + nPoints
                        + " points declared by ##NPOINTS");
            }
            if (n + add > y.length) {
                y = Arrays.copyOf(y, (int) Math.min(nPoints, Math.max(2L * y.length, n + add)));
            }
            System.arraycopy(ys, from, y, n, add);
            n += add;
            previousEndsInDif = line.endsInDif();
        }
        if (n != nPoints) {
            throw new ImportException(source, lastDataLine, field, "the table holds " + n
                    + " points but ##NPOINTS declares " + nPoints + " (truncated file?)");
        }
        return y;
    }

    /** Y check values are integers in practice; allow rounding of decimal values summed over DIFs. */
    private static boolean sameValue(double a, double b) {
        return Math.abs(a - b) <= 1e-9 * Math.max(1.0, Math.abs(b));
    }
}
