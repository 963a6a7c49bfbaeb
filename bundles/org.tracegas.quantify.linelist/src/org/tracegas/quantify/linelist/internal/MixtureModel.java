package org.tracegas.quantify.linelist.internal;

import java.util.List;

import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * The transmittance a spectrometer reports for a mixture in the cell, on a fine grid: the monochromatic
 * transmittance T = exp(-sum_c x_c tau_c) of all compounds together (x_c in ppm·m, tau_c the optical depth of one
 * ppm·m computed line by line at the cell's temperature and pressure), convolved with the instrument line shape
 * and then with the field-of-view broadening, and the derivatives of that observed transmittance with respect to
 * each amount. Immutable.
 * <p>
 * The optical depth is taken as proportional to the amount: the self-broadening a compound's own amount adds to
 * its lines is left out, which at trace amounts (below 1 % of the gas) changes line widths by less than 1 % of the
 * air-broadened width (common practice, no source).
 * <p>
 * Field of view: a ray at angle theta to the axis sees the path difference x cos(theta), so a line at nu0 appears
 * at nu0 cos(theta); over a uniformly lit circular beam of half angle alpha it is spread evenly over
 * [nu0 (1 - alpha^2 / 2), nu0] (small angles; from memory, the self-apodization of a finite aperture, as in
 * Fourier transform spectroscopy textbooks). The width is taken at the middle of the fit range.
 */
public final class MixtureModel {

    /** Resolution elements beyond each end of the fit range that the fine grid covers, for the line shape's wings. */
    private static final int MARGIN_RESOLUTIONS = 10;
    /** The amount of the nominal path whose optical depth is computed, ppm: small, so self-broadening is nil. */
    private static final double NOMINAL_PPM = 1.0;

    private final SpectralAxis fine;
    private final double[][] tauPerAmount; // [compound][fine point], optical depth of 1 ppm·m
    private final InstrumentLineShape lineShape;
    private final double fieldWidth;       // cm-1, width of the field-of-view boxcar

    /**
     * @param models      line-by-line model of each compound
     * @param temperature K
     * @param pressure    kPa
     * @param pathMetres  optical path of the cell, m
     * @param lineShape   instrument line shape
     * @param fieldOfView beam half angle, rad
     * @param low         lowest wavenumber at which the model is read, cm-1
     * @param high        highest wavenumber at which the model is read, cm-1
     */
    public MixtureModel(List<LineByLineModel> models, double temperature, double pressure, double pathMetres,
            InstrumentLineShape lineShape, double fieldOfView, double low, double high) {
        this.lineShape = lineShape;
        double resolution = lineShape.nominalResolution();
        AbsorptionPath nominal = new AbsorptionPath(temperature, pressure, NOMINAL_PPM, pathMetres);
        double narrowest = Double.POSITIVE_INFINITY;
        for (LineByLineModel m : models) {
            narrowest = Math.min(narrowest, m.narrowestHalfWidth(low, high, nominal));
        }
        // a third of the narrowest line's half width and an eighth of the resolution, as the library's synthesis
        double step = Math.min(resolution / 8, narrowest / 3);
        this.fieldWidth = 0.5 * (low + high) / 2 * fieldOfView * fieldOfView;
        // beyond the line shape's reach: also the field-of-view width and the largest wavenumber scale's shift
        double margin = MARGIN_RESOLUTIONS * resolution + fieldWidth + 1e-4 * high;
        int size = (int) Math.ceil((high - low + 2 * margin) / step) + 1;
        this.fine = SpectralAxis.uniform(AxisUnit.WAVENUMBER, low - margin, step, size);
        double amount = nominal.concentrationPathLength();
        this.tauPerAmount = new double[models.size()][];
        for (int c = 0; c < models.size(); c++) {
            double[] tau = models.get(c).opticalDepth(fine, nominal).toArray();
            for (int i = 0; i < tau.length; i++) {
                tau[i] /= amount;
            }
            tauPerAmount[c] = tau;
        }
    }

    /** The fine grid on which {@link #observe} gives its values. */
    public SpectralAxis grid() {
        return fine;
    }

    public int compounds() {
        return tauPerAmount.length;
    }

    /**
     * The observed transmittance of a mixture on the fine grid and, when asked, its derivative with respect to each
     * amount.
     *
     * @param amounts     ppm·m of each compound
     * @param derivatives receives d T_observed / d amount_c per compound, or null when not wanted
     * @return the observed transmittance
     */
    public double[] observe(double[] amounts, double[][] derivatives) {
        int n = fine.size();
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            double tau = 0;
            for (int c = 0; c < amounts.length; c++) {
                tau += amounts[c] * tauPerAmount[c][i];
            }
            t[i] = Math.exp(-tau);
        }
        if (derivatives != null) {
            for (int c = 0; c < amounts.length; c++) {
                double[] d = new double[n];
                for (int i = 0; i < n; i++) {
                    d[i] = -tauPerAmount[c][i] * t[i];
                }
                derivatives[c] = instrument(d, Ordinate.ARBITRARY);
            }
        }
        return instrument(t, Ordinate.TRANSMITTANCE);
    }

    /** The observed transmittance of one compound alone at an amount. */
    public double[] observeAlone(int compound, double amount) {
        double[] t = new double[fine.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.exp(-amount * tauPerAmount[compound][i]);
        }
        return instrument(t, Ordinate.TRANSMITTANCE);
    }

    /** The instrument's view of a monochromatic spectrum: its line shape, then the field-of-view boxcar. */
    private double[] instrument(double[] monochromatic, Ordinate ordinate) {
        double[] seen = lineShape.apply(new Spectrum(fine, monochromatic, ordinate)).toArray();
        return fieldWidth > 0 ? boxcar(seen) : seen;
    }

    /**
     * out(nu) = mean of in over [nu, nu + w]. The values between grid points are those of the Catmull-Rom cubic
     * that {@link CubicReader} reads, integrated exactly: the trapezoid rule, read linearly between grid points,
     * erred by up to 8e-4 in transmittance beside a saturated line against an average over ray angles.
     */
    private double[] boxcar(double[] in) {
        int n = in.length;
        double h = fine.step();
        double[] integral = new double[n];
        for (int i = 1; i < n; i++) {
            integral[i] = integral[i - 1] + CubicReader.cellIntegral(in, i - 1, 1.0) * h;
        }
        double cells = fieldWidth / h;
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double at = i + cells;
            int k = (int) Math.floor(at);
            double upper;
            if (k >= n - 1) {
                // past the grid's end, where the margin holds no fitted point: the end value continues
                upper = integral[n - 1] + (at - (n - 1)) * h * in[n - 1];
            } else {
                upper = integral[k] + CubicReader.cellIntegral(in, k, at - k) * h;
            }
            out[i] = (upper - integral[i]) / fieldWidth;
        }
        return out;
    }
}
