package org.tracegas.quantify.linelist;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.FaddeevaFunction;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.LineCutoff;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.library.synthesis.SpectralLine;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Measured spectra of a two-gas mixture made the way the light makes them, apart from the fit's own shortcuts: on a
 * 0.002 cm-1 grid the monochromatic transmittance of each gas at its actual amount (its own self-broadening
 * included, every line's Voigt profile out to 60 cm-1) from the library's line-by-line model, multiplied over the
 * gases (Beer-Lambert law for the mixture); then the instrument: the line shape tabulated out to 40 cm-1 from its
 * defining integral ({@link InstrumentLineShape#value}, a quadrature, not the fast transform the fit uses) and
 * convolved point by point, and the field of view as an average over 8 ray angles, each seeing the spectrum
 * stretched by 1 / cos theta; then a baseline, white noise on the transmittance, and -log10. Griffith, Appl.
 * Spectrosc. 50, 59 (1996) describes this order: high-resolution transmittance first, the instrument afterwards.
 * <p>
 * The gases are invented (scenario: the stack analyser of the Vellmar lime kiln): TX1 a diatomic-like band with
 * strong lines 3.8 cm-1 apart that saturate (optical depth up to about 6 at the line cores at the highest amount),
 * TX2 a denser, weaker band whose lines fall onto and between TX1's.
 */
final class InstrumentMixture {

    static final double TEMPERATURE = 308.15;
    static final double PRESSURE = 99.8;
    static final double PATH = 6.2;
    static final double RESOLUTION = 0.5;
    static final Apodization APODIZATION = Apodization.NORTON_BEER_MEDIUM;
    static final double FIELD_OF_VIEW = 0.008;
    /** Sample axis: 0.25 cm-1 steps over 2090-2210 cm-1. */
    static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2090.0, 0.25, 481);
    static final List<String> GASES = List.of("TX1", "TX2");
    /** Highest amount of each gas in ppm·m. */
    static final double[] HIGHEST = {1200, 3000};

    private static final double FINE_STEP = 0.002;
    private static final double FINE_LOW = 2040;
    private static final int FINE_SIZE = 110001;
    private static final double KERNEL_REACH = 40;
    private static final int ANGLES = 8;

    private final List<LineByLineModel> exact = new ArrayList<>();
    private final List<LineByLineModel> forFit = new ArrayList<>();
    private final double[] kernel;

    InstrumentMixture() {
        this(bands());
    }

    /** A generator of spectra of the given line lists of TX1 and TX2 (as read back from files, say). */
    InstrumentMixture(List<LineList> lists) {
        double[] molarMass = {28.0, 44.0};
        for (int g = 0; g < 2; g++) {
            exact.add(new LineByLineModel(lists.get(g), molarMass[g], PowerLawPartitionFunction.linearMolecule(),
                    FaddeevaFunction.standard(), LineCutoff.wavenumbers(60)));
            forFit.add(new LineByLineModel(lists.get(g), molarMass[g], PowerLawPartitionFunction.linearMolecule()));
        }
        InstrumentLineShape ils = InstrumentLineShape.forResolution(APODIZATION, RESOLUTION);
        int half = (int) Math.round(KERNEL_REACH / FINE_STEP);
        kernel = new double[2 * half + 1];
        double sum = 0;
        for (int k = 0; k <= half; k++) {
            double v = ils.value(k * FINE_STEP);
            kernel[half + k] = v;
            kernel[half - k] = v;
            sum += k == 0 ? v : 2 * v;
        }
        for (int k = 0; k < kernel.length; k++) {
            kernel[k] /= sum; // unit sum: the area beyond 40 cm-1 is not lost as absorption
        }
    }

    /** The models the fit is given: the same line lists, the standard 25 cm-1 cut-off. */
    LineListSetup setup() {
        return new LineListSetup(java.util.Map.of(GASES.get(0), forFit.get(0), GASES.get(1), forFit.get(1)),
                TEMPERATURE, PRESSURE, InstrumentLineShape.forResolution(APODIZATION, RESOLUTION), FIELD_OF_VIEW);
    }

    /** The line lists of TX1 and TX2, in this order. */
    static List<LineList> bands() {
        return List.of(strongBand(), denseBand());
    }

    private static LineList strongBand() {
        List<SpectralLine> lines = new ArrayList<>();
        for (int m = -14; m <= 14; m++) {
            if (m != 0) {
                double e = 1.9 * Math.abs(m) * (Math.abs(m) + 1);
                double s = 9e-20 * Math.abs(m) * Math.exp(-e / 214.0);
                lines.add(new SpectralLine(90, 1, 2150 + 3.8 * m - 0.018 * m * m, s, 10, 0.066 - 0.0006 * Math.abs(m),
                        0.075, e, 0.7, -0.002));
            }
        }
        return new LineList("TX1 invented band", lines);
    }

    private static LineList denseBand() {
        List<SpectralLine> lines = new ArrayList<>();
        Random random = new Random(1996);
        for (int m = -60; m <= 60; m++) {
            if (m != 0) {
                double e = 0.4 * Math.abs(m) * (Math.abs(m) + 1);
                double s = 2.4e-21 * Math.abs(m) * Math.exp(-e / 214.0);
                lines.add(new SpectralLine(91, 1, 2160 + 0.95 * m + 0.2 * random.nextDouble(), s, 1,
                        0.075 + 0.01 * random.nextDouble(), 0.09, e, 0.75, -0.003));
            }
        }
        return new LineList("TX2 invented band", lines);
    }

    /**
     * @param amounts ppm·m of each gas, zero for none
     * @param offset  baseline absorbance at 2150 cm-1
     * @param slope   baseline absorbance change per cm-1
     * @param scale   relative wavenumber scale: every line at nu (1 + scale), as a mis-set laser wavenumber makes it
     * @param noise   standard deviation of the noise on the transmittance
     */
    Spectrum absorbance(double[] amounts, double offset, double slope, double scale, double noise,
            Random random) {
        return withNoise(transmittance(amounts, offset, slope, scale), noise, random);
    }

    /**
     * The noise-free transmittance the spectrometer reports on {@link #AXIS}, baseline included; the parameters as
     * {@link #absorbance}.
     */
    double[] transmittance(double[] amounts, double offset, double slope, double scale) {
        return transmittance(amounts, offset, slope, scale, TEMPERATURE, PRESSURE);
    }

    /** The same in a cell at another temperature (K) and pressure (kPa). */
    double[] transmittance(double[] amounts, double offset, double slope, double scale, double temperature,
            double pressure) {
        SpectralAxis fine = SpectralAxis.uniform(AxisUnit.WAVENUMBER, FINE_LOW, FINE_STEP, FINE_SIZE);
        double[] t = new double[FINE_SIZE];
        java.util.Arrays.fill(t, 1.0);
        for (int g = 0; g < 2; g++) {
            if (amounts[g] > 0) {
                double[] own = exact.get(g).transmittance(fine, new AbsorptionPath(temperature, pressure,
                        amounts[g] / PATH, PATH)).toArray();
                for (int i = 0; i < FINE_SIZE; i++) {
                    t[i] *= own[i];
                }
            }
        }
        double[] out = new double[AXIS.size()];
        for (int p = 0; p < out.length; p++) {
            double nu = AXIS.get(p);
            double seen = 0;
            for (int a = 0; a < ANGLES; a++) {
                // theta^2 evenly spread over [0, alpha^2]: the rays of a uniformly lit circular beam
                double theta2 = FIELD_OF_VIEW * FIELD_OF_VIEW * (a + 0.5) / ANGLES;
                double at = (nu / (1 + scale) / Math.cos(Math.sqrt(theta2)) - FINE_LOW) / FINE_STEP;
                int i = (int) Math.floor(at);
                double f = at - i;
                seen += (1 - f) * convolved(t, i) + f * convolved(t, i + 1);
            }
            seen /= ANGLES;
            out[p] = seen * Math.pow(10, -(offset + slope * (nu - 2150)));
        }
        return out;
    }

    /** The absorbance of a noise-free transmittance with white noise of the given standard deviation added. */
    static Spectrum withNoise(double[] transmittance, double noise, Random random) {
        double[] out = new double[transmittance.length];
        for (int p = 0; p < out.length; p++) {
            out[p] = -Math.log10(transmittance[p] + noise * random.nextGaussian());
        }
        return new Spectrum(AXIS, out, Ordinate.ABSORBANCE);
    }

    /** Points of the transform whose noise {@link #withTransformNoise} imitates: a 256 cm-1 period. */
    private static final int TRANSFORM_POINTS = 1024;
    /** cos(2 pi k / N), k = 0 .. N - 1; sin(x) = cos(x - pi / 2). */
    private static final double[] COSINES = java.util.stream.IntStream.range(0, TRANSFORM_POINTS)
            .mapToDouble(k -> Math.cos(2 * Math.PI * k / TRANSFORM_POINTS)).toArray();

    /**
     * The absorbance of a noise-free transmittance with the noise a transform leaves: white noise on the samples of
     * a double-sided interferogram out to the maximum path difference 1 / resolution, weighted by the apodization
     * and transformed onto {@link #AXIS}, whose 0.25 cm-1 steps are the transform's own (1 / (2 L), no zero
     * filling). Summed directly, cosine and sine terms, so that no code of the product makes it. Its standard
     * deviation at each point is the given one; neighbouring points are correlated by the apodization (Fourier
     * transform spectroscopy textbooks, from memory: the noise's autocorrelation is the transform of the squared
     * window).
     */
    static Spectrum withTransformNoise(double[] transmittance, double noise, Random random) {
        int half = TRANSFORM_POINTS / 2;
        double[] e = new double[transmittance.length];
        for (int j = 0; j <= half; j++) {
            double g = Math.sqrt(power(j));
            double a = g * random.nextGaussian();
            double b = g * random.nextGaussian();
            for (int p = 0; p < e.length; p++) {
                // cos and sin of 2 pi j p / N from the table of one period
                int k = (int) ((long) j * p % TRANSFORM_POINTS);
                e[p] += a * COSINES[k] + b * COSINES[(k + 3 * TRANSFORM_POINTS / 4) % TRANSFORM_POINTS];
            }
        }
        double scale = noise / Math.sqrt(transformNoiseCovariance(0));
        double[] out = new double[e.length];
        for (int p = 0; p < out.length; p++) {
            out[p] = -Math.log10(transmittance[p] + scale * e[p]);
        }
        return new Spectrum(AXIS, out, Ordinate.ABSORBANCE);
    }

    /**
     * The equivalent width of the transform noise's autocorrelation in points, F = sum over all lags of the
     * correlation coefficient (the definition: the area under the autocorrelation over its peak).
     */
    static double transformNoiseWidth() {
        double sum = 0;
        for (int lag = 0; lag < TRANSFORM_POINTS; lag++) {
            sum += transformNoiseCovariance(lag);
        }
        return sum / transformNoiseCovariance(0);
    }

    /** The covariance of {@link #withTransformNoise}'s sum at a lag, before scaling: sum of power_j cos(2 pi j lag / N). */
    private static double transformNoiseCovariance(int lag) {
        int half = TRANSFORM_POINTS / 2;
        double c = 0;
        for (int j = 0; j <= half; j++) {
            c += power(j) * Math.cos(2 * Math.PI * j * lag / TRANSFORM_POINTS);
        }
        return c;
    }

    /**
     * The noise power at path difference j L / (N / 2): the squared apodization weight, halved at 0 and at the
     * transform's end, whose terms are real only (the discrete Fourier transform of real white noise has half the
     * variance there).
     */
    private static double power(int j) {
        int half = TRANSFORM_POINTS / 2;
        double g = APODIZATION.weight((double) j / half);
        return (j == 0 || j == half ? 0.5 : 1) * g * g;
    }

    private double convolved(double[] t, int i) {
        int half = kernel.length / 2;
        double sum = 0;
        for (int k = 0; k < kernel.length; k++) {
            sum += kernel[k] * t[i + k - half];
        }
        return sum;
    }
}
