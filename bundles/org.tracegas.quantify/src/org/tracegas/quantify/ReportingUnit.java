package org.tracegas.quantify;

/** Unit in which concentrations are reported; the fit itself works in ppm. */
public enum ReportingUnit {
    PPM(1.0),
    PPB(1000.0),
    /** Percent by volume: 1 % = 10,000 ppm. */
    PERCENT(1e-4);

    private final double perPpm;

    ReportingUnit(double perPpm) {
        this.perPpm = perPpm;
    }

    /** Converts a value in ppm to this unit. */
    public double fromPpm(double ppm) {
        return ppm * perPpm;
    }
}
