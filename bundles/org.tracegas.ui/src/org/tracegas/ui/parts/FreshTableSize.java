package org.tracegas.ui.parts;

import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Table;

/**
 * Gives a just-filled table a fresh size. On GTK3 the table of a view just opened, filled once, kept showing an
 * empty area (no rows, no header) until its size changed; a layout that hands it the same bounds again does not
 * count.
 */
final class FreshTableSize {

    private FreshTableSize() {
    }

    static void give(Table table) {
        Rectangle bounds = table.getBounds();
        table.setBounds(bounds.x, bounds.y, bounds.width, bounds.height - 1);
        table.setBounds(bounds);
    }
}
