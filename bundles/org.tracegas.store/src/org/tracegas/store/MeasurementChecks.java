package org.tracegas.store;

import java.time.Instant;

import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.SpectralContent;

/**
 * The checks every new measurement's fields pass, whichever way it is stored: the store applies them where a
 * measurement comes in, and a reader may apply them first to name the file and record at fault.
 */
public final class MeasurementChecks {

    private MeasurementChecks() {
    }

    /** @throws IllegalArgumentException naming the field that is missing or wrong */
    static void require(MeasurementKind kind, Instant time, double cellTemperature, double cellPressure) {
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null");
        }
        if (time == null) {
            throw new IllegalArgumentException("time must not be null");
        }
        if (!(cellTemperature > 0)) {
            throw new IllegalArgumentException("cellTemperature must be a positive number of K, was "
                    + cellTemperature);
        }
        if (!(cellPressure > 0)) {
            throw new IllegalArgumentException("cellPressure must be a positive number of hPa, was " + cellPressure);
        }
    }

    /**
     * Checks a measurement read from a file before {@link ImportService#importFile} stores it: kind, time and
     * positive cell conditions, a title, what its values are and the values themselves.
     *
     * @throws IllegalArgumentException naming the field that is missing or wrong
     */
    public static void requireImportable(Measurement m) {
        if (m == null) {
            throw new IllegalArgumentException("measurement must not be null");
        }
        require(m.getKind(), m.getTime(), m.getCellTemperature(), m.getCellPressure());
        if (m.getTitle() == null || m.getTitle().isBlank()) {
            throw new IllegalArgumentException("title must not be blank");
        }
        if (!m.isSetContent() || m.getContent() == SpectralContent.RESIDUAL) {
            throw new IllegalArgumentException("content must be interferogram, single beam, transmittance or"
                    + " absorbance, was " + (m.isSetContent() ? m.getContent() : null));
        }
        if (m.getSpectrum() == null) {
            throw new IllegalArgumentException("spectrum must not be null");
        }
    }
}
