package org.tracegas.qa.checks;

import java.time.Duration;
import java.time.Instant;

import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;

/** Age of the background spectrum at the time of a measurement against a maximum age. */
public final class BackgroundAgeCheck {

    private final Duration maximumAge;

    public BackgroundAgeCheck(Duration maximumAge) {
        Require.notNull("maximumAge", maximumAge);
        if (maximumAge.isNegative() || maximumAge.isZero()) {
            throw new IllegalArgumentException("maximumAge must be positive, was " + maximumAge);
        }
        this.maximumAge = maximumAge;
    }

    public CheckOutcome evaluate(Instant backgroundTime, Instant measurementTime) {
        Require.notNull("backgroundTime", backgroundTime);
        Require.notNull("measurementTime", measurementTime);
        if (measurementTime.isBefore(backgroundTime)) {
            throw new IllegalArgumentException("measurementTime " + measurementTime
                    + " lies before backgroundTime " + backgroundTime);
        }
        double hours = Duration.between(backgroundTime, measurementTime).toMillis() / 3.6e6;
        double limitHours = maximumAge.toMillis() / 3.6e6;
        Rule rule = new Rule("Background spectrum at most " + Format.number(limitHours)
                + " h old when the sample is measured",
                "common practice, no source (EPA Method 320 section 8.9 asks for a new background when the "
                        + "transmittance shifts by 5 % or more; not confirmed against the official text)");
        return CheckOutcome.judge("Background age", hours, "h", AcceptanceLimits.atMost(limitHours), rule);
    }
}
