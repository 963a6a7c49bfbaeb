package org.tracegas.quantify.linelist.internal;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.PreparedFit;
import org.tracegas.quantify.Sample;

/**
 * A line-list fit whose spectra are computed at each sample's own measured cell temperature and pressure: the fit
 * prepared at a sample's conditions fits it. Computing every compound's optical depth anew is most of a fit's cost
 * at new conditions, so it is done once per {@link ConditionCell} of {@value ConditionCell#TEMPERATURE_STEP} K by
 * {@value ConditionCell#PRESSURE_STEP} kPa, between whose corners a sample's own conditions are interpolated (error
 * far below the noise, see there); the last {@value #KEPT} cells are kept and reused. Safe to share between threads.
 */
public final class AtMeasuredConditions implements PreparedFit {

    /** Prepares the fit for the conditions within one lattice cell. */
    @FunctionalInterface
    public interface Preparation {
        /**
         * @param lowestTemperature the cell's lower temperature corner, K
         * @param lowestPressure    the cell's lower pressure corner, kPa
         */
        Cell cell(double lowestTemperature, double lowestPressure);
    }

    /** The fit at any conditions within one lattice cell. */
    @FunctionalInterface
    public interface Cell {
        /** The fit prepared at a cell temperature (K) and pressure (kPa) within the cell. */
        PreparedFit at(double temperature, double pressure);
    }

    private static final int KEPT = 16;

    private final String method;
    private final int systemCount;
    private final Preparation preparation;
    private final Map<List<Long>, Cell> kept = new LinkedHashMap<>(KEPT, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<List<Long>, Cell> eldest) {
            return size() > KEPT;
        }
    };

    /**
     * @param method      names the method in messages
     * @param stated      the fit prepared at the method's stated conditions, which checked the method
     * @param preparation prepares the fit within a cell of conditions
     */
    public AtMeasuredConditions(String method, PreparedFit stated, Preparation preparation) {
        this.method = method;
        this.systemCount = stated.systemCount();
        this.preparation = preparation;
    }

    @Override
    public int systemCount() {
        return systemCount;
    }

    /** @throws IllegalArgumentException if the sample carries no measured cell temperature or pressure */
    @Override
    public List<CompoundResult> fit(Sample sample, boolean keepSpectra) {
        double t = sample.cellTemperature();
        double p = sample.cellPressure();
        if (Double.isNaN(t) || Double.isNaN(p)) {
            throw new IllegalArgumentException("method " + method + " computes its spectra at each sample's measured"
                    + " cell temperature and pressure, and the sample carries " + (Double.isNaN(t) ? "no temperature"
                    : "no pressure"));
        }
        double t0 = ConditionCell.lowerCorner(t, ConditionCell.TEMPERATURE_STEP);
        double p0 = ConditionCell.lowerCorner(p, ConditionCell.PRESSURE_STEP);
        List<Long> key = List.of(Math.round(t0 / ConditionCell.TEMPERATURE_STEP),
                Math.round(p0 / ConditionCell.PRESSURE_STEP));
        Cell cell;
        synchronized (kept) {
            cell = kept.get(key);
        }
        if (cell == null) {
            // outside the lock: preparing takes long, and two threads preparing the same cell agree
            cell = preparation.cell(t0, p0);
            synchronized (kept) {
                kept.put(key, cell);
            }
        }
        return cell.at(t, p).fit(sample, keepSpectra);
    }
}
