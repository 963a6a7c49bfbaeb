package org.tracegas.store;

import java.util.List;

/** The QA checks of a project, stored with the campaign so that its report can be made again from stored data. */
public interface QaService {

    /**
     * Stores the outcomes of one evaluation of a project's QA checks in one transaction, each with its audit
     * record, pointing at the method version they were made with (which is frozen from then on).
     */
    List<QaCheckInfo> recordAll(Session actor, String projectId, String methodVersionId, List<NewQaCheck> checks);

    /** The stored QA checks of a project, in the order they were recorded. */
    List<QaCheckInfo> checks(Session actor, String projectId);
}
