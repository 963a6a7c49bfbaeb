package org.tracegas.library.synthesis;

import static org.tracegas.library.synthesis.PhysicalConstants.C2;
import static org.tracegas.library.synthesis.PhysicalConstants.REFERENCE_TEMPERATURE;

/**
 * Temperature scaling of a line intensity (HITRAN definitions, Simeckova et al., JQSRT 98 (2006) 130):
 * S(T) = S(Tref) Q(Tref)/Q(T) exp(-c2 E''/T)/exp(-c2 E''/Tref) (1 - exp(-c2 v/T))/(1 - exp(-c2 v/Tref)).
 */
public final class LineIntensity {

    private LineIntensity() {
    }

    /** The intensity of a line at a temperature in K, in cm-1/(molecule cm-2). */
    public static double at(SpectralLine line, double temperature, PartitionFunction q) {
        if (!(temperature > 0 && Double.isFinite(temperature))) {
            throw new IllegalArgumentException("temperature must be positive and finite, was " + temperature);
        }
        double t0 = REFERENCE_TEMPERATURE;
        double v = line.wavenumber();
        // one exponential of the difference keeps large E'' from underflowing before the ratio is taken
        double boltzmann = Math.exp(-C2 * line.lowerStateEnergy() * (1.0 / temperature - 1.0 / t0));
        double stimulated = -Math.expm1(-C2 * v / temperature) / -Math.expm1(-C2 * v / t0);
        return line.intensity() * q.ratio(t0, temperature) * boltzmann * stimulated;
    }
}
