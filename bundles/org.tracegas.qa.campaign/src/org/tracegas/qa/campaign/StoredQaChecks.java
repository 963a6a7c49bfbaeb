package org.tracegas.qa.campaign;

import java.util.List;

import org.tracegas.model.QaOutcome;
import org.tracegas.model.QaOutcomes;
import org.tracegas.qa.checks.AcceptanceLimits;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.Rule;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** A campaign's QA outcomes kept in the workspace, so that its report is made again from stored data. */
public final class StoredQaChecks {

    private StoredQaChecks() {
    }

    public static void store(WorkspaceStore store, Session actor, String projectId, String methodVersionId,
            List<CheckOutcome> outcomes) {
        store.qa().recordAll(actor, projectId, methodVersionId, outcomes.stream()
                .map(o -> QaOutcomes.of(o.check(), o.passed(), o.measured(), o.unit(), o.limits().lower(),
                        o.limits().upper(), o.rule().statement(), o.rule().source()))
                .toList());
    }

    /**
     * The outcomes stored by earlier campaigns for a control chart's history: those of the other projects the
     * actor may read, made with a version of the same method (by name), recorded before this project's first
     * check (so that a report made again later sees the same history), oldest first.
     */
    public static List<CheckOutcome> history(WorkspaceStore store, Session actor, String projectId,
            String methodName) {
        java.time.Instant before = store.qa().checks(actor, projectId).stream().map(QaOutcome::getRecorded)
                .min(java.util.Comparator.naturalOrder()).orElse(java.time.Instant.MAX);
        java.util.Map<String, Boolean> sameMethod = new java.util.HashMap<>();
        return store.projects().projects(actor).stream().filter(p -> !p.getId().equals(projectId))
                .flatMap(p -> store.qa().checks(actor, p.getId()).stream())
                .filter(c -> c.getRecorded().isBefore(before))
                .filter(c -> sameMethod.computeIfAbsent(c.getMethodVersionId(),
                        id -> store.versions().version(id).getItemName().equals(methodName)))
                .sorted(java.util.Comparator.comparing(QaOutcome::getRecorded))
                .map(StoredQaChecks::outcome).toList();
    }

    /** The outcomes stored for a method version, in the order they were recorded; empty when there are none. */
    public static List<CheckOutcome> load(WorkspaceStore store, Session actor, String projectId,
            String methodVersionId) {
        return store.qa().checks(actor, projectId).stream().filter(c -> c.getMethodVersionId().equals(methodVersionId))
                .map(StoredQaChecks::outcome).toList();
    }

    private static CheckOutcome outcome(QaOutcome c) {
        return new CheckOutcome(c.getCheck(), c.isPassed(), c.getMeasured(), c.getUnit(),
                new AcceptanceLimits(c.getLowerLimit(), c.getUpperLimit()), new Rule(c.getRule(), c.getSource()));
    }
}
