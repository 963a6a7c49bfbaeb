package org.tracegas.preprocess;

import java.time.Duration;
import java.time.Instant;

import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/** Ratios a sample single beam against a background single beam, giving transmittance or decadic absorbance. */
public final class BackgroundRatio {

    /** Common practice, no source: a background is taken once a day. */
    public static final Duration DEFAULT_AGE_LIMIT = Duration.ofHours(24);

    private final Duration ageLimit;

    public BackgroundRatio() {
        this(DEFAULT_AGE_LIMIT);
    }

    /** @throws IllegalArgumentException if the limit is null, zero or negative */
    public BackgroundRatio(Duration ageLimit) {
        if (ageLimit == null || ageLimit.isZero() || ageLimit.isNegative()) {
            throw new IllegalArgumentException("ageLimit must be positive, was " + ageLimit);
        }
        this.ageLimit = ageLimit;
    }

    public Duration ageLimit() {
        return ageLimit;
    }

    /**
     * T = sample / background point by point; a zero background gives NaN there.
     *
     * @throws IllegalArgumentException if an argument is null, the sample is not a single beam, or the axes differ
     */
    public RatioResult transmittance(Spectrum sample, Instant sampleTime, Background background) {
        return ratio(sample, sampleTime, background, false);
    }

    /**
     * A = -log10(sample / background) point by point; where the ratio is not positive (no energy, noise) the
     * absorbance is NaN, so that later steps can leave such points out.
     *
     * @throws IllegalArgumentException as {@link #transmittance}
     */
    public RatioResult absorbance(Spectrum sample, Instant sampleTime, Background background) {
        return ratio(sample, sampleTime, background, true);
    }

    private RatioResult ratio(Spectrum sample, Instant sampleTime, Background background, boolean absorbance) {
        if (sample == null || sampleTime == null || background == null) {
            throw new IllegalArgumentException("sample, sampleTime and background must not be null");
        }
        if (sample.ordinate() != Ordinate.SINGLE_BEAM) {
            throw new IllegalArgumentException("sample must be a single beam, was " + sample.ordinate());
        }
        Spectrum reference = background.singleBeam();
        if (!sample.axis().equals(reference.axis())) {
            throw new IllegalArgumentException("sample axis " + sample.axis() + " differs from the axis "
                    + reference.axis() + " of background " + background.id());
        }
        int n = sample.size();
        double[] values = new double[n];
        for (int i = 0; i < n; i++) {
            double b = reference.get(i);
            double t = b == 0.0 ? Double.NaN : sample.get(i) / b;
            values[i] = absorbance ? (t > 0 ? -Math.log10(t) : Double.NaN) : t;
        }
        Duration age = Duration.between(background.measured(), sampleTime);
        boolean tooOld = age.abs().compareTo(ageLimit) > 0;
        Spectrum result = sample.withValues(values, absorbance ? Ordinate.ABSORBANCE : Ordinate.TRANSMITTANCE);
        return new RatioResult(result, background.id(), age, tooOld);
    }
}
