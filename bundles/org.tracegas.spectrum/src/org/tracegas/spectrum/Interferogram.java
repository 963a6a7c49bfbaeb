package org.tracegas.spectrum;

import org.tracegas.spectrum.internal.HandedOverSamples;

/**
 * Immutable raw interferogram: detector samples taken at equal steps of optical path difference, one step
 * per {@code samplingInterval} fringes of the reference laser.
 */
public final class Interferogram {

    private final double[] samples;
    private final double laserWavenumber;
    private final int samplingInterval;

    static {
        HandedOverSamples.grant((samples, laser, interval) -> new Interferogram(samples, laser, interval, false));
    }

    /**
     * @param samples          detector samples, at least 2; copied
     * @param laserWavenumber  reference laser wavenumber in cm-1 (15798.0 for a HeNe laser: common practice)
     * @param samplingInterval laser fringes per sample, at least 1
     */
    public Interferogram(double[] samples, double laserWavenumber, int samplingInterval) {
        this(samples, laserWavenumber, samplingInterval, true);
    }

    /** @param copy false if the caller hands the array over ({@link HandedOverSamples}) */
    private Interferogram(double[] given, double laserWavenumber, int samplingInterval, boolean copy) {
        if (given == null || given.length < 2) {
            throw new IllegalArgumentException("samples must hold at least 2 points");
        }
        // copied before the checks, so that what is checked is what is kept
        double[] samples = copy ? given.clone() : given;
        if (!(laserWavenumber > 0 && Double.isFinite(laserWavenumber))) {
            throw new IllegalArgumentException("laserWavenumber must be positive and finite, was " + laserWavenumber);
        }
        if (samplingInterval < 1) {
            throw new IllegalArgumentException("samplingInterval must be at least 1, was " + samplingInterval);
        }
        for (int i = 0; i < samples.length; i++) {
            if (!Double.isFinite(samples[i])) {
                throw new IllegalArgumentException("sample " + i + " is not finite: " + samples[i]);
            }
        }
        this.samples = samples;
        this.laserWavenumber = laserWavenumber;
        this.samplingInterval = samplingInterval;
    }

    public int size() {
        return samples.length;
    }

    public double get(int index) {
        return samples[index];
    }

    public double[] toArray() {
        return samples.clone();
    }

    public double laserWavenumber() {
        return laserWavenumber;
    }

    public int samplingInterval() {
        return samplingInterval;
    }

    /** Optical path difference between neighbouring samples, in cm. */
    public double sampleSpacingCm() {
        return samplingInterval / laserWavenumber;
    }

    /** Highest wavenumber that the sampling resolves without folding (Nyquist), in cm-1. */
    public double nyquistWavenumber() {
        return laserWavenumber / (2.0 * samplingInterval);
    }
}
