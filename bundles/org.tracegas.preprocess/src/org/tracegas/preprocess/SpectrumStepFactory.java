package org.tracegas.preprocess;

import java.util.Map;

/**
 * Creates steps of one kind from their parameters. Contributed through the extension point
 * {@code org.tracegas.preprocess.steps} (attributes id and class; the class needs a public no-argument
 * constructor) or registered directly with a {@link StepRegistry}.
 */
public interface SpectrumStepFactory {

    /** The step id, matching {@link SpectrumStep#id()} of the steps created. */
    String id();

    /**
     * @throws IllegalArgumentException naming the missing, unknown or malformed parameter
     */
    SpectrumStep create(Map<String, String> parameters);
}
