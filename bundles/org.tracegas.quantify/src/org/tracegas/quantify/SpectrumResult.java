package org.tracegas.quantify;

import java.util.List;
import java.util.Optional;

/**
 * Results of all analytes of a method for one spectrum, with the record of what they were computed from.
 *
 * @param compounds one result per analyte, in the method's analyte order
 * @param record    method, library, software and input identity
 */
public record SpectrumResult(List<CompoundResult> compounds, ReprocessingRecord record) {

    public SpectrumResult {
        compounds = List.copyOf(compounds);
    }

    public Optional<CompoundResult> compound(String name) {
        return compounds.stream().filter(c -> c.compound().equals(name)).findFirst();
    }
}
