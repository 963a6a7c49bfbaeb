package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class LorentzWidthTest {

    private final SpectralLine line = new SpectralLine(5, 1, 2100, 1e-20, 1.0, 0.07, 0.09, 100, 0.75, -0.003);

    /** HITRAN definitions (Rothman et al., JQSRT 96 (2005) 139): widths and shift per atm at 296 K. */
    @Test
    void traceGasInAirAtTheReferenceStateHasTheAirWidth() {
        AbsorptionPath path = new AbsorptionPath(296.0, 101.325, 1.0, 1.0);
        assertEquals(0.07 * (1 - 1e-6) + 0.09 * 1e-6, LorentzWidth.halfWidth(line, path), 1e-15);
        assertEquals(2100 - 0.003, LorentzWidth.centre(line, path), 1e-12);
    }

    @Test
    void pureGasAtHalfAnAtmosphereHasHalfTheSelfWidth() {
        AbsorptionPath path = new AbsorptionPath(296.0, 101.325 / 2, 1e6, 1.0);
        assertEquals(0.045, LorentzWidth.halfWidth(line, path), 1e-15);
        assertEquals(2100 - 0.0015, LorentzWidth.centre(line, path), 1e-12);
    }

    @Test
    void widthFollowsThePowerLawInTemperature() {
        AbsorptionPath path = new AbsorptionPath(400.0, 101.325, 1.0, 1.0);
        double mixture = 0.07 * (1 - 1e-6) + 0.09 * 1e-6;
        assertEquals(Math.pow(296.0 / 400.0, 0.75) * mixture, LorentzWidth.halfWidth(line, path), 1e-15);
    }
}
