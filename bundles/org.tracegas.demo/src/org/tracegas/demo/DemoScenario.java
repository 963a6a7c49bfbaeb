package org.tracegas.demo;

import java.time.Instant;
import java.util.List;

/**
 * The invented setting of the demo campaign: an energy-from-waste plant of an invented operator, sampled
 * for one day by a hot extractive FTIR. Every name, level and line parameter here is made up for the demo
 * and describes no real plant, client or molecule data set.
 */
public final class DemoScenario {

    public static final String CLIENT = "Fellgate Resource Recovery Ltd";
    /** The client's site, as the workspace keeps it and the report names it. */
    public static final String PLANT = "Tarnbeck Energy Recovery Facility";
    public static final String PLANT_DESCRIPTION = "energy-from-waste plant, two incineration lines";
    /** The emission source at the site that the campaign measures. */
    public static final String SOURCE = "Line 2 stack, sampling port B";
    public static final String SOURCE_DESCRIPTION = "line 2 flue gas after the bag filter, port B of the stack";
    /**
     * The lab's name and serial number of its invented hot extractive FTIR; the acquisitions' containers carry its
     * figures (laser, path difference, cell path), not who it is.
     */
    public static final String INSTRUMENT = "Mobile FTIR 1";
    public static final String INSTRUMENT_SERIAL = "TGW-DEMO-0001";
    public static final String PROJECT_CODE = "FRR-TARNBECK-L2";
    public static final String PROJECT_NAME = "Tarnbeck line 2, emissions survey day 1";
    public static final Instant DAY_START = Instant.parse("2026-03-17T00:00:00Z");
    public static final int SAMPLES = 1440;

    /** Reference laser wavenumber of the invented bench instrument, cm-1 (a HeNe laser: common practice). */
    public static final double LASER_WAVENUMBER = 15798.0;
    /** One sample every second laser fringe: the spectrum reaches 3949.5 cm-1 before folding. */
    public static final int SAMPLING_INTERVAL = 2;
    /**
     * Nominal resolution, cm-1; the maximum optical path difference is its reciprocal, 1 cm. Lines of a gas at
     * atmospheric pressure are about 0.1 to 0.2 cm-1 wide at half height, so none is resolved at either 0.5 or
     * 1 cm-1; the lab takes the coarser one for half the interferogram and a better signal-to-noise per scan
     * (common practice, no source). EPA Method 320 fixes no resolution (standards notes, Method 320 §10.3).
     */
    public static final double RESOLUTION = 1.0;
    /** Cell path length of the invented multipass cell: a 0.4 m base folded into 16 passes, m. */
    public static final double PATH_LENGTH = 6.4;
    /**
     * Cell temperature, K (165 degC): the cell and the line are kept well above the acid and water dew points of
     * the wet stack gas, as EPA Method 320 §6.3 asks ("sufficient to prevent condensation", no number given);
     * the figure is the invented lab's own choice (common practice, no source).
     */
    public static final double CELL_TEMPERATURE = 438.15;
    /** Cell pressure, kPa. */
    public static final double CELL_PRESSURE = 101.3;
    /** Lowest and highest wavenumber processed, cm-1. */
    public static final double RANGE_LOW = 700.0;
    public static final double RANGE_HIGH = 3900.0;

    /** Points of the double-sided interferogram: 2 cm on each side of the zero path difference. */
    public static int interferogramPoints() {
        return 2 * (int) Math.round(LASER_WAVENUMBER / SAMPLING_INTERVAL / RESOLUTION);
    }

    static final Gas H2O = new Gas("H2O", "7732-18-5", "H2O", 18.015, 1, false, 120_000,
            new Gas.Band(1595.0, 0, 3.0e-20, false, 0.080, 0.40), new Gas.Band(3700.0, 0, 2.0e-20, false, 0.080, 0.40));
    static final Gas CO2 = new Gas("CO2", "124-38-9", "CO2", 44.010, 2, true, 80_000,
            new Gas.Band(2076.9, 0.390, 1.5e-21, false, 0.070, 0.09), new Gas.Band(3612.8, 0.390, 3.0e-21, false, 0.070, 0.09));
    static final Gas N2O = new Gas("N2O", "10024-97-2", "N2O", 44.013, 4, true, 1.5,
            new Gas.Band(2223.8, 0.419, 9.0e-17, false, 0.075, 0.10), new Gas.Band(1285.0, 0.419, 2.0e-17, false, 0.075, 0.10));
    static final Gas CO = new Gas("CO", "630-08-0", "CO", 28.010, 5, true, 12.0,
            new Gas.Band(2143.3, 1.931, 9.8e-18, false, 0.060, 0.070));
    static final Gas CH4 = new Gas("CH4", "74-82-8", "CH4", 16.043, 6, false, 2.0,
            new Gas.Band(3019.0, 5.24, 1.1e-17, true, 0.060, 0.080), new Gas.Band(1306.0, 5.24, 5.5e-18, true, 0.060, 0.080));
    static final Gas NO = new Gas("NO", "10102-43-9", "NO", 30.006, 8, true, 95.0,
            new Gas.Band(1876.0, 1.696, 4.5e-18, false, 0.058, 0.065));
    static final Gas NH3 = new Gas("NH3", "7664-41-7", "NH3", 17.031, 11, false, 2.5,
            new Gas.Band(950.0, 9.94, 2.0e-17, true, 0.085, 0.45));
    static final Gas HCl = new Gas("HCl", "7647-01-0", "HCl", 36.461, 15, true, 6.0,
            new Gas.Band(2886.0, 10.44, 5.0e-18, false, 0.050, 0.20));
    /** The tracer of the spike runs (absent from the stack gas). */
    static final Gas SF6 = new Gas("SF6", "2551-62-4", "SF6", 146.06, 30, false, 0.0,
            new Gas.Band(947.9, 0.091, 1.6e-16, true, 0.050, 0.10));

    /** The gases of the stack, the tracer last. */
    static final List<Gas> GASES = List.of(H2O, CO2, CO, NO, N2O, NH3, HCl, CH4, SF6);

    private DemoScenario() {
    }
}
