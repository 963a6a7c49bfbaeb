package org.tracegas.store;

import java.util.List;

import org.tracegas.model.Result;

/**
 * Concentration results, each pointing at the exact method and library versions that made it. The results given
 * are not changed: what comes back are the stored results, with id, project, who recorded them and when.
 */
public interface ResultService {

    /**
     * Records a result and freezes the method and library versions it names.
     *
     * @throws IllegalArgumentException if the result is incomplete ({@link ResultChecks#requireComplete}), the
     *                                  method version is not a method's or the library version is not a
     *                                  library's
     * @throws AccessDeniedException    without write access to the project
     */
    Result record(Session actor, String projectId, Result result);

    /** @throws AccessDeniedException without read access to the project */
    List<Result> results(Session actor, String projectId);

    /**
     * The results stored for one measurement, in the order {@link #results} gives them; found by the measurement,
     * so the time it takes does not grow with the project.
     *
     * @throws NoSuchObjectException if there is no such measurement
     * @throws AccessDeniedException without read access to its project
     */
    List<Result> ofMeasurement(Session actor, String measurementId);

    /**
     * Records several results in one transaction, each with its audit record: all of them or none. The batch
     * path stores a spectrum's results together this way.
     */
    List<Result> recordAll(Session actor, String projectId, List<Result> results);
}
