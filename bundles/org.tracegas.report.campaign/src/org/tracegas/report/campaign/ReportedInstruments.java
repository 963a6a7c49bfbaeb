package org.tracegas.report.campaign;

import java.math.BigDecimal;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;

/**
 * The instruments that made a report's measurements, as the report states them: one line each, with the name,
 * serial number and the figures the results depend on, in the order the instruments first measured.
 */
final class ReportedInstruments {

    private ReportedInstruments() {
    }

    /** @return none when no measurement names its instrument (workspaces made before instruments were kept) */
    static List<String> lines(List<Measurement> measurements) {
        Map<String, Instrument> used = new LinkedHashMap<>();
        for (Measurement m : measurements) {
            if (m.getInstrument() != null) {
                used.putIfAbsent(m.getInstrument().getId(), m.getInstrument());
            }
        }
        return used.values().stream().map(ReportedInstruments::line).toList();
    }

    static String line(Instrument i) {
        return i.getName() + ", serial " + i.getSerialNumber() + ": reference laser "
                + number(i.getLaserWavenumber()) + " cm-1, maximum path difference "
                + number(i.getMaxPathDifference()) + " cm, field of view "
                + (i.isSetFieldOfView() ? number(i.getFieldOfView()) + " mrad half-angle" : "not recorded")
                + ", cell path length " + number(i.getCellPathLength()) + " m";
    }

    /** A figure as it was given, without the digits binary arithmetic adds. */
    private static String number(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }
}
