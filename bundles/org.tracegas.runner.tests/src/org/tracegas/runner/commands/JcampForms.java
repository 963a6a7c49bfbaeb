package org.tracegas.runner.commands;

import java.util.Locale;
import java.util.Map;

import org.tracegas.importer.jcamp.JcampWriter;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * JCAMP-DX text of a spectrum in each compression form of ##XYDATA=(X++(Y..Y)) a reader must take: AFFN, PAC,
 * SQZ, and DIFDUP (by the product's writer), and as ##XYPOINTS=(XY..XY). The forms follow IUPAC JCAMP-DX 4.24
 * (McDonald and Wilks, Applied Spectroscopy 42 (1988) 151, from memory): PAC writes each ordinate with its
 * sign as the separator; SQZ replaces an ordinate's sign and first digit by @, A..I (positive) or a..i
 * (negative). These encoders are the test's own, apart from the code under test.
 */
final class JcampForms {

    enum Form { DIFDUP, AFFN, PAC, SQZ, XYPOINTS }

    /** Ordinates are written as integers times this factor: 1e-6 absorbance, far below the noise. */
    private static final double Y_FACTOR = 1e-6;

    private JcampForms() {
    }

    /** @param labels written as ##label=value lines after the title (e.g. "LONGDATE", "$CELL TEMPERATURE") */
    static String write(Spectrum s, String title, Map<String, String> labels, Form form) {
        if (form == Form.DIFDUP) {
            Map<String, String> privateLabels = new java.util.LinkedHashMap<>();
            labels.forEach((k, v) -> privateLabels.put(k.startsWith("$") ? k.substring(1) : k, v));
            return JcampWriter.defaultPrecision().write(s, title, privateLabels);
        }
        StringBuilder b = new StringBuilder();
        b.append("##TITLE=").append(title).append('\n');
        b.append("##JCAMP-DX=4.24\n##DATA TYPE=INFRARED SPECTRUM\n##ORIGIN=Larkspur Bay lab\n##OWNER=\n");
        labels.forEach((k, v) -> b.append("##").append(k).append('=').append(v).append('\n'));
        b.append("##XUNITS=1/CM\n##YUNITS=").append(s.ordinate() == Ordinate.TRANSMITTANCE ? "TRANSMITTANCE"
                : s.ordinate() == Ordinate.SINGLE_BEAM ? "ARBITRARY UNITS" : "ABSORBANCE").append('\n');
        int n = s.size();
        double first = s.axis().get(0);
        double step = s.axis().get(1) - first;
        if (form == Form.XYPOINTS) {
            b.append("##XFACTOR=1\n##YFACTOR=1\n##NPOINTS=").append(n).append("\n##XYPOINTS=(XY..XY)\n");
            for (int i = 0; i < n; i++) {
                b.append(s.axis().get(i)).append(", ").append(s.get(i)).append('\n');
            }
            return b.append("##END=\n").toString();
        }
        long[] q = new long[n];
        for (int i = 0; i < n; i++) {
            q[i] = Math.round(s.get(i) / Y_FACTOR);
        }
        b.append("##XFACTOR=1\n##YFACTOR=").append(Y_FACTOR).append('\n');
        b.append("##FIRSTX=").append(first).append("\n##LASTX=").append(s.axis().get(n - 1)).append('\n');
        b.append("##DELTAX=").append(step).append("\n##FIRSTY=").append(q[0] * Y_FACTOR).append('\n');
        b.append("##NPOINTS=").append(n).append("\n##XYDATA=(X++(Y..Y))\n");
        for (int start = 0; start < n; start += 8) {
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%.4f", first + step * start));
            for (int i = start; i < Math.min(n, start + 8); i++) {
                switch (form) {
                    case AFFN -> line.append(' ').append(q[i]);
                    case PAC -> line.append(q[i] < 0 ? "-" : "+").append(Math.abs(q[i]));
                    case SQZ -> line.append(sqz(q[i]));
                    default -> throw new IllegalArgumentException(form.name());
                }
            }
            b.append(line).append('\n');
        }
        return b.append("##END=\n").toString();
    }

    private static String sqz(long v) {
        String digits = Long.toString(Math.abs(v));
        int lead = digits.charAt(0) - '0';
        char c = v < 0 ? (char) ('a' + lead - 1) : (char) ('@' + lead);
        return c + digits.substring(1);
    }
}
