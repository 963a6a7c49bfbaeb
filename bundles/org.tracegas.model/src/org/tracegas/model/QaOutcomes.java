package org.tracegas.model;

/** New QA outcomes made from their values in one call, as a campaign's checks give them. */
public final class QaOutcomes {

    private QaOutcomes() {
    }

    /**
     * A new QA outcome, not yet stored: without id, project, method version, recording user and time, which the
     * store sets on the copy it records.
     *
     * @param lowerLimit lowest accepted value (negative infinity when there is none)
     * @param upperLimit highest accepted value (positive infinity when there is none)
     */
    public static QaOutcome of(String check, boolean passed, double measured, String unit, double lowerLimit,
            double upperLimit, String rule, String source) {
        QaOutcome o = WorkspaceFactory.eINSTANCE.createQaOutcome();
        o.setCheck(check);
        o.setPassed(passed);
        o.setMeasured(measured);
        o.setUnit(unit);
        o.setLowerLimit(lowerLimit);
        o.setUpperLimit(upperLimit);
        o.setRule(rule);
        o.setSource(source);
        return o;
    }
}
