package org.tracegas.preprocess;

import java.time.Instant;

import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * A background single beam (the cell filled with zero gas) with the id under which it is kept and the time it was
 * measured.
 */
public record Background(String id, Instant measured, Spectrum singleBeam) {

    /** @throws IllegalArgumentException if a field is missing or the spectrum is not a single beam */
    public Background {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("background id must not be blank");
        }
        if (measured == null) {
            throw new IllegalArgumentException("background " + id + ": measured time must not be null");
        }
        if (singleBeam == null || singleBeam.ordinate() != Ordinate.SINGLE_BEAM) {
            throw new IllegalArgumentException("background " + id + ": spectrum must be a single beam, was "
                    + (singleBeam == null ? "null" : singleBeam.ordinate()));
        }
    }
}
