package org.tracegas.importer.sidechannel;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Side-channel values assigned to one spectrum.
 *
 * @param values  value per channel name, in column order
 * @param units   unit per channel name
 * @param how     how the values were found, e.g. "nearest sample 2026-11-30T10:15:00Z (line 7)"
 */
public record JoinedValues(Map<String, Double> values, Map<String, String> units, String how) {

    public JoinedValues {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
        units = Collections.unmodifiableMap(new LinkedHashMap<>(units));
    }

    /** The value of a channel. @throws IllegalArgumentException naming the channels present if absent */
    public double get(String channel) {
        Double v = values.get(channel);
        if (v == null) {
            throw new IllegalArgumentException("no channel '" + channel + "'; channels: " + values.keySet());
        }
        return v;
    }
}
