package org.tracegas.ui.parts;

import java.util.Map;
import java.util.TreeMap;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tracegas.store.VersionDiff;

/** Two versions side by side, field by field; fields that differ are highlighted. */
public final class VersionComparisonPanel extends Composite {

    private final Label summary;
    private final Table table;
    private final TableColumn columnA;
    private final TableColumn columnB;

    public VersionComparisonPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(1, false));
        summary = new Label(this, SWT.NONE);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        table = new Table(this, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        column("Field", 170);
        columnA = column("Version A", 150);
        columnB = column("Version B", 150);
    }

    private TableColumn column(String text, int width) {
        TableColumn c = new TableColumn(table, SWT.NONE);
        c.setText(text);
        c.setWidth(width);
        return c;
    }

    /**
     * Compares two key=value contents.
     *
     * @throws IllegalArgumentException naming the version and line that is not key=value
     */
    public void compare(String labelA, String contentA, String labelB, String contentB) {
        VersionDiff diff = VersionDiff.of(labelA, contentA, labelB, contentB);
        Map<String, String> a = fields(contentA);
        Map<String, String> b = fields(contentB);
        Map<String, Boolean> keys = new TreeMap<>();
        a.keySet().forEach(k -> keys.put(k, false));
        b.keySet().forEach(k -> keys.put(k, false));
        diff.added().keySet().forEach(k -> keys.put(k, true));
        diff.removed().keySet().forEach(k -> keys.put(k, true));
        diff.changed().keySet().forEach(k -> keys.put(k, true));
        columnA.setText(labelA);
        columnB.setText(labelB);
        table.removeAll();
        for (Map.Entry<String, Boolean> e : keys.entrySet()) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {e.getKey(), a.getOrDefault(e.getKey(), "—"), b.getOrDefault(e.getKey(), "—")});
            if (e.getValue()) {
                item.setBackground(Palette.CHANGED);
            }
        }
        for (TableColumn c : table.getColumns()) {
            c.pack();
            c.setWidth(Math.max(c.getWidth(), 120));
        }
        int differing = diff.added().size() + diff.removed().size() + diff.changed().size();
        summary.setText(differing == 0 ? "The versions hold the same values."
                : differing + (differing == 1 ? " field differs" : " fields differ") + " (highlighted).");
        layout(true);
    }

    public Table table() {
        return table;
    }

    public Label summary() {
        return summary;
    }

    private static Map<String, String> fields(String content) {
        Map<String, String> m = new TreeMap<>();
        for (String line : content.split("\n")) {
            int eq = line.indexOf('=');
            if (eq > 0) {
                m.put(line.substring(0, eq), line.substring(eq + 1));
            }
        }
        return m;
    }
}
