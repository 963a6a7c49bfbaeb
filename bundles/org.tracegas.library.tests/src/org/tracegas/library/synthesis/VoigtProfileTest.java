package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class VoigtProfileTest {

    /** SciPy 1.17.1 scipy.special.voigt_profile (voigt-profile-scipy.csv): README asks 1e-6, measured 1.4e-9. */
    @Test
    void agreesWithScipyVoigtProfile() {
        VoigtProfile profile = new VoigtProfile(FaddeevaFunction.standard());
        double worst = 0;
        int checked = 0;
        for (double[] row : ScipyReference.rows("voigt-profile-scipy.csv")) {
            double e = ScipyReference.relativeError(profile.value(row[0], row[1], row[2]), row[3]);
            if (!Double.isNaN(e)) {
                worst = Math.max(worst, e);
                checked++;
            }
        }
        assertEquals(54, checked);
        assertTrue(worst < 2e-9, "worst relative error " + worst);
    }

    /**
     * Limits of the Olivero-Longbothum half width: a pure Gaussian gives sigma sqrt(2 ln 2), a pure Lorentzian
     * gamma (to the 1e-4 of the formula's rounded coefficients; JQSRT 17 (1977) 233, from memory); in between it
     * must match the half maximum of the profile itself to 0.05 %.
     */
    @Test
    void halfWidthMatchesTheProfile() {
        assertEquals(Math.sqrt(2 * Math.log(2)), VoigtProfile.halfWidth(1.0, 0.0), 1e-15);
        assertEquals(1.0, VoigtProfile.halfWidth(1e-9, 1.0), 1e-4);
        VoigtProfile profile = new VoigtProfile(FaddeevaFunction.standard());
        double sigma = 1.0;
        double gamma = 0.7;
        double half = 0.5 * profile.value(0, sigma, gamma);
        double lo = 0;
        double hi = 10;
        for (int i = 0; i < 100; i++) {
            double mid = 0.5 * (lo + hi);
            if (profile.value(mid, sigma, gamma) > half) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        assertEquals(lo, VoigtProfile.halfWidth(sigma, gamma), 5e-4 * lo);
    }
}
