package org.tracegas.preprocess;

import java.time.Duration;

import org.tracegas.spectrum.Spectrum;

/**
 * A transmittance or absorbance spectrum with the background it was ratioed against.
 *
 * @param spectrum         the ratioed spectrum
 * @param backgroundId     id of the background
 * @param backgroundAge    sample time minus background time (negative if the background was measured later)
 * @param backgroundTooOld whether the age, taken without sign, exceeded the limit in force
 */
public record RatioResult(Spectrum spectrum, String backgroundId, Duration backgroundAge, boolean backgroundTooOld) {
}
