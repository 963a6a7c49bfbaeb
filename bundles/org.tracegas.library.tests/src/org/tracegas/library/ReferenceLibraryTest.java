package org.tracegas.library;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class ReferenceLibraryTest {

    private final ReferenceSpectrum co200 = Fixtures.reference(Fixtures.CO, 200, 0.1, 0.2, 0.1);
    private final ReferenceSpectrum co50 = Fixtures.reference(Fixtures.CO, 50, 0.025, 0.05, 0.025);
    private final ReferenceSpectrum ch4 = Fixtures.reference(Fixtures.CH4, 100, 0.3, 0.1, 0.0);

    private String hash(String name, ReferenceSpectrum... references) {
        return new ReferenceLibrary(name, List.of(references)).contentHash();
    }

    @Test
    void hashIsIndependentOfInsertionOrder() {
        assertEquals(hash("stack", co200, co50, ch4), hash("stack", ch4, co200, co50));
        assertTrue(hash("stack", co200).matches("[0-9a-f]{64}"));
    }

    @Test
    void anyChangeOfDataOrMetadataChangesTheHash() {
        String base = hash("stack", co200, ch4);
        ReferenceSpectrum oneUlp = Fixtures.reference(Fixtures.CO, 200, 0.1, Math.nextUp(0.2), 0.1);
        ReferenceSpectrum otherOrigin = Fixtures.reference(Fixtures.CO, 200,
                new Origin(OriginKind.MEASURED, "10 m cell, refilled"), 0.1, 0.2, 0.1);
        ReferenceSpectrum synthetic = Fixtures.reference(Fixtures.CO, 200,
                new Origin(OriginKind.SYNTHETIC, "10 m cell"), 0.1, 0.2, 0.1);
        ReferenceSpectrum otherAmount = Fixtures.reference(Fixtures.CO, 201, 0.1, 0.2, 0.1);
        ReferenceSpectrum otherUncertainty = new ReferenceSpectrum(co200.spectrum(), new ReferenceMetadata(
                co200.compound(), co200.metadata().conditions(), co200.metadata().origin(), 0.021));
        for (ReferenceSpectrum changed : List.of(oneUlp, otherOrigin, synthetic, otherAmount, otherUncertainty)) {
            assertNotEquals(base, hash("stack", changed, ch4), changed.description());
        }
        assertNotEquals(base, hash("stack 2", co200, ch4));
        assertNotEquals(base, hash("stack", co200));
    }

    @Test
    void keepsSeveralConcentrationsPerCompoundInOrder() {
        ReferenceLibrary library = new ReferenceLibrary("stack", List.of(co200, ch4, co50));
        assertEquals(List.of(co50, co200), library.referencesFor("630-08-0"));
        assertEquals(List.of(co50, co200, ch4), library.references());
        assertEquals(new ReferenceLibrary("stack", List.of(co50, ch4, co200)), library);
    }

    @Test
    void rejectsTheSameReferenceTwice() {
        ReferenceSpectrum copy = Fixtures.reference(Fixtures.CO, 200, 0.1, 0.2, 0.1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ReferenceLibrary("stack", List.of(co200, ch4, copy)));
        assertTrue(e.getMessage().contains("reference 2 occurs twice"), e.getMessage());
    }
}
