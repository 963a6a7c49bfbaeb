package org.tracegas.store;

import java.util.List;

/**
 * Stores blocks of processed spectra: for each, its measurement row, its absorbance array, its results and,
 * when its instrument is known, the link to that instrument, all of a block in one transaction with batched
 * inserts. Each measurement gets one audit record whose values name what was stored with it: the spectrum's id,
 * axis, encoding and SHA-256 of its value bytes, the result ids, the SHA-256 of the results and the instrument's
 * id (key {@code instrument}, absent when not known); the record binds all these rows.
 * <p>
 * The {@code resultsSha256} value lets an auditor check the stored results against the record: it is the
 * SHA-256 (hex) of the UTF-8 bytes of the concatenated {@link org.tracegas.audit.AuditValues#canonical
 * canonical values} of each result, in the order of {@code resultIds}, with the keys compound,
 * concentration, detectionLimit, flags (names joined by commas), id, inputHash, libraryVersion, measurement,
 * methodVersion, project, softwareVersion, uncertainty and unit: the values a single
 * {@link ResultService#record} writes into its own audit record, plus the result's id.
 */
public interface BlockService {

    /**
     * Stores a block: all of it or, on any failure, nothing. The method and library versions named by the
     * results are checked and frozen as {@link ResultService#record} does.
     *
     * @param block the processed spectra, at least one
     * @return what was created, one entry per processed spectrum in input order
     * @throws IllegalArgumentException naming the index ({@code block[i].results[j]...}) of a wrong entry
     * @throws AccessDeniedException    without write access to the project
     * @throws NoSuchObjectException    if the project, a named version or a named instrument does not exist
     */
    List<StoredMeasurement> store(Session actor, String projectId, List<ProcessedSpectrum> block);

    /**
     * The first half of {@link #store(Session, String, List)} without the database: assigns the ids, encodes
     * the rows as they are stored (times to the microsecond), hashes them for the audit binding and makes the
     * audit records. It may run on any thread, so that a batch encodes one block while the previous one is
     * being written; the results are recorded at the time of this call.
     *
     * @param block the processed spectra, at least one
     * @throws IllegalArgumentException naming the wrong argument or the index ({@code block[i]}) of a null entry
     */
    EncodedBlock encode(Session actor, String projectId, List<ProcessedSpectrum> block);

    /**
     * The second half of {@link #store(Session, String, List)}: stores a block encoded by {@link #encode}, all
     * of it or, on any failure, nothing, with the access of the actor it was encoded for.
     *
     * @return what was created, one entry per processed spectrum in input order
     * @throws IllegalArgumentException if the block was not encoded by this store, or as for
     *                                  {@link #store(Session, String, List)}
     * @throws AccessDeniedException    without write access to the project
     * @throws NoSuchObjectException    if the project or a named version does not exist
     */
    List<StoredMeasurement> store(EncodedBlock block);
}
