package org.tracegas.store;

import java.util.List;

import org.tracegas.model.Report;

/**
 * The reports issued from a project, so that years later it can be told which reports were issued, from which
 * method and library versions, by whom and with which content hash: the hash the review and approval
 * signatures given on the report's id are stored with (see {@link ReviewService#signatures}).
 */
public interface ReportService {

    /**
     * Records one issue of a report, with its audit record. Whoever may read the project may issue its report
     * (a reviewer writes it out to sign it). The report given is not changed: what comes back is the stored
     * report, with id, project, the issuing user and the time of issue (now).
     *
     * @param report report id, title, content SHA-256, file name, method and library version ids, and the page
     *               count if known
     * @throws IllegalArgumentException naming the field that is missing or wrong (a blank text, a hash that is not
     *                                  64 lower-case hex digits, a page count below 1, a version that is not a
     *                                  method's or a library's); nothing is stored then
     * @throws NoSuchObjectException    if a version does not exist
     * @throws AccessDeniedException    if the user may not read the project
     */
    Report record(Session actor, String projectId, Report report);

    /** The reports issued from a project, in the order they were issued. */
    List<Report> reports(Session actor, String projectId);
}
