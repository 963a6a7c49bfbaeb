package org.tracegas.importer.example;

import java.io.IOException;
import java.time.Duration;
import java.util.List;
import java.util.Set;

import org.tracegas.qa.checks.AcceptanceLimits;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;
import org.tracegas.qa.checks.Rule;

/**
 * A leak check of the sampling cell, as an example of a QA check a lab contributes: the cell is evacuated and
 * sealed, and readings of the role {@value #ROLE} record its pressure as it rises. The rise per minute between
 * the first and the last of them, as a percentage of the barometric pressure the QA plan states (key
 * {@code barometric-pressure}, kPa), must stay below the limit.
 */
public final class CellLeakCheck implements QaCheck {

    /** Role of the readings of the sealed cell. */
    public static final String ROLE = "leak-check";
    /** The largest pressure rise per minute, % of the barometric pressure. */
    public static final double LIMIT_PERCENT_PER_MINUTE = 4.0;

    @Override
    public String name() {
        return "cell-leak";
    }

    @Override
    public Set<String> readings() {
        return Set.of(ROLE);
    }

    @Override
    public Set<String> settings() {
        return Set.of("barometric-pressure");
    }

    /** @throws IllegalArgumentException if the barometric pressure is not positive or the readings span no time */
    @Override
    public List<CheckOutcome> evaluate(QaInputs inputs) throws IOException {
        List<QaReading> sealed = inputs.readings(ROLE);
        if (sealed.size() < 2) {
            return List.of();
        }
        double barometric = inputs.settings().number("barometric-pressure");
        if (!(barometric > 0)) {
            throw new IllegalArgumentException("barometric-pressure must be positive, was " + barometric + " kPa");
        }
        QaReading first = sealed.get(0);
        QaReading last = sealed.get(sealed.size() - 1);
        double minutes = Duration.between(first.time(), last.time()).toMillis() / 60_000.0;
        if (!(minutes > 0)) {
            throw new IllegalArgumentException("the leak-check readings span no time: all at " + first.time());
        }
        double percentPerMinute = (last.cellPressureKPa() - first.cellPressureKPa()) / barometric * 100 / minutes;
        return List.of(CheckOutcome.judge("Cell leak rate", percentPerMinute, "% of barometric per min",
                AcceptanceLimits.atMost(LIMIT_PERCENT_PER_MINUTE), new Rule("the sealed, evacuated cell's pressure "
                        + "rises by less than 4 % of the barometric pressure per minute",
                        "EPA field-test leak-check checklist: %VL = (dP/Pb) x 100 over 1 min, < 4 % "
                                + "(nepis.epa.gov, Dockey 9100AWUC)")));
    }
}
