package org.tracegas.pipeline;

import java.time.Instant;

import org.tracegas.preprocess.RatioResult;

/**
 * One interferogram turned into absorbance: when it was taken, what it was (its role), the cell conditions and
 * the ratio against its background, and the noise variance factor F of the transform that made it.
 */
public record MeasuredSpectrum(Instant time, String role, double cellTemperatureK, double cellPressureKPa,
        RatioResult ratio, double noiseFactor) {
}
