package org.tracegas.qa.checks;

import java.io.IOException;
import java.util.List;
import java.util.Set;

/**
 * One QA check of a campaign, named in a QA plan and contributed through the extension point
 * {@value QaCheckRegistry#EXTENSION_POINT}. Implementations are stateless and have a public no-argument
 * constructor; everything a check judges comes from its {@link QaInputs}.
 */
public interface QaCheck {

    /** The word a QA plan names the check by in its {@code checks} key, for example "cts-drift". */
    String name();

    /**
     * The roles of the QA readings the check judges, as the acquisition headers state them (for example "cts",
     * "zero"); a check whose readings were not made gives no outcome.
     */
    Set<String> readings();

    /** Keys of the QA plan the check reads besides those every plan has; the plan accepts them when it names the check. */
    default Set<String> settings() {
        return Set.of();
    }

    /**
     * The outcomes, in the order they are stored and reported.
     *
     * @throws IOException naming the plan file, line and key when a setting the check reads is malformed, or an
     *                     input it needs (such as a reference) is missing
     */
    List<CheckOutcome> evaluate(QaInputs inputs) throws IOException;
}
