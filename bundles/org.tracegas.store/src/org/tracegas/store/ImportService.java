package org.tracegas.store;

import java.util.List;
import java.util.Optional;

import org.tracegas.model.Measurement;

/**
 * The lab's own files in a project: each kept whole under the SHA-256 of its bytes, each of its records a
 * measurement that names the file. Importing the same bytes again adds nothing.
 */
public interface ImportService {

    /**
     * Stores a file with its measurements and their spectra in one transaction: all of it or nothing. Each
     * measurement gets an audit record naming the file (name and SHA-256), the record and the stored spectrum;
     * the file gets one naming its measurements. When the project holds the same bytes already, nothing is
     * stored and the file as first imported is returned, with {@link ImportedFile#added()} false.
     *
     * @param measurements the file's records, at least one, in file order: each with kind, time, cell
     *                     conditions, title, labels, content and spectrum (see
     *                     {@link MeasurementChecks#requireImportable}); the store sets nothing in them
     * @throws IllegalArgumentException naming the index (and field) of a missing or incomplete measurement, or
     *                                  if there is none
     * @throws AccessDeniedException    without write access to the project
     */
    ImportedFile importFile(Session actor, String projectId, RawFile file, List<Measurement> measurements);

    /**
     * The file of the project with these bytes, if it was imported.
     *
     * @throws AccessDeniedException without read access to the project
     */
    Optional<ImportedFile> find(Session actor, String projectId, String sha256);

    /**
     * The bytes of an imported file, exactly as imported.
     *
     * @throws NoSuchObjectException if the project holds no file with this SHA-256
     * @throws AccessDeniedException without read access to the project
     */
    byte[] content(Session actor, String projectId, String sha256);

    /**
     * The project's measurements imported from files, in time order (then file and record), each in the project
     * and with its title, labels, content, stored spectrum and source file (name, SHA-256 and record).
     *
     * @throws AccessDeniedException without read access to the project
     */
    List<Measurement> measurements(Session actor, String projectId);
}
