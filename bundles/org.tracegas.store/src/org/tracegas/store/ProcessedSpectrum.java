package org.tracegas.store;

import java.time.Instant;
import java.util.List;

import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Result;
import org.tracegas.spectrum.Spectrum;

/**
 * One processed spectrum of a block: the measurement it came from, its absorbance spectrum and the
 * results fitted from it. The store assigns the measurement's id, so the results carry none.
 *
 * @param kind            what was measured
 * @param time            when it was measured
 * @param cellTemperature K, positive
 * @param cellPressure    hPa, positive
 * @param absorbance      the absorbance spectrum, stored as {@link org.tracegas.model.SpectralContent#ABSORBANCE}
 * @param encoding        how its values are stored
 * @param results         its results, each with a null {@link Result#getMeasurementId()}; may be empty
 * @param instrumentId    the id of the stored instrument that made it ({@link InstrumentService#record}), linked to
 *                        its measurement in the same write; null when not known (a file that names no instrument)
 */
public record ProcessedSpectrum(MeasurementKind kind, Instant time, double cellTemperature, double cellPressure,
        Spectrum absorbance, SampleEncoding encoding, List<Result> results, String instrumentId) {

    /** @throws IllegalArgumentException naming the field (and result index) that is missing or wrong */
    public ProcessedSpectrum {
        MeasurementChecks.require(kind, time, cellTemperature, cellPressure);
        if (absorbance == null) {
            throw new IllegalArgumentException("absorbance must not be null");
        }
        if (encoding == null) {
            throw new IllegalArgumentException("encoding must not be null");
        }
        if (results == null) {
            throw new IllegalArgumentException("results must not be null (an empty list when nothing was fitted)");
        }
        for (int i = 0; i < results.size(); i++) {
            Result r = results.get(i);
            ResultChecks.requireComplete(r, "results[" + i + "].");
            if (r.getMeasurementId() != null) {
                throw new IllegalArgumentException("results[" + i + "].measurementId must be null: the store assigns"
                        + " the measurement of a processed spectrum, was " + r.getMeasurementId());
            }
        }
        if (instrumentId != null && instrumentId.isBlank()) {
            throw new IllegalArgumentException("instrumentId must be null (not known) or an instrument's id,"
                    + " was blank");
        }
        results = List.copyOf(results);
    }
}
