package org.tracegas.library.synthesis;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Line-by-line absorption of one molecule on a fine uniform wavenumber grid: every line's intensity scaled to
 * the cell temperature, a Voigt profile from its Doppler and pressure widths around its pressure-shifted
 * centre, evaluated only within the line cut-off, summed to the optical depth tau(v) = N L sum S_i(T) V_i(v) and
 * turned into the transmittance exp(-tau) of the path (Beer-Lambert).
 * <p>
 * One molar mass serves all isotopologues of the list in the Doppler width: for CO the width of a 13C16O line
 * comes out 1.7 % too narrow, which the instrument line shape hides at the resolutions of extractive FTIR.
 */
public final class LineByLineModel {

    private static final double SQRT_2PI = Math.sqrt(2.0 * Math.PI);
    private static final double SQRT_2 = Math.sqrt(2.0);

    private final LineList lines;
    private final double molarMass;
    private final PartitionFunction partitionFunction;
    private final FaddeevaFunction faddeeva;
    private final LineCutoff cutoff;

    /**
     * @param lines             the line list of the molecule
     * @param molarMass         molar mass of the molecule in g/mol, for the Doppler width
     * @param partitionFunction Q(T) of the molecule
     * @param faddeeva          w(z) for the Voigt profile
     * @param cutoff            how far from its centre each line is evaluated
     */
    public LineByLineModel(LineList lines, double molarMass, PartitionFunction partitionFunction,
            FaddeevaFunction faddeeva, LineCutoff cutoff) {
        if (lines == null || partitionFunction == null || faddeeva == null || cutoff == null) {
            throw new IllegalArgumentException("lines, partitionFunction, faddeeva and cutoff must not be null");
        }
        if (!(molarMass > 0 && Double.isFinite(molarMass))) {
            throw new IllegalArgumentException("molarMass must be positive and finite, was " + molarMass);
        }
        this.lines = lines;
        this.molarMass = molarMass;
        this.partitionFunction = partitionFunction;
        this.faddeeva = faddeeva;
        this.cutoff = cutoff;
    }

    /** A model with the standard w(z) and the 25 cm-1 cut-off. */
    public LineByLineModel(LineList lines, double molarMass, PartitionFunction partitionFunction) {
        this(lines, molarMass, partitionFunction, FaddeevaFunction.standard(), LineCutoff.standard());
    }

    public LineList lines() {
        return lines;
    }

    public PartitionFunction partitionFunction() {
        return partitionFunction;
    }

    public LineCutoff cutoff() {
        return cutoff;
    }

    /**
     * Optical depth tau (natural logarithm) of the path on a uniform, rising wavenumber axis.
     *
     * @return a spectrum with {@link Ordinate#ARBITRARY} values tau
     */
    public Spectrum opticalDepth(SpectralAxis axis, AbsorptionPath path) {
        requireFineAxis(axis);
        if (path == null) {
            throw new IllegalArgumentException("path must not be null");
        }
        return new Spectrum(axis, tau(axis, path), Ordinate.ARBITRARY);
    }

    /** Transmittance exp(-tau) of the path on a uniform, rising wavenumber axis. */
    public Spectrum transmittance(SpectralAxis axis, AbsorptionPath path) {
        double[] t = opticalDepth(axis, path).toArray();
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.exp(-t[i]);
        }
        return new Spectrum(axis, t, Ordinate.TRANSMITTANCE);
    }

    /**
     * The smallest Voigt half width in cm-1 among the lines whose centres lie in [from, to], or among all lines
     * if none does; a fine grid must resolve it.
     */
    public double narrowestHalfWidth(double from, double to, AbsorptionPath path) {
        double narrowest = Double.POSITIVE_INFINITY;
        double all = Double.POSITIVE_INFINITY;
        for (SpectralLine line : lines.lines()) {
            double w = VoigtProfile.halfWidth(DopplerWidth.sigma(line.wavenumber(), path.temperature(), molarMass),
                    LorentzWidth.halfWidth(line, path));
            all = Math.min(all, w);
            if (line.wavenumber() >= from && line.wavenumber() <= to) {
                narrowest = Math.min(narrowest, w);
            }
        }
        return Double.isInfinite(narrowest) ? all : narrowest;
    }

    private static void requireFineAxis(SpectralAxis axis) {
        if (axis == null || axis.unit() != AxisUnit.WAVENUMBER || !axis.isUniform() || !axis.isAscending()
                || axis.size() < 2) {
            throw new IllegalArgumentException("the fine grid must be a uniform, rising wavenumber axis of at least "
                    + "2 points, was " + axis);
        }
    }

    private double[] tau(SpectralAxis axis, AbsorptionPath path) {
        double first = axis.first();
        double step = axis.step();
        int size = axis.size();
        double last = axis.last();
        double[] tau = new double[size];
        double column = path.absorberDensity() * path.pathLengthCm();
        for (SpectralLine line : lines.lines()) {
            double centre = LorentzWidth.centre(line, path);
            double gamma = LorentzWidth.halfWidth(line, path);
            double sigma = DopplerWidth.sigma(line.wavenumber(), path.temperature(), molarMass);
            double reach = cutoff.distance(VoigtProfile.halfWidth(sigma, gamma));
            if (centre + reach < first || centre - reach > last) {
                continue;
            }
            int lo = (int) Math.max(0, Math.ceil((centre - reach - first) / step));
            int hi = (int) Math.min(size - 1, Math.floor((centre + reach - first) / step));
            double scale = 1.0 / (sigma * SQRT_2);
            double y = gamma * scale;
            double amplitude = column * LineIntensity.at(line, path.temperature(), partitionFunction)
                    / (sigma * SQRT_2PI);
            double offset = (first - centre) * scale;
            double dx = step * scale;
            for (int i = lo; i <= hi; i++) {
                tau[i] += amplitude * faddeeva.real(offset + i * dx, y);
            }
        }
        return tau;
    }
}
