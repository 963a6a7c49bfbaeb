package org.tracegas.pipeline.shared;

import java.util.List;

import org.tracegas.quantify.CancellationFlag;
import org.tracegas.store.ProcessedSpectrum;

/**
 * Turns the payload of one work unit into the block of processed spectra that is stored together with the
 * unit's completion. For container files, {@code (payload, cancel) ->
 * stackProcessor.process(List.of(Path.of(payload)), cancel)}.
 */
@FunctionalInterface
public interface UnitProcessor {

    /**
     * @param payload the unit's payload as the batch was created with, e.g. a file path
     * @param cancel  set when the worker is stopped or has lost the unit's lease: return soon; whatever is
     *                returned then is dropped, not stored
     * @return the unit's processed spectra, possibly none
     * @throws Exception if the payload cannot be processed; the worker gives the unit back and stops
     */
    List<ProcessedSpectrum> process(String payload, CancellationFlag cancel) throws Exception;
}
