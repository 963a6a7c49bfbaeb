package org.tracegas.importer.jcamp.internal;

import java.util.Locale;

import org.tracegas.spectrum.Ordinate;

/** The ##XUNITS and ##YUNITS values understood, compared without blanks and case. */
public final class JcampUnits {

    /** Abscissa units of spectra and interferograms. */
    public enum X {
        WAVENUMBER, MICROMETRE, NANOMETRE, POINTS, CENTIMETRE
    }

    private JcampUnits() {
    }

    /** The abscissa unit, or null when unknown. */
    public static X x(String value) {
        return switch (squeeze(value)) {
            case "1/CM", "CM-1", "CM^-1" -> X.WAVENUMBER;
            case "MICROMETERS", "MICROMETRES", "MICROMETER", "MICROMETRE", "UM" -> X.MICROMETRE;
            case "NANOMETERS", "NANOMETRES", "NM" -> X.NANOMETRE;
            case "POINTS", "POINT" -> X.POINTS;
            case "CM", "CENTIMETERS", "CENTIMETRES" -> X.CENTIMETRE;
            default -> null;
        };
    }

    /** The ordinate of a spectrum, or null when unknown. */
    public static Ordinate y(String value) {
        return switch (squeeze(value)) {
            case "ABSORBANCE" -> Ordinate.ABSORBANCE;
            case "TRANSMITTANCE" -> Ordinate.TRANSMITTANCE;
            case "ARBITRARYUNITS", "ARBITRARY" -> Ordinate.ARBITRARY;
            default -> null;
        };
    }

    /** The ##YUNITS value written for an ordinate. */
    public static String yName(Ordinate ordinate) {
        return switch (ordinate) {
            case ABSORBANCE -> "ABSORBANCE";
            case TRANSMITTANCE -> "TRANSMITTANCE";
            case SINGLE_BEAM, ARBITRARY, INTERFEROGRAM -> "ARBITRARY UNITS";
        };
    }

    private static String squeeze(String value) {
        return value.replace(" ", "").replace("\t", "").toUpperCase(Locale.ROOT);
    }
}
