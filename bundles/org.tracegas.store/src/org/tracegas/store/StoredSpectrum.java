package org.tracegas.store;

import org.tracegas.model.SpectralContent;
import org.tracegas.spectrum.Spectrum;

/**
 * A spectrum read back from the store.
 *
 * @param dataId        the stored array's id
 * @param measurementId the measurement, or null
 * @param sha256        SHA-256, hex, of the stored value bytes
 */
public record StoredSpectrum(String dataId, String measurementId, SpectralContent content, Spectrum spectrum,
        SampleEncoding encoding, String sha256) {
}
