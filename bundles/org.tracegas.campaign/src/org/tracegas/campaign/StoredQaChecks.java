package org.tracegas.campaign;

import java.util.List;

import org.tracegas.qa.checks.AcceptanceLimits;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.Rule;
import org.tracegas.store.NewQaCheck;
import org.tracegas.store.QaCheckInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** A campaign's QA outcomes kept in the workspace, so that its report is made again from stored data. */
public final class StoredQaChecks {

    private StoredQaChecks() {
    }

    public static void store(WorkspaceStore store, Session actor, String projectId, String methodVersionId,
            List<CheckOutcome> outcomes) {
        store.qa().recordAll(actor, projectId, methodVersionId, outcomes.stream()
                .map(o -> new NewQaCheck(o.check(), o.passed(), o.measured(), o.unit(), o.limits().lower(),
                        o.limits().upper(), o.rule().statement(), o.rule().source()))
                .toList());
    }

    /** The outcomes stored for a method version, in the order they were recorded; empty when there are none. */
    public static List<CheckOutcome> load(WorkspaceStore store, Session actor, String projectId,
            String methodVersionId) {
        return store.qa().checks(actor, projectId).stream().filter(c -> c.methodVersionId().equals(methodVersionId))
                .map(QaCheckInfo::outcome)
                .map(c -> new CheckOutcome(c.check(), c.passed(), c.measured(), c.unit(),
                        new AcceptanceLimits(c.lower(), c.upper()), new Rule(c.rule(), c.source())))
                .toList();
    }
}
