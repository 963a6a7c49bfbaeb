package org.tracegas.qa.campaign.internal;

import java.io.IOException;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Set;

import org.tracegas.qa.checks.BackgroundAgeCheck;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaInputs;

/** The oldest background any sample of the run was ratioed against: at the last sample before a new one. */
public final class BackgroundAgeQaCheck implements QaCheck {

    @Override
    public String name() {
        return "background-age";
    }

    /** Judges the backgrounds and samples, not QA readings. */
    @Override
    public Set<String> readings() {
        return Set.of();
    }

    /** No outcome when the campaign has no backgrounds: its spectra came as absorbance or transmittance. */
    @Override
    public List<CheckOutcome> evaluate(QaInputs inputs) throws IOException {
        if (inputs.backgrounds().isEmpty()) {
            return List.of();
        }
        Duration limit = inputs.settings().duration("background-age-limit");
        Instant first = inputs.firstSample();
        Instant worstSample = inputs.lastSample();
        Instant worst = inputs.backgroundBefore(worstSample);
        for (Instant b : inputs.backgrounds()) {
            if (b.isAfter(first) && b.isBefore(inputs.lastSample())) {
                Instant justBefore = b.minusNanos(1);
                Instant previous = inputs.backgroundBefore(justBefore);
                if (Duration.between(previous, justBefore).compareTo(Duration.between(worst, worstSample)) > 0) {
                    worst = previous;
                    worstSample = justBefore;
                }
            }
        }
        return List.of(new BackgroundAgeCheck(limit).evaluate(worst, worstSample));
    }
}
