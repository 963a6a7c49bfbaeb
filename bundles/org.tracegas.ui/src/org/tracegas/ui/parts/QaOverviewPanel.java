package org.tracegas.ui.parts;

import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tracegas.qa.checks.CheckOutcome;

/** QA check outcomes: pass or fail, the value judged, the limits and the rule with its source. */
public final class QaOverviewPanel extends Composite {

    private final Label summary;
    private final Table table;

    public QaOverviewPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(1, false));
        summary = new Label(this, SWT.WRAP);
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        sd.widthHint = 200; // wraps in a narrow view instead of clipping
        summary.setLayoutData(sd);
        table = new Table(this, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        for (String c : new String[] {"Outcome", "Check", "Measured", "Limits", "Rule", "Source"}) {
            new TableColumn(table, SWT.NONE).setText(c);
        }
    }

    /** Shows outcomes without naming their project. */
    public void show(List<CheckOutcome> outcomes) {
        show(null, outcomes);
    }

    /**
     * Shows the outcomes of a project.
     *
     * @param projectCode the project the outcomes belong to, or null
     */
    public void show(String projectCode, List<CheckOutcome> outcomes) {
        table.removeAll();
        long failed = outcomes.stream().filter(o -> !o.passed()).count();
        for (CheckOutcome o : outcomes) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {o.passed() ? "pass" : "FAIL", o.check(),
                    String.format(java.util.Locale.ROOT, "%.4g %s", o.measured(), o.unit()), o.limits().describe(),
                    o.rule().statement(), o.rule().source()});
            item.setBackground(o.passed() ? Palette.PASS : Palette.FAIL);
        }
        for (TableColumn col : table.getColumns()) {
            col.pack();
        }
        String of = projectCode == null ? "" : projectCode + ": ";
        summary.setText(outcomes.isEmpty() ? of + "no QA checks stored yet"
                : of + outcomes.size() + " checks: " + (outcomes.size() - failed) + " passed, " + failed + " failed");
        layout(true);
        FreshTableSize.give(table);
    }

    /** A line of text instead of outcomes, e.g. while they are read. */
    public void showNote(String text) {
        table.removeAll();
        summary.setText(text);
        layout(true);
    }

    public Table table() {
        return table;
    }

    public Label summary() {
        return summary;
    }
}
