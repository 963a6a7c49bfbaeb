package org.tracegas.demo;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The invented truth of the demo day: the level of each gas in the stack, minute by minute, with slow
 * daily swings, shorter cycles of the combustion and a 20-minute CO upset in the morning.
 */
public final class DayOfStackGas {

    private DayOfStackGas() {
    }

    /** Concentrations in ppm (wet) at a minute of the day, 0 to 1439. */
    public static Map<String, Double> at(int minute) {
        double day = 2 * Math.PI * minute / 1440.0;
        Map<String, Double> ppm = new LinkedHashMap<>();
        ppm.put("H2O", 120_000 + 8_000 * Math.sin(day));
        ppm.put("CO2", 80_000 + 5_000 * Math.sin(day + 0.5));
        ppm.put("CO", 12.0 + 4.0 * Math.sin(2 * Math.PI * minute / 180.0) + (minute >= 420 && minute < 440 ? 60.0 : 0.0));
        ppm.put("NO", 95.0 + 15.0 * Math.sin(day - 1.0));
        ppm.put("N2O", 1.5 + 0.2 * Math.sin(2 * Math.PI * minute / 600.0));
        ppm.put("NH3", 2.5 + 1.5 * Math.max(0.0, Math.sin(2 * Math.PI * (minute - 600) / 1440.0)));
        ppm.put("HCl", 6.0 + 2.0 * Math.sin(2 * Math.PI * minute / 360.0));
        ppm.put("CH4", 2.0 + 0.3 * Math.sin(2 * Math.PI * minute / 240.0));
        return ppm;
    }

    /** O2 from the separate analyzer, %vol wet (O2 has no infrared spectrum: common practice, no source). */
    public static double oxygenPercent(int minute) {
        return 9.5 + 0.8 * Math.sin(2 * Math.PI * minute / 500.0);
    }

    /** Throughput of the optics relative to the last background: the source dims slowly between backgrounds. */
    static double gain(int minute) {
        return 1.0 - 0.01 * (minute % 720) / 720.0;
    }
}
