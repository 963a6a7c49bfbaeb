package org.tracegas.library;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CompoundTest {

    /** CAS numbers of CO, CH4, CO2 and water with valid check digits (CAS registry, from memory). */
    @Test
    void acceptsValidCasNumbers() {
        assertDoesNotThrow(() -> new Compound("Carbon monoxide", "630-08-0", "CO", 28.0101));
        assertDoesNotThrow(() -> new Compound("Methane", "74-82-8", "CH4", 16.043));
        assertDoesNotThrow(() -> new Compound("Carbon dioxide", "124-38-9", "CO2", 44.009));
        assertDoesNotThrow(() -> new Compound("Water", "7732-18-5", "H2O", 18.015));
    }

    @Test
    void rejectsAWrongCheckDigitAndNamesIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Compound("Carbon monoxide", "630-08-1", "CO", 28.0101));
        assertTrue(e.getMessage().startsWith("casNumber") && e.getMessage().contains("630-08-1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Compound("x", "630080", "CO", 28.0));
    }

    @Test
    void rejectsBlankNamesAndBadMolarMass() {
        assertThrows(IllegalArgumentException.class, () -> new Compound(" ", "630-08-0", "CO", 28.0));
        assertThrows(IllegalArgumentException.class, () -> new Compound("CO", "630-08-0", "", 28.0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Compound("CO", "630-08-0", "CO", -1));
        assertTrue(e.getMessage().startsWith("molarMass"), e.getMessage());
    }
}
