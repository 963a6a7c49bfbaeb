package org.tracegas.preprocess;

/**
 * Apodization functions of the normalised optical path difference x = OPD / maximum OPD. Every function is 1 at
 * zero path difference, even in x and 0 for |x| &gt; 1.
 */
public enum Apodization {
    /** No weighting (unapodized). */
    BOXCAR(Form.COSINE_SERIES, 1.0),
    /** 1 - |x|. */
    TRIANGULAR(Form.TRIANGLE),
    /** Cosine window 0.54 + 0.46 cos(pi x). */
    HAPP_GENZEL(Form.COSINE_SERIES, 0.54, 0.46),
    /** Blackman-Harris 3-term (minimum side lobe), Harris, Proc. IEEE 66, 51 (1978). */
    BLACKMAN_HARRIS_3(Form.COSINE_SERIES, 0.42323, 0.49755, 0.07922),
    /** Blackman-Harris 4-term (minimum side lobe), Harris, Proc. IEEE 66, 51 (1978). */
    BLACKMAN_HARRIS_4(Form.COSINE_SERIES, 0.35875, 0.48829, 0.14128, 0.01168),
    /**
     * Norton-Beer weak, J. Opt. Soc. Am. 66, 259 (1976), erratum 67, 419 (1977): line width 1.2 times the
     * unapodized one.
     */
    NORTON_BEER_WEAK(Form.POLYNOMIAL, 0.384093, -0.087577, 0.703484),
    /** Norton-Beer medium, same source: line width 1.4 times the unapodized one. */
    NORTON_BEER_MEDIUM(Form.POLYNOMIAL, 0.152442, -0.136176, 0.983734),
    /**
     * Norton-Beer strong, same source: line width 1.6 times the unapodized one. The published table gives the
     * coefficients of (1 - x^2)^0, ^1, ^2 and ^4; the third power has none.
     */
    NORTON_BEER_STRONG(Form.POLYNOMIAL, 0.045335, 0.0, 0.554883, 0.0, 0.399782);

    private enum Form {
        /** sum c_k cos(k pi x). */
        COSINE_SERIES,
        /** sum c_i (1 - x^2)^i. */
        POLYNOMIAL,
        TRIANGLE
    }

    private final Form form;
    private final double[] coefficients;

    Apodization(Form form, double... coefficients) {
        this.form = form;
        this.coefficients = coefficients;
    }

    /**
     * Weight at normalised optical path difference x = OPD / maximum OPD.
     *
     * @return the weight, 0 outside [-1, 1]
     */
    public double weight(double x) {
        double a = Math.abs(x);
        if (!(a <= 1.0)) {
            return 0.0;
        }
        switch (form) {
            case TRIANGLE:
                return 1.0 - a;
            case POLYNOMIAL: {
                double u = 1.0 - a * a;
                double sum = 0.0;
                for (int i = coefficients.length - 1; i >= 0; i--) {
                    sum = sum * u + coefficients[i];
                }
                return sum;
            }
            default: {
                double sum = 0.0;
                for (int k = 0; k < coefficients.length; k++) {
                    sum += coefficients[k] * Math.cos(k * Math.PI * a);
                }
                return sum;
            }
        }
    }

    /**
     * Mean square weight m2 = integral from 0 to 1 of A(x)^2 dx (composite Simpson rule, 2048 panels): the noise
     * power the apodization lets through, relative to none. It sets how far apodization correlates the noise of
     * neighbouring spectral points (see {@link InterferogramTransform#noiseVarianceFactor}).
     */
    public double meanSquare() {
        int panels = 2048;
        double h = 1.0 / panels;
        double sum = square(0.0) + square(1.0);
        for (int i = 1; i < panels; i++) {
            sum += (i % 2 == 1 ? 4 : 2) * square(i * h);
        }
        return sum * h / 3.0;
    }

    private double square(double x) {
        double w = weight(x);
        return w * w;
    }

    /**
     * The coefficients that define the function: element k of cos(k pi x) for the cosine windows, element i of
     * (1 - x^2)^i for the Norton-Beer functions, none for the triangle.
     */
    public double[] coefficients() {
        return coefficients.clone();
    }

    /**
     * Parses a name as written by {@link #name()}, ignoring case.
     *
     * @throws IllegalArgumentException naming the text and the known names
     */
    public static Apodization parse(String text) {
        for (Apodization a : values()) {
            if (a.name().equalsIgnoreCase(text == null ? "" : text.trim())) {
                return a;
            }
        }
        throw new IllegalArgumentException("unknown apodization '" + text + "', expected one of "
                + java.util.Arrays.toString(values()));
    }
}
