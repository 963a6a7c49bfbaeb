package org.tracegas.store;

import java.util.List;

import org.tracegas.model.QaOutcome;

/**
 * The QA checks of a project, stored with the campaign so that its report can be made again from stored data.
 * The outcomes given are not changed: what comes back are the stored outcomes, with id, project, method version,
 * who recorded them and when.
 */
public interface QaService {

    /**
     * Stores the outcomes of one evaluation of a project's QA checks in one transaction, each with its audit
     * record, pointing at the method version they were made with (which is frozen from then on).
     *
     * @throws IllegalArgumentException naming the outcome and field that is blank (check, rule, source; the unit
     *                                  may be empty but not missing), limits that are not numbers, or a version
     *                                  that is not a method's; nothing is stored then
     */
    List<QaOutcome> recordAll(Session actor, String projectId, String methodVersionId, List<QaOutcome> checks);

    /** The stored QA checks of a project, in the order they were recorded. */
    List<QaOutcome> checks(Session actor, String projectId);
}
