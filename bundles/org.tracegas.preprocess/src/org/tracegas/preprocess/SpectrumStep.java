package org.tracegas.preprocess;

import java.util.SortedMap;

import org.tracegas.spectrum.Spectrum;

/**
 * One processing step of a spectrum, fully described by its id and parameters, so that a {@link Recipe} of steps
 * rebuilds the same result. Implementations are immutable; the same input gives bit for bit the same output.
 */
public interface SpectrumStep {

    /** The id under which the step's factory is registered. */
    String id();

    /**
     * The parameters that recreate this step through its factory: an unmodifiable map sorted by key, values
     * written so that they read back exactly (doubles as by {@link Double#toString(double)}).
     */
    SortedMap<String, String> parameters();

    /** @throws IllegalArgumentException if the spectrum does not suit the step (the message says why) */
    Spectrum apply(Spectrum input);
}
