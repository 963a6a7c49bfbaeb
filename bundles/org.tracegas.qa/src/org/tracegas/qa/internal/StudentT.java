package org.tracegas.qa.internal;

/**
 * Quantiles of Student's t distribution: the two-sided coverage factor k = t_p(nu) of an expanded uncertainty
 * with nu degrees of freedom (JCGM 100:2008 G.3 and Table G.2). The distribution function is the regularized
 * incomplete beta function, I_{nu/(nu+t^2)}(nu/2, 1/2), by its continued fraction (modified Lentz); the quantile is
 * found by bisection.
 */
public final class StudentT {

    private StudentT() {
    }

    /**
     * t such that the interval [-t, t] holds the fraction p of the distribution.
     *
     * @param p  coverage probability, in (0, 1)
     * @param nu degrees of freedom, at least 1; positive infinity for the normal distribution
     */
    public static double twoSidedQuantile(double p, double nu) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("p must lie in (0, 1), was " + p);
        }
        if (!(nu >= 1)) {
            throw new IllegalArgumentException("nu must be at least 1, was " + nu);
        }
        if (Double.isInfinite(nu) || nu > 1e7) {
            nu = 1e7; // the normal limit, reached to far better than the 4 digits of any table
        }
        double lo = 0;
        double hi = 1;
        while (twoSidedTail(hi, nu) > 1 - p) {
            hi *= 2;
        }
        for (int i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (twoSidedTail(mid, nu) > 1 - p) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** P(|T| > t) = I_{nu/(nu+t^2)}(nu/2, 1/2). */
    static double twoSidedTail(double t, double nu) {
        return regularizedBeta(nu / (nu + t * t), nu / 2, 0.5);
    }

    private static double regularizedBeta(double x, double a, double b) {
        if (x <= 0) {
            return 0;
        }
        if (x >= 1) {
            return 1;
        }
        double front = Math.exp(logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log1p(-x));
        if (x < (a + 1) / (a + b + 2)) {
            return front * continuedFraction(x, a, b) / a;
        }
        return 1 - front * continuedFraction(1 - x, b, a) / b;
    }

    private static double continuedFraction(double x, double a, double b) {
        double tiny = 1e-300;
        double c = 1;
        double d = 1 - (a + b) * x / (a + 1);
        d = 1 / (Math.abs(d) < tiny ? tiny : d);
        double f = d;
        for (int m = 1; m <= 10000; m++) {
            int m2 = 2 * m;
            double even = m * (b - m) * x / ((a + m2 - 1) * (a + m2));
            d = 1 / nonZero(1 + even * d, tiny);
            c = nonZero(1 + even / c, tiny);
            f *= d * c;
            double odd = -(a + m) * (a + b + m) * x / ((a + m2) * (a + m2 + 1));
            d = 1 / nonZero(1 + odd * d, tiny);
            c = nonZero(1 + odd / c, tiny);
            double delta = d * c;
            f *= delta;
            if (Math.abs(delta - 1) < 1e-15) {
                break;
            }
        }
        return f;
    }

    private static double nonZero(double v, double tiny) {
        return Math.abs(v) < tiny ? tiny : v;
    }

    /** ln Gamma(x) for x > 0 (Lanczos approximation, g = 7, 9 terms). */
    private static double logGamma(double x) {
        double[] c = {0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313,
                -176.61502916214059, 12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6,
                1.5056327351493116e-7};
        if (x < 0.5) {
            return Math.log(Math.PI / Math.abs(Math.sin(Math.PI * x))) - logGamma(1 - x);
        }
        x -= 1;
        double a = c[0];
        double t = x + 7.5;
        for (int i = 1; i < 9; i++) {
            a += c[i] / (x + i);
        }
        return 0.5 * Math.log(2 * Math.PI) + (x + 0.5) * Math.log(t) - t + Math.log(a);
    }
}
