package org.tracegas.report.campaign;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.model.ResultFlag;

/**
 * The stored results of a project's samples as time series, one per compound, read back from the workspace:
 * what the report is made from, so that a report can be made again from stored data alone.
 */
public final class MinuteSeries {

    /**
     * One stored result at its measurement's time.
     *
     * @param conditions what the result was corrected with, null when it was not corrected
     */
    public record Point(Instant time, double ppm, double uncertainty, double detectionLimit,
            Set<ResultFlag> flags, ResultConditions conditions) {
    }

    private final Map<String, List<Point>> byCompound;
    private final String methodVersionId;
    private final String libraryVersionId;

    private MinuteSeries(Map<String, List<Point>> byCompound, String methodVersionId, String libraryVersionId) {
        this.byCompound = byCompound;
        this.methodVersionId = methodVersionId;
        this.libraryVersionId = libraryVersionId;
    }

    /** The results made by one method version, in time order. */
    public static MinuteSeries of(List<Measurement> measurements, List<Result> results,
            String methodVersionId) {
        Map<String, Instant> times = new HashMap<>();
        for (Measurement m : measurements) {
            times.put(m.getId(), m.getTime());
        }
        Map<String, TreeMap<Instant, Point>> sorted = new TreeMap<>();
        String library = null;
        for (Result r : results) {
            if (!r.getProvenance().methodVersionId().equals(methodVersionId)) {
                continue;
            }
            library = r.getProvenance().libraryVersionId();
            Instant t = times.get(r.getMeasurementId());
            if (t == null) {
                throw new IllegalStateException("result " + r.getId() + " names unknown measurement "
                        + r.getMeasurementId());
            }
            sorted.computeIfAbsent(r.getCompound(), c -> new TreeMap<>()).put(t, new Point(t, r.getConcentration(),
                    r.getStandardUncertainty(), r.getDetectionLimit(), flags(r), r.getConditions()));
        }
        Map<String, List<Point>> lists = new TreeMap<>();
        sorted.forEach((c, m) -> lists.put(c, new ArrayList<>(m.values())));
        return new MinuteSeries(lists, methodVersionId, library);
    }

    /** The result's flags as the point keeps them: a copy, so that the series stays as it was read. */
    private static Set<ResultFlag> flags(Result r) {
        return r.getFlags().isEmpty() ? Set.of() : Collections.unmodifiableSet(EnumSet.copyOf(r.getFlags()));
    }

    public boolean isEmpty() {
        return byCompound.isEmpty();
    }

    public List<Point> compound(String name) {
        return byCompound.getOrDefault(name, List.of());
    }

    public int size() {
        return byCompound.values().stream().mapToInt(List::size).max().orElse(0);
    }

    public String methodVersionId() {
        return methodVersionId;
    }

    public String libraryVersionId() {
        return libraryVersionId;
    }
}
