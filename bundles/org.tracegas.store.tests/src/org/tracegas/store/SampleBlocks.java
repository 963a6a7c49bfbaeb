package org.tracegas.store;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** Small processed spectra whose values follow from their index, so a test can tell each one apart. */
final class SampleBlocks {

    static final Instant START = Instant.parse("2026-03-17T08:00:00Z");
    static final String[] COMPOUNDS = {"CO", "NO", "SO2", "HCl"};
    /** SHA-256 of the empty string: FIPS 180-4 test vectors (NIST CAVP, SHA256ShortMsg, Len = 0). */
    static final String SHA256_OF_EMPTY = "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855";

    private SampleBlocks() {
    }

    /**
     * Spectrum number {@code index}: measured {@code index} minutes after {@link #START}, 32 absorbance values
     * starting at {@code index}, and {@code results} results (at most 4) whose concentration is
     * {@code index + compound number / 10}; the results of an odd-numbered spectrum carry the conditions they
     * were corrected with, those of an even-numbered one none (as results stored before corrections were).
     */
    static ProcessedSpectrum processed(int index, int results, String methodVersionId, String libraryVersionId) {
        double[] values = new double[32];
        for (int k = 0; k < values.length; k++) {
            values[k] = index + k / 64.0;
        }
        Spectrum absorbance = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000.0, 0.5, values.length),
                values, Ordinate.ABSORBANCE);
        List<Result> rows = new ArrayList<>();
        ResultConditions conditions = index % 2 == 0 ? null
                : new ResultConditions(438.15 + index, "instrument-channel", 101.3, "instrument-channel", 6.4,
                        "nominal", 423.15, 101.325, 6.4, (438.15 + index) / 423.15 * 101.325 / 101.3, 1.96,
                        "transform of the method: happ-genzel; zero filling 2; single-sided");
        Provenance provenance = new Provenance(methodVersionId, libraryVersionId, "0.1.0", SHA256_OF_EMPTY);
        for (int j = 0; j < results; j++) {
            rows.add(Results.of(null, COMPOUNDS[j], index + j / 10.0, 0.5, 0.2, "ppm",
                    j == 1 ? Set.of(ResultFlag.HIGH_RESIDUAL) : Set.of(), provenance, conditions));
        }
        return new ProcessedSpectrum(MeasurementKind.SAMPLE, START.plusSeconds(60L * index), 438.15, 1013.0,
                absorbance, SampleEncoding.FLOAT64_LE, rows, null);
    }

    /** Spectra number {@code first} to {@code first + count - 1}, each with {@code results} results. */
    static List<ProcessedSpectrum> block(int first, int count, int results, String methodVersionId,
            String libraryVersionId) {
        List<ProcessedSpectrum> block = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            block.add(processed(first + i, results, methodVersionId, libraryVersionId));
        }
        return block;
    }

    /** The spectra as recorded by the stored instrument of that id. */
    static List<ProcessedSpectrum> madeBy(String instrumentId, List<ProcessedSpectrum> block) {
        return block.stream().map(p -> new ProcessedSpectrum(p.kind(), p.time(), p.cellTemperature(),
                p.cellPressure(), p.absorbance(), p.encoding(), p.results(), instrumentId)).toList();
    }
}
