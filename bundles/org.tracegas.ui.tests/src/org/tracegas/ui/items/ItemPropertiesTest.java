package org.tracegas.ui.items;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.provider.WorkbenchItemProviderAdapterFactory;

/** A measurement's properties for the properties view, from the generated item providers, read only. */
class ItemPropertiesTest {

    /** SHA-256 of the empty message (FIPS 180-4; value from memory, as coreutils sha256sum prints it too). */
    private static final String SHA256_EMPTY = "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855";

    private final WorkbenchItemProviderAdapterFactory adapters = new WorkbenchItemProviderAdapterFactory();

    @AfterEach
    void dispose() {
        adapters.dispose();
    }

    private static Measurement zeroGas() {
        Measurement m = WorkspaceFactory.eINSTANCE.createMeasurement();
        m.setKind(MeasurementKind.ZERO);
        m.setCellTemperature(318.0);
        m.setCellPressure(1002.0);
        m.setContent(SpectralContent.SINGLE_BEAM);
        m.setSourceFile("zero-n2.spa");
        m.setSourceSha256(SHA256_EMPTY);
        return m;
    }

    /** Property name to the text the view shows for its value. */
    private static Map<String, String> shown(ItemProperties properties) {
        Map<String, String> shown = new LinkedHashMap<>();
        for (IPropertyDescriptor d : properties.getPropertyDescriptors()) {
            shown.put(d.getDisplayName(), d.getLabelProvider().getText(properties.getPropertyValue(d.getId())));
        }
        return shown;
    }

    @Test
    void theViewShowsTheFeaturesAsTheItemProvidersWriteThem() {
        ItemProperties properties = ItemProperties.of(adapters, zeroGas());
        Map<String, String> shown = shown(properties);
        assertEquals("zero", shown.get("Kind"));
        assertEquals("318.0", shown.get("Cell temperature (K)"));
        assertEquals("1002.0", shown.get("Cell pressure (hPa)"));
        assertEquals("single beam", shown.get("Content"));
        assertEquals("zero-n2.spa", shown.get("Source file"));
        assertEquals(SHA256_EMPTY, shown.get("Source file SHA-256"));
    }

    @Test
    void noPropertyCanBeEditedOrReset() {
        Measurement m = zeroGas();
        ItemProperties properties = ItemProperties.of(adapters, m);
        for (IPropertyDescriptor d : properties.getPropertyDescriptors()) {
            assertNull(d.createPropertyEditor(null), d.getDisplayName() + " has no cell editor");
            assertFalse(properties.isPropertyResettable(d.getId()), d.getDisplayName());
        }
        Object temperature = null;
        for (IPropertyDescriptor d : properties.getPropertyDescriptors()) {
            if (d.getDisplayName().equals("Cell temperature (K)")) {
                temperature = d.getId();
            }
        }
        Object id = temperature;
        UnsupportedOperationException e = assertThrows(UnsupportedOperationException.class,
                () -> properties.setPropertyValue(id, 293.15));
        assertEquals("property 'Cell temperature (K)' is read-only: a stored record changes through the store,"
                + " which audits the change", e.getMessage());
        assertThrows(UnsupportedOperationException.class, () -> properties.resetPropertyValue(id));
        assertEquals(318.0, m.getCellTemperature());
        assertTrue(properties.isPropertySet(id));
    }

    @Test
    void anObjectWithoutPropertySourceHasNoProperties() {
        assertNull(ItemProperties.of(adapters, "a heading"));
        assertNull(ItemProperties.of(adapters, null));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ItemProperties.of(null, zeroGas()));
        assertEquals("adapters must not be null", e.getMessage());
    }
}
