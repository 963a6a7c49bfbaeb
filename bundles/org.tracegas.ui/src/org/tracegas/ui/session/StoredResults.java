package org.tracegas.ui.session;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.SubMonitor;

import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.parts.ConcentrationTrace;

/** A project's stored results as concentration traces over the time of their measurements. */
public final class StoredResults {

    /** The traces and the time their hours count from (null when there are none). */
    public record Traces(List<ConcentrationTrace> traces, Instant start) {
    }

    private record Point(Instant time, Result result) {
    }

    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'")
            .withZone(ZoneOffset.UTC);

    private StoredResults() {
    }

    /** The heading of a project's stored traces. */
    public static String title(String projectCode, Traces traces) {
        return "Stored results of " + projectCode + " from " + SHOWN.format(traces.start());
    }

    /**
     * One trace per compound, in the order compounds first appear, hours counted from the earliest measurement
     * with a result. Results without a measurement have no time and are left out; results carrying a flag are
     * marked. Meant for a background job: it stops between its steps when the monitor is cancelled.
     *
     * @throws org.eclipse.core.runtime.OperationCanceledException when the monitor was cancelled
     */
    public static Traces traces(WorkspaceStore store, Session actor, String projectId, IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, "Reading stored results", 3);
        progress.split(1);
        Map<String, Instant> times = new HashMap<>();
        for (Measurement m : store.projects().measurements(actor, projectId)) {
            times.put(m.getId(), m.getTime());
        }
        progress.split(1);
        List<Result> results = store.results().results(actor, projectId);
        progress.split(1);
        Map<String, List<Point>> byCompound = new LinkedHashMap<>();
        Instant start = null;
        for (Result r : results) {
            Instant t = r.getMeasurementId() == null ? null : times.get(r.getMeasurementId());
            if (t != null) {
                byCompound.computeIfAbsent(r.getCompound(), k -> new ArrayList<>()).add(new Point(t, r));
                start = start == null || t.isBefore(start) ? t : start;
            }
        }
        List<ConcentrationTrace> traces = new ArrayList<>();
        for (Map.Entry<String, List<Point>> e : byCompound.entrySet()) {
            List<Point> points = e.getValue();
            points.sort(Comparator.comparing(Point::time));
            double[] hours = new double[points.size()];
            double[] values = new double[points.size()];
            BitSet flagged = new BitSet();
            List<String> ids = new ArrayList<>();
            for (int i = 0; i < points.size(); i++) {
                hours[i] = Duration.between(start, points.get(i).time()).toMillis() / 3.6e6;
                values[i] = points.get(i).result().getConcentration();
                ids.add(points.get(i).result().getMeasurementId());
                if (!points.get(i).result().getFlags().isEmpty()) {
                    flagged.set(i);
                }
            }
            traces.add(new ConcentrationTrace(e.getKey(), points.get(0).result().getUnit(), hours, values,
                    flagged, ids));
        }
        return new Traces(List.copyOf(traces), start);
    }
}
