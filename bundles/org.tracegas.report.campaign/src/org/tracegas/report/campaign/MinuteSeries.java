package org.tracegas.report.campaign;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.tracegas.model.ResultFlag;
import org.tracegas.store.MeasurementInfo;
import org.tracegas.store.ResultConditions;
import org.tracegas.store.ResultInfo;

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
            java.util.Set<ResultFlag> flags, ResultConditions conditions) {
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
    public static MinuteSeries of(List<MeasurementInfo> measurements, List<ResultInfo> results,
            String methodVersionId) {
        Map<String, Instant> times = new HashMap<>();
        for (MeasurementInfo m : measurements) {
            times.put(m.id(), m.time());
        }
        Map<String, TreeMap<Instant, Point>> sorted = new TreeMap<>();
        String library = null;
        for (ResultInfo r : results) {
            if (!r.values().methodVersionId().equals(methodVersionId)) {
                continue;
            }
            library = r.values().libraryVersionId();
            Instant t = times.get(r.values().measurementId());
            if (t == null) {
                throw new IllegalStateException("result " + r.id() + " names unknown measurement "
                        + r.values().measurementId());
            }
            sorted.computeIfAbsent(r.values().compound(), c -> new TreeMap<>()).put(t, new Point(t,
                    r.values().concentration(), r.values().uncertainty(), r.values().detectionLimit(),
                    r.values().flags(), r.values().conditions()));
        }
        Map<String, List<Point>> lists = new TreeMap<>();
        sorted.forEach((c, m) -> lists.put(c, new ArrayList<>(m.values())));
        return new MinuteSeries(lists, methodVersionId, library);
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
