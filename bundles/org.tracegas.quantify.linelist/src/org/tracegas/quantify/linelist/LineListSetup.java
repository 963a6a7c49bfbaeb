package org.tracegas.quantify.linelist;

import java.util.Map;

import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.preprocess.InstrumentLineShape;

/**
 * What the line-list fit knows besides the method: each compound's line-by-line model (line list, molar mass,
 * partition function, line cut-off), the gas in the sample cell and the instrument. The path length is the
 * method's.
 *
 * @param models      line-by-line model per compound, under the name the method gives the compound
 * @param temperature gas temperature in the cell, K
 * @param pressure    total gas pressure in the cell, kPa
 * @param lineShape   the instrument line shape of the spectrometer: apodization and maximum optical path difference
 * @param fieldOfView half angle of the beam through the interferometer in rad (the aperture's radius over the
 *                    collimator's focal length), in [0, 0.05]; 0 for a point source
 * @param measuredConditions whether the spectra are computed at each sample's own measured cell temperature and
 *                    pressure ({@link org.tracegas.quantify.Sample#cellTemperature()}), rather than at the stated
 *                    temperature and pressure, which then only serve to check the method when it is prepared
 */
public record LineListSetup(Map<String, LineByLineModel> models, double temperature, double pressure,
        InstrumentLineShape lineShape, double fieldOfView, boolean measuredConditions) {

    /** @throws IllegalArgumentException naming the field that is missing or out of range */
    public LineListSetup {
        if (models == null || models.isEmpty()) {
            throw new IllegalArgumentException("models must name at least one compound");
        }
        // Map.copyOf refuses null keys and values
        try {
            models = Map.copyOf(models);
        } catch (NullPointerException e) {
            throw new IllegalArgumentException("models must hold no null compound or model", e);
        }
        if (!(temperature > 0 && Double.isFinite(temperature))) {
            throw new IllegalArgumentException("temperature must be positive and finite (K), was " + temperature);
        }
        if (!(pressure > 0 && Double.isFinite(pressure))) {
            throw new IllegalArgumentException("pressure must be positive and finite (kPa), was " + pressure);
        }
        if (lineShape == null) {
            throw new IllegalArgumentException("lineShape must not be null");
        }
        // 0.05 rad is far beyond the beams of gas-analysis spectrometers (common practice, no source) and keeps
        // the small-angle form of the self-apodization valid
        if (!(fieldOfView >= 0 && fieldOfView <= 0.05)) {
            throw new IllegalArgumentException("fieldOfView must lie in [0, 0.05] rad, was " + fieldOfView);
        }
    }

    /** A setup whose spectra are computed at the stated cell temperature and pressure. */
    public LineListSetup(Map<String, LineByLineModel> models, double temperature, double pressure,
            InstrumentLineShape lineShape, double fieldOfView) {
        this(models, temperature, pressure, lineShape, fieldOfView, false);
    }

    /** The same setup at other cell conditions, K and kPa. */
    public LineListSetup at(double cellTemperature, double cellPressure) {
        return new LineListSetup(models, cellTemperature, cellPressure, lineShape, fieldOfView, measuredConditions);
    }
}
