package org.tracegas.ui.parts;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Function;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.tracegas.store.VersionDiff;

/**
 * Two versions side by side, field by field; fields that differ are highlighted. Offered several versions, it
 * compares any two the user chooses.
 */
public final class VersionComparisonPanel extends Composite {

    private final Combo chooseA;
    private final Combo chooseB;
    private Function<String, String> contentOf;
    private final Label summary;
    private final Table table;
    private final TableColumn columnA;
    private final TableColumn columnB;

    public VersionComparisonPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(4, false));
        new Label(this, SWT.NONE).setText("Compare");
        chooseA = chooser();
        new Label(this, SWT.NONE).setText("with");
        chooseB = chooser();
        summary = new Label(this, SWT.WRAP);
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false, 4, 1);
        sd.widthHint = 100; // wraps in a narrow view instead of clipping
        summary.setLayoutData(sd);
        table = new Table(this, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 4, 1));
        column("Field", 170);
        columnA = column("Version A", 150);
        columnB = column("Version B", 150);
        table.addListener(SWT.Resize, e -> fitColumns());
        // a value cut at the column's edge is read whole in the row's tooltip
        table.addListener(SWT.MouseHover, e -> {
            TableItem item = table.getItem(new Point(e.x, e.y));
            table.setToolTipText(item == null ? null : item.getText(0) + "\n" + columnA.getText() + ": "
                    + item.getText(1) + "\n" + columnB.getText() + ": " + item.getText(2));
        });
    }

    private Combo chooser() {
        Combo c = new Combo(this, SWT.READ_ONLY);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = 60; // fills the view's width without widening it
        c.setLayoutData(gd);
        c.addListener(SWT.Selection, e -> compareChosen());
        return c;
    }

    /**
     * Offers versions to compare and compares two of them; a choice the user made before stays while its version
     * is still offered.
     *
     * @param labels    the versions, as the choosers name them
     * @param contentOf the key=value content of a version by its label
     * @param a         the version shown on the left unless the user chose another
     * @param b         the version shown on the right unless the user chose another
     */
    public void offer(List<String> labels, Function<String, String> contentOf, String a, String b) {
        String chosenA = labels.contains(chooseA.getText()) ? chooseA.getText() : a;
        String chosenB = labels.contains(chooseB.getText()) ? chooseB.getText() : b;
        this.contentOf = contentOf;
        for (Combo c : List.of(chooseA, chooseB)) {
            c.setItems(labels.toArray(String[]::new));
        }
        chooseA.select(labels.indexOf(chosenA));
        chooseB.select(labels.indexOf(chosenB));
        compareChosen();
    }

    private void compareChosen() {
        if (contentOf == null || chooseA.getSelectionIndex() < 0 || chooseB.getSelectionIndex() < 0) {
            return;
        }
        String a = chooseA.getText();
        String b = chooseB.getText();
        try {
            compare(a, contentOf.apply(a), b, contentOf.apply(b));
        } catch (IllegalArgumentException e) {
            table.removeAll();
            summary.setText(e.getMessage());
        }
    }

    /**
     * Shares the table's width among the columns (the field's at most 40 %, the versions' alike), so that no
     * column lies past the view's right edge.
     */
    private void fitColumns() {
        int width = table.getClientArea().width;
        if (width <= 0) {
            return;
        }
        TableColumn field = table.getColumn(0);
        field.pack();
        int first = Math.min(field.getWidth(), width * 2 / 5);
        field.setWidth(first);
        columnA.setWidth((width - first) / 2);
        columnB.setWidth(width - first - (width - first) / 2);
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
        fitColumns();
        int differing = diff.added().size() + diff.removed().size() + diff.changed().size();
        summary.setText(differing == 0 ? "The versions hold the same values."
                : differing + (differing == 1 ? " field differs" : " fields differ") + " (highlighted).");
        layout(true);
    }

    /** The chooser of the version on the left. */
    public Combo chooserA() {
        return chooseA;
    }

    /** The chooser of the version on the right. */
    public Combo chooserB() {
        return chooseB;
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
