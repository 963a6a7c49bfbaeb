package org.tracegas.quantify;

import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Writes the canonical text of a method. Numbers are written with {@link Double#toHexString(double)}: exact, and
 * unlike the decimal form unchanged across Java versions, so that a hash stays valid for years.
 */
final class CanonicalMethodText {

    private static final String FORMAT = "tracegas-quantification-method 1";

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
            s.append(i % 8 == 0 ? "  " : " ").append(num(v[i]));
            if (i % 8 == 7 || i == v.length - 1) {
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
}
