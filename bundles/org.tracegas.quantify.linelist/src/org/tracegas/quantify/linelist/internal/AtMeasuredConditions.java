package org.tracegas.quantify.linelist.internal;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.PreparedFit;
import org.tracegas.quantify.Sample;

/**
 * A line-list fit whose spectra are computed at each sample's own measured cell temperature and pressure: the fit
 * prepared at a sample's conditions fits it. Preparing at new conditions computes every compound's optical depth
 * anew, so the last {@value #KEPT} preparations are kept and reused by samples at the same conditions, taken to
 * 0.01 K and 0.001 kPa: closer than a cell's thermometer and pressure gauge measure, and the line strengths change
 * by about 1e-4 per 0.01 K at 470 K (temperature factor of the line intensity, HITRAN definitions, from memory).
 * Safe to share between threads.
 */
public final class AtMeasuredConditions implements PreparedFit {

    /** Prepares the fit at a cell temperature (K) and pressure (kPa). */
    @FunctionalInterface
    public interface Preparation {
        PreparedFit at(double temperature, double pressure);
    }

    private static final int KEPT = 16;

    private final String method;
    private final int systemCount;
    private final Preparation preparation;
    private final Map<List<Long>, PreparedFit> kept = new LinkedHashMap<>(KEPT, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<List<Long>, PreparedFit> eldest) {
            return size() > KEPT;
        }
    };

    /**
     * @param method      names the method in messages
     * @param stated      the fit prepared at the method's stated conditions, which checked the method
     * @param preparation prepares the fit at other conditions
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
        long tKey = Math.round(t * 100);
        long pKey = Math.round(p * 1000);
        List<Long> key = List.of(tKey, pKey);
        PreparedFit fit;
        synchronized (kept) {
            fit = kept.get(key);
        }
        if (fit == null) {
            // outside the lock: preparing takes long, and two threads preparing the same conditions agree
            fit = preparation.at(tKey / 100.0, pKey / 1000.0);
            synchronized (kept) {
                kept.put(key, fit);
            }
        }
        return fit.fit(sample, keepSpectra);
    }
}
