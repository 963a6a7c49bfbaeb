package org.tracegas.library.synthesis;

import java.util.Locale;

/**
 * Writes lines in the HITRAN 2004+ fixed-width format of 160 characters (Rothman et al., JQSRT 96, 139 (2005)),
 * the format {@link HitranLineListReader} reads: the first ten fields, the quanta, uncertainty and reference fields
 * left blank. For line lists a lab makes up or edits itself (test gases, invented scenarios).
 */
public final class HitranLineListWriter {

    private static final int RECORD_LENGTH = 160;

    private HitranLineListWriter() {
    }

    /**
     * One record, without the line break.
     *
     * @throws IllegalArgumentException naming the field whose value does not fit its columns
     */
    public static String record(SpectralLine l) {
        if (l.moleculeId() > 99) {
            throw new IllegalArgumentException("molecule id " + l.moleculeId() + " does not fit columns 1-2");
        }
        String s = String.format(Locale.ROOT, "%2d%1d%12.6f%10.3E%10.3E%s%s%10.4f%s%s", l.moleculeId(),
                l.isotopologue() % 10, l.wavenumber(), l.intensity(), l.einsteinA(),
                fixed("air half width", l.airHalfWidth(), 5, 4), fixed("self half width", l.selfHalfWidth(), 5, 3),
                l.lowerStateEnergy(), fixed("temperature exponent", l.temperatureExponent(), 4, 2),
                fixed("pressure shift", l.pressureShift(), 8, 6));
        if (s.length() != 67) {
            throw new IllegalArgumentException("wavenumber " + l.wavenumber() + " or lower-state energy "
                    + l.lowerStateEnergy() + " does not fit its columns (4-15, 46-55)");
        }
        return s + " ".repeat(RECORD_LENGTH - s.length());
    }

    /** Fortran Fw.d: the leading zero before the decimal point is dropped when the field would overflow. */
    private static String fixed(String field, double v, int width, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (s.length() > width) {
            s = s.replaceFirst("^(-?)0\\.", "$1.");
        }
        if (s.length() > width) {
            throw new IllegalArgumentException(field + " " + v + " does not fit F" + width + "." + decimals);
        }
        return " ".repeat(width - s.length()) + s;
    }
}
