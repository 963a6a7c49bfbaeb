package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

/** The registry of QA checks by the names plans use. */
class QaCheckRegistryTest {

    private static QaCheck named(String name) {
        return new QaCheck() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public Set<String> readings() {
                return Set.of("zero");
            }

            @Override
            public List<CheckOutcome> evaluate(QaInputs inputs) {
                return List.of();
            }
        };
    }

    @Test
    void findsChecksByNameInRegistrationOrder() {
        QaCheck b = named("b-check");
        QaCheckRegistry registry = new QaCheckRegistry().register(b).register(named("a-check"));
        assertEquals(List.of("b-check", "a-check"), registry.names());
        assertEquals(b, registry.find("b-check").orElseThrow());
        assertTrue(registry.find("c-check").isEmpty());
        assertTrue(b.settings().isEmpty(), "a check reads no settings of its own unless it says so");
    }

    @Test
    void refusesATakenOrBlankName() {
        QaCheckRegistry registry = new QaCheckRegistry().register(named("zero"));
        IllegalArgumentException twice = assertThrows(IllegalArgumentException.class,
                () -> registry.register(named("zero")));
        assertTrue(twice.getMessage().contains("'zero'"), twice.getMessage());
        assertThrows(IllegalArgumentException.class, () -> registry.register(named(" ")));
        assertThrows(IllegalArgumentException.class, () -> registry.register(null));
        assertThrows(IllegalArgumentException.class, () -> QaCheckRegistry.fromExtensions(null));
    }
}
