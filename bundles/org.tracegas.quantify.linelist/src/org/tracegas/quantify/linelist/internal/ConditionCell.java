package org.tracegas.quantify.linelist.internal;

import java.util.List;

import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.preprocess.InstrumentLineShape;

/**
 * The mixture's model at any cell temperature and pressure within one cell of a lattice, {@value #TEMPERATURE_STEP}
 * K by {@value #PRESSURE_STEP} kPa: each compound's optical depth is computed line by line at the cell's four
 * corners, on the fine grid of the lower corner, and interpolated bilinearly in between.
 * Computing the line-by-line spectra is most of the cost of a fit at new conditions; here it is paid once per cell,
 * and a sample's own conditions cost a weighted sum per fine point.
 * <p>
 * Why the interpolation stays far below the noise: its error is at most (h^2 / 8) |d^2 tau / dx^2| along each
 * direction of step h (linear interpolation, calculus). In temperature a line's optical depth follows its intensity,
 * exp(-c2 E'' / T) over the partition function, whose relative second derivative is about (c2 E'' / T^2)^2: for a
 * lower-state energy of 1000 cm-1 at 300 K, 2.6e-4 per K^2, hence 8e-6 of the optical depth at a 0.5 K step (and
 * less when hotter). In pressure the Lorentz core falls as 1 / p and the wings grow as p: 2 / p^2 at the core, 2e-4
 * per kPa^2 at 100 kPa, hence 6e-6 at a 0.5 kPa step (line intensity and Lorentz width at T and p, HITRAN
 * definitions, from memory). Both are below the 5e-5 of a line strength that the earlier rounding of the conditions
 * to 0.01 K allowed, and far below a fit's uncertainty. Immutable.
 */
public final class ConditionCell {

    /** K between lattice nodes in temperature. */
    public static final double TEMPERATURE_STEP = 0.5;
    /** kPa between lattice nodes in pressure. */
    public static final double PRESSURE_STEP = 0.5;

    private final double lowestTemperature;
    private final double lowestPressure;
    /** The models at the corners (T0, p0), (T1, p0), (T0, p1), (T1, p1), on one instrument. */
    private final List<MixtureModel> corners;

    /**
     * @param models            line-by-line model of each compound
     * @param lowestTemperature the cell's lower temperature corner, K; it reaches {@value #TEMPERATURE_STEP} K above
     * @param lowestPressure    the cell's lower pressure corner, kPa; it reaches {@value #PRESSURE_STEP} kPa above
     * @param pathMetres        optical path of the cell, m
     * @param lineShape         instrument line shape
     * @param fieldOfView       beam half angle, rad
     * @param low               lowest wavenumber at which the model is read, cm-1
     * @param high              highest wavenumber at which the model is read, cm-1
     */
    public ConditionCell(List<LineByLineModel> models, double lowestTemperature, double lowestPressure,
            double pathMetres, InstrumentLineShape lineShape, double fieldOfView, double low, double high) {
        this.lowestTemperature = lowestTemperature;
        this.lowestPressure = lowestPressure;
        AbsorptionPath[] at = new AbsorptionPath[4];
        for (int k = 0; k < 4; k++) {
            at[k] = MixtureModel.nominal(lowestTemperature + (k % 2) * TEMPERATURE_STEP,
                    lowestPressure + (k / 2) * PRESSURE_STEP, pathMetres);
        }
        // the lower corner's grid: so a sample there is computed as without the cell, and across the cell the
        // narrowest line narrows by less than 0.1 % (Lorentz width as p T^-n, Doppler as T^1/2), far inside the
        // rule of a third of its half width
        FineGridSpectrometer instrument = new FineGridSpectrometer(models, at[0], lineShape, fieldOfView, low, high);
        MixtureModel[] built = new MixtureModel[4];
        for (int k = 0; k < 4; k++) {
            built[k] = new MixtureModel(instrument, MixtureModel.opticalDepthPerAmount(models, instrument.grid(),
                    at[k]));
        }
        this.corners = List.of(built);
    }

    /**
     * The lattice cell that holds a condition: its lower corner, a multiple of the step.
     *
     * @param value K or kPa
     * @param step  {@link #TEMPERATURE_STEP} or {@link #PRESSURE_STEP}
     */
    public static double lowerCorner(double value, double step) {
        return Math.floor(value / step) * step;
    }

    /**
     * The mixture's model at conditions within the cell.
     *
     * @param temperature K, within the cell
     * @param pressure    kPa, within the cell
     * @throws IllegalArgumentException naming the condition outside the cell
     */
    public MixtureModel at(double temperature, double pressure) {
        double u = (temperature - lowestTemperature) / TEMPERATURE_STEP;
        double v = (pressure - lowestPressure) / PRESSURE_STEP;
        if (!(u >= 0 && u <= 1)) {
            throw new IllegalArgumentException("temperature " + temperature + " K lies outside the cell ["
                    + lowestTemperature + ", " + (lowestTemperature + TEMPERATURE_STEP) + "] K");
        }
        if (!(v >= 0 && v <= 1)) {
            throw new IllegalArgumentException("pressure " + pressure + " kPa lies outside the cell ["
                    + lowestPressure + ", " + (lowestPressure + PRESSURE_STEP) + "] kPa");
        }
        return MixtureModel.weighted(corners, new double[] {(1 - u) * (1 - v), u * (1 - v), (1 - u) * v, u * v});
    }
}
