package org.tracegas.qa.checks;

import java.io.IOException;
import java.time.Duration;
import java.util.List;

/**
 * The key = value settings of a QA plan. Every method throws an {@link IOException} naming the plan file, the
 * line and the key when the key is missing or its value is not of the kind asked for.
 */
public interface QaSettings {

    boolean has(String key);

    String text(String key) throws IOException;

    double number(String key) throws IOException;

    /** A comma-separated list. */
    List<String> words(String key) throws IOException;

    /** A range written "low..high": {low, high}. */
    double[] range(String key) throws IOException;

    /** A duration with its unit, for example "24 h". */
    Duration duration(String key) throws IOException;
}
