package org.tracegas.importer.container;

import java.time.Instant;
import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;

/**
 * Acquisition metadata of one interferogram in the container.
 *
 * @param zpdIndex           0-based index of the sample at zero path difference
 * @param kind               sample or background
 * @param time               start of the acquisition, UTC
 * @param cellTemperatureK   gas cell temperature in kelvin
 * @param cellPressureHpa    gas cell pressure in hPa
 * @param pathLengthM        optical path length through the gas in metres
 * @param extra              free key/value pairs; keys of letters, digits, '.', '_' and '-'
 */
public record AcquisitionHeader(int zpdIndex, SampleKind kind, Instant time, double cellTemperatureK,
        double cellPressureHpa, double pathLengthM, Map<String, String> extra) {

    public AcquisitionHeader {
        if (zpdIndex < 0) {
            throw new IllegalArgumentException("zpdIndex must not be negative, was " + zpdIndex);
        }
        if (kind == null || time == null) {
            throw new IllegalArgumentException("kind and time must not be null");
        }
        requirePositive("cellTemperatureK", cellTemperatureK);
        requirePositive("cellPressureHpa", cellPressureHpa);
        requirePositive("pathLengthM", pathLengthM);
        if (extra == null) {
            throw new IllegalArgumentException("extra must not be null");
        }
        for (Map.Entry<String, String> e : extra.entrySet()) {
            if (!e.getKey().matches("[A-Za-z0-9._-]+") || ContainerFormat.RESERVED_KEYS.contains(e.getKey())) {
                throw new IllegalArgumentException("extra key '" + e.getKey()
                        + "' must be letters, digits, '.', '_' or '-' and not a reserved key");
            }
            if (e.getValue() == null || e.getValue().contains("\n") || e.getValue().contains("\r")) {
                throw new IllegalArgumentException("extra value of '" + e.getKey() + "' must be one line");
            }
        }
        extra = Collections.unmodifiableMap(new TreeMap<>(extra));
    }

    private static void requirePositive(String name, double v) {
        if (!(v > 0 && Double.isFinite(v))) {
            throw new IllegalArgumentException(name + " must be positive and finite, was " + v);
        }
    }
}
