package org.tracegas.store;

import java.time.Instant;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tracegas.model.MeasurementKind;
import org.tracegas.model.SpectralContent;
import org.tracegas.spectrum.Spectrum;

/**
 * One record of an imported file as a measurement to store: what it is, when and under which conditions it was
 * measured, its title and labels as the file gives them, and its spectrum or interferogram as read (kept
 * bit-exact, float64).
 *
 * @param kind            sample, background, ...
 * @param time            when it was measured
 * @param cellTemperature K, positive
 * @param cellPressure    hPa, positive
 * @param title           the record's title, not blank
 * @param labels          the file's labels of this record, in file order
 * @param content         what the values are: interferogram, single beam, transmittance or absorbance
 * @param spectrum        axis and values as read
 */
public record NewMeasurement(MeasurementKind kind, Instant time, double cellTemperature, double cellPressure,
        String title, Map<String, String> labels, SpectralContent content, Spectrum spectrum) {

    /** @throws IllegalArgumentException naming the field that is missing or wrong */
    public NewMeasurement {
        MeasurementChecks.require(kind, time, cellTemperature, cellPressure);
        if (title == null || title.isBlank()) {
            throw new IllegalArgumentException("title must not be blank");
        }
        if (labels == null) {
            throw new IllegalArgumentException("labels must not be null");
        }
        if (content == null || content == SpectralContent.RESIDUAL) {
            throw new IllegalArgumentException("content must be interferogram, single beam, transmittance or"
                    + " absorbance, was " + content);
        }
        if (spectrum == null) {
            throw new IllegalArgumentException("spectrum must not be null");
        }
        labels = Collections.unmodifiableMap(new LinkedHashMap<>(labels));
    }
}
