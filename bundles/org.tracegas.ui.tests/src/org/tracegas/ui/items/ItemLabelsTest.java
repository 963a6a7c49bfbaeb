package org.tracegas.ui.items;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.widgets.Display;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.provider.WorkbenchItemProviderAdapterFactory;

/** Labels and icons taken from the workspace model's generated item providers. */
class ItemLabelsTest {

    private final WorkbenchItemProviderAdapterFactory adapters = new WorkbenchItemProviderAdapterFactory();
    private final ItemLabels labels = new ItemLabels(adapters);

    @AfterEach
    void dispose() {
        labels.dispose();
        adapters.dispose();
    }

    @Test
    void aMeasurementShowsItsKindAndStartAndTheEditBundlesIcon() {
        Display.getDefault();
        Measurement m = WorkspaceFactory.eINSTANCE.createMeasurement();
        m.setKind(MeasurementKind.BACKGROUND);
        m.setTime(Instant.parse("2026-12-03T06:58:30Z"));
        assertEquals("background  2026-12-03 06:58:30 UTC", labels.getText(m));
        Image icon = labels.getImage(m);
        assertNotNull(icon);
        // the generated 16×16 object icon (icons/full/obj16/Measurement.gif), loaded once
        assertEquals(16, icon.getBounds().width);
        assertSame(icon, labels.getImage(m));
        labels.dispose();
        assertTrue(icon.isDisposed(), "the icons go with the label provider");
    }

    @Test
    void anElementWithoutItemProviderShowsAsItselfWithoutIcon() {
        assertEquals("Reference libraries", labels.getText("Reference libraries"));
        assertNull(labels.getImage("Reference libraries"));
        assertEquals("null", labels.getText(null));
    }
}
