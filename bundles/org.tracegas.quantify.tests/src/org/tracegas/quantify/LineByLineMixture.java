package org.tracegas.quantify;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * An independent generator of measured spectra for accuracy checks, built on the physics and not on the fit's
 * model: on a fine grid (0.005 cm-1) the monochromatic transmittance of the whole mixture is the product of its
 * compounds' transmittances, T = prod_i exp(-tau_i) (Beer-Lambert law; tau_i a sum of Lorentz lines, the
 * pressure-broadened profile at atmospheric pressure, where the Doppler half width of a light molecule near
 * 2100 cm-1, about 0.003 cm-1, is negligible beside a 0.08 cm-1 Lorentz half width; both from memory). THEN the
 * instrument line shape acts on that transmittance (a Gaussian of 1.0 cm-1 full width at half maximum, standing for
 * an apodized FTIR line shape at 1 cm-1 resolution), THEN detector noise is added to the transmittance and the
 * spectrum taken as absorbance, -log10 T, on the requested axis. Saturated and overlapping lines therefore behave
 * as in a real cell: the apparent absorbance of a line narrower than the instrument grows less than in proportion
 * to the amount, and that of two overlapping lines is not the sum of each alone. The approach of synthesizing at
 * high resolution before the instrument follows Griffith, Appl. Spectrosc. 50, 59 (1996).
 * <p>
 * The compounds are invented bands in 2080-2220 cm-1 (scenario of the Tarnbeck plant's stack analyser): TX1 a
 * diatomic-like band with strong, widely spaced lines that saturate, TX2 a band whose lines fall among them, TX3
 * weaker lines like water vapour.
 */
final class LineByLineMixture {

    /** Sample axis: 0.5 cm-1 steps over 2080-2220 cm-1. */
    static final SpectralAxis SAMPLE_AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2080.0, 0.5, 281);
    /**
     * Reference axis: 0.25 cm-1 steps, offset by 0.1 cm-1 from the sample's points, so that every reference has
     * to be put onto the sample axis.
     */
    static final SpectralAxis REFERENCE_AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2075.1, 0.25, 600);
    /** Compound names, in the order of {@link #HIGHEST}. */
    static final List<String> COMPOUNDS = List.of("TX1", "TX2", "TX3");
    /** Highest reference amount of each compound in ppm·m; references at a quarter, a half and the whole. */
    static final double[] HIGHEST = {400, 600, 40000};

    private static final double FINE_STEP = 0.005;
    private static final double LORENTZ_HWHM = 0.08;
    private static final double ILS_FWHM = 1.0;
    private static final double LINE_REACH = 20;   // cm-1 each side of a line centre that the sum includes
    private static final double FINE_LOW = 2060;
    private static final double FINE_HIGH = 2240;

    private final double[][] centres = new double[3][];
    private final double[][] strengths = new double[3][]; // cm-1 per ppm·m: integrated optical depth per amount

    /** Where the compounds' lines lie relative to each other. */
    enum Layout {
        /** TX1 only below 2150 cm-1, TX2 and TX3 only above: no two compounds' lines within the line shape. */
        SEPARATE,
        /**
         * TX2 and TX3 lines between TX1's lines, 1.5 cm-1 and more from their centres: they overlap the strong
         * lines' wings as seen through the instrument (TX2 near the band centre, TX3 further out).
         */
        BLENDED,
        /** A dense TX2 band and irregular TX3 lines that also fall onto TX1's line centres. */
        COINCIDENT
    }

    LineByLineMixture(Layout layout) {
        List<double[]> a = new ArrayList<>();
        for (int m = -18; m <= 18; m++) {
            if (m != 0 && (m < 0 || layout != Layout.SEPARATE)) {
                double envelope = Math.abs(m) * Math.exp(-(m / 8.0) * (m / 8.0));
                a.add(new double[] {strongLine(m), 1.0e-3 * envelope});
            }
        }
        List<double[]> b = new ArrayList<>();
        List<double[]> c = new ArrayList<>();
        Random random = new Random(4711);
        if (layout == Layout.COINCIDENT) {
            for (int m = -70; m <= 70; m++) {
                if (m != 0) {
                    double envelope = Math.abs(m) * Math.exp(-(m / 30.0) * (m / 30.0));
                    b.add(new double[] {2140 + 0.83 * m, 3e-5 * envelope});
                }
            }
            for (int l = 0; l < 40; l++) {
                c.add(new double[] {2085 + 130 * random.nextDouble(), 8e-6 * Math.pow(random.nextDouble(), 2)});
            }
        } else {
            for (int m = -18; m < 18; m++) {
                double gap = (m == -1 || m == 0) ? 2150 : (strongLine(m) + strongLine(m + 1)) / 2;
                boolean mine = layout == Layout.BLENDED || m >= 0;
                if (mine && Math.abs(m) <= 10) {
                    b.add(new double[] {gap + 0.3 * (2 * random.nextDouble() - 1), 2e-4 * (4 + Math.abs(m))});
                } else if (mine) {
                    c.add(new double[] {gap + 0.3 * (2 * random.nextDouble() - 1), 1.5e-5 * (0.5 + random.nextDouble())});
                }
            }
        }
        set(0, a);
        set(1, b);
        set(2, c);
    }

    private static double strongLine(int m) {
        return 2150 + 3.7 * m - 0.02 * m * m;
    }

    private void set(int compound, List<double[]> lines) {
        centres[compound] = lines.stream().mapToDouble(l -> l[0]).toArray();
        strengths[compound] = lines.stream().mapToDouble(l -> l[1]).toArray();
    }

    /**
     * Absorbance of a mixture as the spectrometer reports it.
     *
     * @param axis              the axis to report on
     * @param ppmMetres         amount of each compound
     * @param offset            baseline absorbance at 2150 cm-1
     * @param slope             baseline absorbance change per cm-1
     * @param scale             relative wavenumber scale: every line at nu (1 + scale)
     * @param transmittanceNoise standard deviation of the noise on the transmittance
     * @param random            noise source
     */
    Spectrum absorbance(SpectralAxis axis, double[] ppmMetres, double offset, double slope, double scale,
            double transmittanceNoise, Random random) {
        int fine = (int) Math.round((FINE_HIGH - FINE_LOW) / FINE_STEP) + 1;
        double[] tau = new double[fine];
        for (int c = 0; c < 3; c++) {
            for (int l = 0; l < centres[c].length; l++) {
                double area = strengths[c][l] * ppmMetres[c];
                double centre = centres[c][l] * (1 + scale);
                int from = Math.max(0, (int) ((centre - LINE_REACH - FINE_LOW) / FINE_STEP));
                int to = Math.min(fine - 1, (int) ((centre + LINE_REACH - FINE_LOW) / FINE_STEP));
                for (int i = from; i <= to; i++) {
                    double d = FINE_LOW + i * FINE_STEP - centre;
                    // Lorentz profile of unit area: (gamma / pi) / (d^2 + gamma^2)
                    tau[i] += area * LORENTZ_HWHM / Math.PI / (d * d + LORENTZ_HWHM * LORENTZ_HWHM);
                }
            }
        }
        double sigma = ILS_FWHM / (2 * Math.sqrt(2 * Math.log(2)));
        int reach = (int) Math.ceil(5 * sigma / FINE_STEP);
        double[] out = new double[axis.size()];
        for (int k = 0; k < out.length; k++) {
            double nu = axis.get(k);
            int centre = (int) Math.round((nu - FINE_LOW) / FINE_STEP);
            double sum = 0;
            double norm = 0;
            for (int i = centre - reach; i <= centre + reach; i++) {
                double d = (FINE_LOW + i * FINE_STEP - nu) / sigma;
                double g = Math.exp(-0.5 * d * d);
                sum += g * Math.exp(-tau[i]);
                norm += g;
            }
            double baseline = Math.pow(10, -(offset + slope * (nu - 2150)));
            double t = sum / norm * baseline + transmittanceNoise * random.nextGaussian();
            out[k] = -Math.log10(t);
        }
        return new Spectrum(axis, out, Ordinate.ABSORBANCE);
    }

    /** A reference of one compound alone on {@link #REFERENCE_AXIS}, without baseline. */
    ReferenceSpectrum reference(int compound, double ppmMetres, double transmittanceNoise, Random random) {
        double[] amounts = new double[3];
        amounts[compound] = ppmMetres;
        return new ReferenceSpectrum(COMPOUNDS.get(compound),
                absorbance(REFERENCE_AXIS, amounts, 0, 0, 0, transmittanceNoise, random), ppmMetres);
    }
}
