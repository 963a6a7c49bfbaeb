package org.tracegas.ui.jobs;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

import org.eclipse.swt.widgets.Display;

import org.tracegas.pipeline.AnalysisVersions;
import org.tracegas.installation.InstalledSoftware;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.store.Session;
import org.tracegas.ui.parts.ConcentrationTrace;
import org.tracegas.ui.parts.FitDisplay;
import org.tracegas.ui.session.DemoProject.Seeded;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;

/** Builds method runs over a project's measurements and turns their outcomes into what the views draw. */
public final class AnalysisRuns {

    /** Software version recorded with results made at the desk outside an installed product. */
    public static final String SOFTWARE = "Tracegas Workbench 0.1.0";

    private static final java.time.format.DateTimeFormatter SHOWN = java.time.format.DateTimeFormatter
            .ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'").withZone(java.time.ZoneOffset.UTC);

    private AnalysisRuns() {
    }

    /**
     * Runs the desk's project through its method in the background; the desk hears of the outcomes in the UI
     * thread of {@code display}.
     */
    public static void runOnDesk(Display display) {
        Desk desk = Desk.get();
        job(desk.access(), desk.session(), desk.project(),
                outcomes -> display.asyncExec(() -> desk.runFinished(outcomes))).schedule();
    }

    /** A job running the project's method over all its measurements and recording the results. */
    public static BatchQuantificationJob job(WorkspaceAccess access, Session session, Seeded project,
            Consumer<List<BatchQuantificationJob.Outcome>> whenDone) {
        QuantificationMethod method = project.method().method();
        Quantifier quantifier = project.method().quantifier(project.samples().get(0).axis(), software(), true);
        List<BatchQuantificationJob.Item> items = new ArrayList<>();
        for (int i = 0; i < project.measurementIds().size(); i++) {
            items.add(new BatchQuantificationJob.Item(project.measurementIds().get(i),
                    method.name() + " — measurement " + (i + 1) + ", "
                            + SHOWN.format(project.measurementTimes().get(i)), project.samples().get(i)));
        }
        return new BatchQuantificationJob("Running " + method.name(), quantifier, items,
                new BatchQuantificationJob.Target(access.store(), session, project.projectId(),
                        new AnalysisVersions(project.methodVersionId(), project.libraryVersionId())), whenDone);
    }

    /**
     * Software version recorded with results made at the desk: the installation's release and its add-ons with
     * versions (see InstalledSoftware), or {@link #SOFTWARE} outside an installed product.
     */
    public static String software() {
        return InstalledSoftware.describeRunning(SOFTWARE);
    }

    /** The fit of one outcome for the spectrum view. */
    public static FitDisplay fit(BatchQuantificationJob.Outcome o) {
        return FitDisplay.of(o.item().label(), o.item().absorbance(), o.result().compounds());
    }

    /** Each compound's concentrations over the outcomes, hours counted from {@code start}. */
    public static List<ConcentrationTrace> traces(List<BatchQuantificationJob.Outcome> outcomes,
            List<Instant> times, Instant start) {
        Map<String, double[]> values = new LinkedHashMap<>();
        Map<String, BitSet> flags = new LinkedHashMap<>();
        double[] hours = new double[outcomes.size()];
        for (int i = 0; i < outcomes.size(); i++) {
            hours[i] = Duration.between(start, times.get(i)).toMillis() / 3.6e6;
            for (CompoundResult c : outcomes.get(i).result().compounds()) {
                values.computeIfAbsent(c.compound(), k -> new double[outcomes.size()])[i] = c.concentration();
                if (!c.flags().isEmpty()) {
                    flags.computeIfAbsent(c.compound(), k -> new BitSet()).set(i);
                }
            }
        }
        List<ConcentrationTrace> traces = new ArrayList<>();
        values.forEach((compound, v) -> traces.add(new ConcentrationTrace(compound, "ppm", hours, v,
                flags.getOrDefault(compound, new BitSet()))));
        return traces;
    }
}
