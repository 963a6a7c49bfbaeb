package org.tracegas.store;

import java.util.List;

/**
 * What storing one processed spectrum created.
 *
 * @param measurementId the new measurement
 * @param spectrumId    the stored absorbance array
 * @param resultIds     the new results, in the order given
 */
public record StoredMeasurement(String measurementId, String spectrumId, List<String> resultIds) {

    public StoredMeasurement {
        resultIds = List.copyOf(resultIds);
    }
}
