package org.tracegas.store;

import java.util.List;
import java.util.Set;

/**
 * Analyses of measurements already in a project (imported from the lab's files): each stores the absorbance
 * fitted and the results, each result naming the processing recipe that ran.
 */
public interface AnalysisService {

    /**
     * Stores analyses in one transaction: all of them or nothing. Each measurement analysed gets an audit
     * record naming its absorbance (id and SHA-256), the recipe (SHA-256) and its results (ids and SHA-256 as
     * {@link BlockService} documents). The method and library versions are checked and frozen as
     * {@link ResultService#record} does.
     *
     * @param analyses at least one
     * @return per analysis, the stored absorbance and result ids, in input order
     * @throws IllegalArgumentException naming the index of a wrong entry, or a measurement of another project
     * @throws AccessDeniedException    without write access to the project
     */
    List<StoredMeasurement> store(Session actor, String projectId, List<MeasurementAnalysis> analyses);

    /**
     * The measurements of the project that hold results of a method version.
     *
     * @throws AccessDeniedException without read access to the project
     */
    Set<String> analysed(Session actor, String projectId, String methodVersionId);

    /**
     * The project's results with the time and source file of their measurement and their recipe, in
     * measurement time order (then by compound).
     *
     * @throws AccessDeniedException without read access to the project
     */
    List<ResultRow> rows(Session actor, String projectId);

    /**
     * The canonical text of a recipe recorded with results.
     *
     * @throws NoSuchObjectException if no result names it
     */
    String recipe(Session actor, String sha256);
}
