package org.tracegas.ui.parts;

import java.util.Locale;

import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.MethodVersion;

/** A method version as key=value lines, the form versions are stored and compared in. */
public final class MethodText {

    private MethodText() {
    }

    public static String of(AnalysisMethod method, MethodVersion version) {
        StringBuilder b = new StringBuilder();
        b.append("name=").append(method.getName()).append('\n');
        int i = 1;
        for (AnalysisRegion r : version.getRegions()) {
            String p = "region." + i++ + ".";
            b.append(p).append("compound=").append(r.getCompound()).append('\n');
            b.append(p).append("lower_cm-1=").append(number(r.getLowerWavenumber())).append('\n');
            b.append(p).append("upper_cm-1=").append(number(r.getUpperWavenumber())).append('\n');
            b.append(p).append("interferents=").append(String.join(",", r.getInterferents())).append('\n');
        }
        return b.toString();
    }

    private static String number(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
