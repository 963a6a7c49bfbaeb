package org.tracegas.pipeline;

import java.util.List;
import java.util.OptionalDouble;

import org.tracegas.method.MethodRecipe;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * A stored method version made ready for stack files: each sample transformed as the version says, ratioed
 * against the last background before it and fitted on all cores, its results pointing at the method and library
 * versions. One place for this, so that a project processed in one run and one split into work units among
 * several runners give the same results.
 */
public final class QuantificationSetup {

    private final SpectrumChain chain;
    private final BatchQuantifier quantifier;
    private final AnalysisVersions versions;
    private final ResultCorrection correction;

    /**
     * A method whose results are corrected to its nominal path.
     *
     * @param backgrounds at least one, taken before the first sample
     * @param software    named in each result's reprocessing record
     * @throws IllegalArgumentException if there is no background, or the method takes its path from a CTS
     */
    public QuantificationSetup(ContentVersion methodVersion, StoredMethod method, List<Background> backgrounds,
            String software) {
        this(methodVersion, method, backgrounds, software, OptionalDouble.empty());
    }

    /**
     * @param backgrounds at least one, taken before the first sample
     * @param software    named in each result's reprocessing record
     * @param ctsPathM    the effective path the campaign's CTS readings measured ({@code CtsPath}), in m: required
     *                    by a method whose path source is CTS-derived, refused by one whose path is nominal
     * @throws IllegalArgumentException if there is no background, the CTS path is missing or not wanted, or the
     *                                  method has [recipe] steps
     */
    public QuantificationSetup(ContentVersion methodVersion, StoredMethod method, List<Background> backgrounds,
            String software, OptionalDouble ctsPathM) {
        requireNoRecipeSteps(method);
        boolean fromCts = method.pathSource() == PathOrigin.CTS_DERIVED;
        if (fromCts != ctsPathM.isPresent()) {
            throw new IllegalArgumentException(fromCts ? "method " + method.method().name() + " takes its path from "
                    + "the campaign's CTS readings: give the QA plan and the QA file with them"
                    : "method " + method.method().name() + " corrects to its nominal path: a CTS-derived path is "
                            + "not used (path-source = cts-derived in the method would use it)");
        }
        if (backgrounds.isEmpty()) {
            throw new IllegalArgumentException("backgrounds must hold at least one background");
        }
        BackgroundTimeline timeline = new BackgroundTimeline(backgrounds);
        chain = new SpectrumChain(new InterferogramTransform(method.transform()), new BackgroundRatio(), timeline);
        quantifier = BatchQuantifier.onAllCores(
                method.quantifier(timeline.all().get(0).singleBeam().axis(), software, false));
        versions = new AnalysisVersions(methodVersion.getId(), method.libraryVersionId());
        correction = fromCts ? ResultCorrection.of(method).withCtsPath(ctsPathM.getAsDouble())
                : ResultCorrection.of(method);
    }

    /**
     * Refuses a method with [recipe] steps: the stream of container records runs the transform and the ratio
     * only, and results that name a method version must come from everything that version says.
     *
     * @throws IllegalArgumentException naming the method and its steps
     */
    public static void requireNoRecipeSteps(StoredMethod method) {
        List<String> steps = MethodRecipe.steps(method.recipe());
        if (!steps.isEmpty()) {
            throw new IllegalArgumentException("method " + method.method().name() + " has [recipe] steps "
                    + steps + ", which the stream of interferogram containers does not run: import the records "
                    + "as measurements and quantify those, which runs the recipe");
        }
    }

    /**
     * The processor storing into a project of the workspace as the actor.
     *
     * @param instrumentId the stored instrument that recorded the files, each measurement stored with it; null
     *                     when not known
     */
    public StackProcessor processor(WorkspaceStore store, Session actor, String projectId, String instrumentId) {
        return new StackProcessor(store, actor, projectId, chain, quantifier, versions, correction, instrumentId,
                StackProcessor.DEFAULT_BLOCK_SIZE);
    }
}
