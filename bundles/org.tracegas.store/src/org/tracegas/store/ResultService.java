package org.tracegas.store;

import java.util.List;

/** Concentration results, each pointing at the exact method and library versions that made it. */
public interface ResultService {

    /**
     * Records a result and freezes the method and library versions it names.
     *
     * @throws IllegalArgumentException if the method version is not a method's or the library version is
     *                                  not a library's
     * @throws AccessDeniedException    without write access to the project
     */
    ResultInfo record(Session actor, String projectId, NewResult result);

    /** @throws AccessDeniedException without read access to the project */
    List<ResultInfo> results(Session actor, String projectId);

    /**
     * Records several results in one transaction, each with its audit record: all of them or none. The batch
     * path stores a spectrum's results together this way.
     */
    List<ResultInfo> recordAll(Session actor, String projectId, List<NewResult> results);
}
