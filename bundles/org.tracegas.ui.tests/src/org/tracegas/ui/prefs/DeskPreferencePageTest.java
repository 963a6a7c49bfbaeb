package org.tracegas.ui.prefs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.preference.PreferenceStore;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.Test;

class DeskPreferencePageTest {

    private static void texts(Control c, List<Text> out) {
        if (c instanceof Text t) {
            out.add(t);
        } else if (c instanceof Composite p) {
            for (Control child : p.getChildren()) {
                texts(child, out);
            }
        }
    }

    @Test
    void backgroundAgeAndServerUrlAreCheckedAndStored() {
        Shell shell = new Shell(Display.getDefault());
        try {
            shell.setLayout(new FillLayout());
            PreferenceStore store = new PreferenceStore();
            DeskPreferences.setDefaults(store);
            DeskPreferencePage page = new DeskPreferencePage();
            page.setPreferenceStore(store);
            page.createControl(shell);
            List<Text> fields = new ArrayList<>();
            texts(page.getControl(), fields);
            Text age = fields.get(0);
            Text url = fields.get(2);
            assertEquals("60", age.getText());
            age.setText("0");
            age.notifyListeners(SWT.KeyUp, new org.eclipse.swt.widgets.Event());
            assertFalse(page.isValid());
            assertTrue(page.getErrorMessage().startsWith("Background age limit:"), page.getErrorMessage());
            age.setText("90");
            age.notifyListeners(SWT.KeyUp, new org.eclipse.swt.widgets.Event());
            url.setText("http://lab-server");
            url.notifyListeners(SWT.KeyUp, new org.eclipse.swt.widgets.Event());
            assertFalse(page.isValid());
            assertTrue(page.getErrorMessage().startsWith("Lab server URL:"), page.getErrorMessage());
            url.setText("jdbc:postgresql://lab-server/tracegas");
            url.notifyListeners(SWT.KeyUp, new org.eclipse.swt.widgets.Event());
            assertTrue(page.isValid(), page.getErrorMessage());
            assertTrue(page.performOk());
            assertEquals(Duration.ofMinutes(90), DeskPreferences.backgroundAgeLimit(store));
            assertEquals("jdbc:postgresql://lab-server/tracegas", store.getString(DeskPreferences.SERVER_URL));
        } finally {
            shell.dispose();
        }
    }
}
