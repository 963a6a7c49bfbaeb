package org.tracegas.store;

import java.util.List;
import java.util.stream.Stream;

/**
 * Spectral arrays of a project, stored as little-endian binary numbers with the axis as first, step and
 * size (or as an explicit binary axis). They are read back as {@link org.tracegas.model.ProcessedSpectrum}s of
 * the workspace model (named in full: this package's {@link ProcessedSpectrum} is what a block writes).
 */
public interface SpectrumService {

    /** @return the stored array's id */
    String store(Session actor, String projectId, SpectrumInput spectrum);

    /**
     * Stores many spectra in one transaction: all of them or, on any failure, none.
     *
     * @return the ids, in input order
     */
    List<String> storeAll(Session actor, String projectId, List<SpectrumInput> spectra);

    /**
     * Reads one array with its values.
     *
     * @throws NoSuchObjectException if there is no such array
     */
    org.tracegas.model.ProcessedSpectrum load(Session actor, String dataId);

    /**
     * The spectra stored for one measurement, with their values, in storage order; found by the measurement, so
     * the time it takes does not grow with the project.
     *
     * @throws NoSuchObjectException if there is no such measurement
     * @throws AccessDeniedException without read access to its project
     */
    List<org.tracegas.model.ProcessedSpectrum> ofMeasurement(Session actor, String measurementId);

    /**
     * All spectra of a project in storage order, read row by row from a database cursor: only a few rows
     * are held at a time. The stream holds a database connection: close it (try-with-resources).
     */
    Stream<org.tracegas.model.ProcessedSpectrum> stream(Session actor, String projectId);
}
