package org.tracegas.importer.delimited.internal;

import java.util.Locale;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;

/** Units and quantities named in the header of delimited text. */
public final class ColumnUnits {

    private ColumnUnits() {
    }

    /** The axis unit named by a column's name and unit text, or null when none is recognised. */
    public static AxisUnit axis(String text) {
        String t = text.toLowerCase(Locale.ROOT).replace(" ", "");
        if (t.contains("cm-1") || t.contains("cm^-1") || t.contains("1/cm") || t.contains("cm⁻¹")
                || t.contains("wavenumber")) {
            return AxisUnit.WAVENUMBER;
        }
        if (t.contains("µm") || t.contains("μm") || t.contains("um") || t.contains("micromet") || t.contains("micron")
                || t.contains("wavelength")) {
            return AxisUnit.MICROMETRE;
        }
        return null;
    }

    /** The ordinate named by a column's name and unit text; ARBITRARY when none is recognised. */
    public static Ordinate ordinate(String text) {
        String t = text.toLowerCase(Locale.ROOT);
        if (t.contains("absorbance")) {
            return Ordinate.ABSORBANCE;
        }
        if (t.contains("transmittance")) {
            return Ordinate.TRANSMITTANCE;
        }
        if (t.contains("single beam") || t.contains("single-beam")) {
            return Ordinate.SINGLE_BEAM;
        }
        return Ordinate.ARBITRARY;
    }
}
