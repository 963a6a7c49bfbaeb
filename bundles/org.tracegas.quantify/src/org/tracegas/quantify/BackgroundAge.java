package org.tracegas.quantify;

import java.time.Duration;

/**
 * Age of the background spectrum behind a sample and the highest age the caller accepts.
 *
 * @param age   time between background and sample measurement
 * @param limit highest acceptable age
 */
public record BackgroundAge(Duration age, Duration limit) {

    /** @throws IllegalArgumentException naming the field that is null or negative */
    public BackgroundAge {
        if (age == null || age.isNegative()) {
            throw new IllegalArgumentException("age must be a non-negative duration, was " + age);
        }
        if (limit == null || limit.isNegative()) {
            throw new IllegalArgumentException("limit must be a non-negative duration, was " + limit);
        }
    }

    public boolean tooOld() {
        return age.compareTo(limit) > 0;
    }
}
