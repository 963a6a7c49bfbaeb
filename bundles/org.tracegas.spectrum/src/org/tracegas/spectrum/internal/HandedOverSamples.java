package org.tracegas.spectrum.internal;

import org.tracegas.spectrum.Interferogram;

/**
 * Makes interferograms of sample arrays that the caller hands over instead of lending: a reader that fills a fresh
 * array for every record spares the copy that {@link Interferogram}'s public constructor makes to stay immutable,
 * which on the batch path is a second large array per record. Only for callers that never keep, write or pass on
 * the array afterwards; everyone else uses the public constructor.
 */
public final class HandedOverSamples {

    /** Builds an interferogram on the array itself; granted by {@link Interferogram} when its class initialises. */
    @FunctionalInterface
    public interface Maker {
        /** As the public constructor, without the copy. */
        Interferogram interferogram(double[] samples, double laserWavenumber, int samplingInterval);
    }

    private static volatile Maker maker;

    private HandedOverSamples() {
    }

    /**
     * Called once, by {@link Interferogram}'s class initialisation.
     *
     * @throws IllegalStateException if a maker was granted before
     */
    public static synchronized void grant(Maker granted) {
        if (maker != null) {
            throw new IllegalStateException("the interferogram maker was granted before");
        }
        maker = granted;
    }

    /**
     * An interferogram on {@code samples} itself, checked like the public constructor's.
     *
     * @param samples detector samples, at least 2, all finite; from now on the interferogram's own
     * @throws IllegalArgumentException as the public constructor
     */
    public static Interferogram interferogram(double[] samples, double laserWavenumber, int samplingInterval) {
        Maker m = maker;
        if (m == null) {
            initialise();
            m = maker;
        }
        return m.interferogram(samples, laserWavenumber, samplingInterval);
    }

    private static void initialise() {
        try {
            Class.forName(Interferogram.class.getName(), true, Interferogram.class.getClassLoader());
        } catch (ClassNotFoundException e) {
            throw new IllegalStateException(e);
        }
    }
}
