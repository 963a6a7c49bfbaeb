package org.tracegas.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.eclipse.emf.ecore.EcorePackage;
import org.junit.jupiter.api.Test;
import org.tracegas.model.WorkspacePackage.Literals;

class WorkspaceFactoryTest {

    private final WorkspaceFactory factory = WorkspaceFactory.eINSTANCE;

    @Test
    void instantIsWrittenAsIso8601AndReadBack() {
        Instant time = Instant.parse("2026-03-14T09:26:53.589Z");
        String text = factory.convertToString(Literals.INSTANT, time);
        // ISO-8601 extended format, UTC designator Z (ISO 8601-1:2019, 5.4)
        assertEquals("2026-03-14T09:26:53.589Z", text);
        assertEquals(time, factory.createFromString(Literals.INSTANT, text));
    }

    @Test
    void malformedInstantIsRefused() {
        assertThrows(java.time.format.DateTimeParseException.class,
                () -> factory.createFromString(Literals.INSTANT, "14.03.2026 09:26"));
    }

    @Test
    void everyStoredObjectHasIdentifierAndRowVersion() {
        for (var classifier : WorkspacePackage.eINSTANCE.getEClassifiers()) {
            if (classifier instanceof org.eclipse.emf.ecore.EClass c && Literals.STORED_OBJECT.isSuperTypeOf(c)) {
                assertEquals(EcorePackage.Literals.ESTRING, c.getEIDAttribute().getEType(), c.getName());
                assertTrue(c.getEAllAttributes().contains(Literals.STORED_OBJECT__ROW_VERSION), c.getName());
            }
        }
    }

    @Test
    void rolesAreTheFourWorkspaceRoles() {
        assertEquals(java.util.List.of(Role.ANALYST, Role.REVIEWER, Role.QUALITY_MANAGER, Role.ADMINISTRATOR),
                Role.VALUES);
    }
}
