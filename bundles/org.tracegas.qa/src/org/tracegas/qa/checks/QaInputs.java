package org.tracegas.qa.checks;

import java.io.IOException;
import java.time.Instant;
import java.util.List;

/** What a campaign's QA checks judge: its QA readings, its backgrounds and samples, and the plan's settings. */
public interface QaInputs {

    /** The QA readings of one role, in time order; empty when none were made. */
    List<QaReading> readings(String role);

    /** The times of the campaign's backgrounds, in time order. */
    List<Instant> backgrounds();

    /**
     * The time of the last background taken at or before a time.
     *
     * @throws IllegalArgumentException if no background was taken by then
     */
    Instant backgroundBefore(Instant time);

    /** The time of the campaign's first sample. */
    Instant firstSample();

    /** The time of the campaign's last sample. */
    Instant lastSample();

    /** The optical path length the method states, m. */
    double nominalPathMetres();

    /** The QA plan's settings. */
    QaSettings settings();

    /**
     * The reference of a compound in the method's library nearest in concentration-path length to an amount, so
     * that saturation does not bias a ratio to it.
     *
     * @throws IOException naming the plan file when the library holds no reference of the compound
     */
    QaReference reference(String compound, double ppmMetres) throws IOException;
}
