package org.tracegas.report.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.tracegas.report.QaLine;
import org.tracegas.report.internal.TableRenderer.Column;

/**
 * The QA tables of a report: a summary with one row per check name, each failed reading of a repeated check
 * in its own row right below it, and the appendix listing every reading. Rule texts appear once per check
 * name, in the summary.
 */
public final class QaTables {

    /** Heading of the appendix the summary refers to. */
    public static final String APPENDIX = "Appendix A  QA readings in full";

    private final List<QaGroup> groups;
    private final int readings;
    private final long failed;

    public QaTables(List<QaLine> lines) {
        groups = QaGroup.of(lines);
        readings = lines.size();
        failed = lines.stream().filter(l -> !l.passed()).count();
    }

    /** Whether some check has more than one reading, so that the summary leaves readings to the appendix. */
    public boolean needsAppendix() {
        return groups.stream().anyMatch(QaGroup::repeated);
    }

    /** The sentences above the summary: counts, the checks that failed, where every reading is listed. */
    public String overview() {
        StringBuilder sb = new StringBuilder();
        sb.append(readings).append(readings == 1 ? " reading" : " readings").append(" of ").append(groups.size())
                .append(groups.size() == 1 ? " check: " : " checks: ").append(readings - failed).append(" passed, ")
                .append(failed).append(" failed.");
        List<String> failing = new ArrayList<>();
        for (QaGroup g : groups) {
            int n = g.failedNumbers().size();
            if (n > 0) {
                failing.add(g.check() + (g.repeated() ? " (" + n + " of " + g.size() + ")" : ""));
            }
        }
        if (!failing.isEmpty()) {
            sb.append(" Failed: ").append(String.join(", ", failing)).append('.');
        }
        if (needsAppendix()) {
            sb.append(" One row per check; for a repeated check the reading closest to or furthest beyond its "
                    + "limits is shown as the worst, and each failed reading follows in its own row. Every reading "
                    + "is listed in ").append(appendixName()).append('.');
        }
        return sb.toString();
    }

    public TableRenderer summaryTable(Set<String> alarmWords) {
        return new TableRenderer(List.of(new Column("Check", 78, false), new Column("Result", 28, false),
                new Column("Readings", 50, false), new Column("Measured", 74, true), new Column("Limits", 88, true),
                new Column("Rule and source", 177, false)), 7.5f, alarmWords);
    }

    public List<String[]> summaryRows() {
        List<String[]> rows = new ArrayList<>();
        for (QaGroup g : groups) {
            if (!g.repeated()) {
                QaLine q = g.readings().get(0);
                rows.add(new String[] {q.check(), result(q.passed()), "1", q.measured(), q.limits(), ruleAndSource(q)});
                continue;
            }
            List<Integer> failedNumbers = g.failedNumbers();
            Optional<QaLine> worst = g.worst();
            QaLine shown = worst.orElse(g.readings().get(0));
            String counts = g.size() + ", " + (failedNumbers.isEmpty() ? "all pass" : failedNumbers.size() + " fail");
            String measured = worst.map(w -> "worst " + w.measured()).orElse("see " + appendixName());
            String limits = g.oneLimits() ? shown.limits() : worst.map(QaLine::limits).orElse("differ");
            String rule = g.oneRule() ? ruleAndSource(shown)
                    : (worst.isPresent() ? "Rule of the worst reading: " : "Rule of reading 1: ") + ruleAndSource(shown)
                            + " The rule differs between readings; each reading's limits are in " + appendixName() + ".";
            rows.add(new String[] {g.check(), result(failedNumbers.isEmpty()), counts, measured, limits, rule});
            for (int n : failedNumbers) {
                QaLine q = g.readings().get(n - 1);
                rows.add(new String[] {g.check(), result(false), "no. " + n + " of " + g.size(), q.measured(),
                        q.limits(), ""});
            }
        }
        return rows;
    }

    public TableRenderer appendixTable(Set<String> alarmWords) {
        return new TableRenderer(List.of(new Column("Check", 150, false), new Column("Reading", 60, false),
                new Column("Result", 40, false), new Column("Measured", 115, true), new Column("Limits", 130, true)),
                7.5f, alarmWords);
    }

    /** Every reading, grouped by check in the summary's order, each check's readings in the order taken. */
    public List<String[]> appendixRows() {
        List<String[]> rows = new ArrayList<>(readings);
        for (QaGroup g : groups) {
            for (int i = 0; i < g.size(); i++) {
                QaLine q = g.readings().get(i);
                rows.add(new String[] {q.check(), (i + 1) + " of " + g.size(), result(q.passed()), q.measured(),
                        q.limits()});
            }
        }
        return rows;
    }

    private static String appendixName() {
        return APPENDIX.substring(0, APPENDIX.indexOf("  "));
    }

    private static String result(boolean passed) {
        return passed ? "pass" : "FAIL";
    }

    private static String ruleAndSource(QaLine q) {
        return q.rule() + " [Source: " + q.source() + "]";
    }
}
