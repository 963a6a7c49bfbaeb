package org.tracegas.library;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Ordinate;

class ReferenceSpectrumTest {

    @Test
    void descriptionShowsTheOrigin() {
        ReferenceSpectrum measured = Fixtures.reference(Fixtures.CO, 200, 0.1, 0.2);
        ReferenceSpectrum synthetic = Fixtures.reference(Fixtures.CO, 200,
                new Origin(OriginKind.SYNTHETIC, "line by line"), 0.1, 0.2);
        assertFalse(measured.isSynthetic());
        assertTrue(measured.description().endsWith("measured (10 m cell)"), measured.description());
        assertTrue(synthetic.isSynthetic());
        assertTrue(synthetic.toString().contains("synthetic (line by line)"), synthetic.toString());
        assertTrue(synthetic.description().startsWith("Carbon monoxide 630-08-0, 200.0 ppm·m, 296.0 K"),
                synthetic.description());
    }

    @Test
    void holdsAbsorbanceOnly() {
        ReferenceSpectrum r = Fixtures.reference(Fixtures.CO, 200, 0.1, 0.2);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new ReferenceSpectrum(
                r.spectrum().withValues(new double[] {0.9, 0.8}, Ordinate.TRANSMITTANCE), r.metadata()));
        assertTrue(e.getMessage().contains("TRANSMITTANCE"), e.getMessage());
    }

    @Test
    void metadataRejectsAnUncertaintyOutsideItsRange() {
        ReferenceMetadata m = Fixtures.reference(Fixtures.CO, 200, 0.1, 0.2).metadata();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ReferenceMetadata(m.compound(), m.conditions(), m.origin(), 1.5));
        assertTrue(e.getMessage().startsWith("relativeUncertainty"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new ReferenceConditions(200, 296, 101.325, 0.0, "BOXCAR"));
    }
}
