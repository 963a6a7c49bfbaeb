package org.tracegas.library.synthesis;

/**
 * Area-normalised Voigt profile V(x; sigma, gamma) = Re w((x + i gamma) / (sigma sqrt 2)) / (sigma sqrt(2 pi)),
 * the convolution of a Gaussian of standard deviation sigma with a Lorentzian of half width gamma.
 */
public final class VoigtProfile {

    private static final double SQRT_2PI = Math.sqrt(2.0 * Math.PI);

    private final FaddeevaFunction faddeeva;

    public VoigtProfile(FaddeevaFunction faddeeva) {
        if (faddeeva == null) {
            throw new IllegalArgumentException("faddeeva function must not be null");
        }
        this.faddeeva = faddeeva;
    }

    /**
     * @param x     distance from the line centre, in the unit of sigma and gamma
     * @param sigma Gaussian standard deviation, positive
     * @param gamma Lorentzian half width at half maximum, not negative
     */
    public double value(double x, double sigma, double gamma) {
        if (!(sigma > 0) || !(gamma >= 0)) {
            throw new IllegalArgumentException("sigma must be positive and gamma not negative, were " + sigma
                    + " and " + gamma);
        }
        double s = 1.0 / (sigma * Math.sqrt(2.0));
        return faddeeva.real(x * s, gamma * s) / (sigma * SQRT_2PI);
    }

    /**
     * Half width at half maximum, approximated after Olivero and Longbothum, JQSRT 17 (1977) 233, to about
     * 0.02 % (from memory): 0.5346 gL + sqrt(0.2166 gL^2 + gG^2), gG the Gaussian half width.
     */
    public static double halfWidth(double sigma, double gamma) {
        double gaussian = sigma * Math.sqrt(2.0 * Math.log(2.0));
        return 0.5346 * gamma + Math.sqrt(0.2166 * gamma * gamma + gaussian * gaussian);
    }
}
