package org.tracegas.quantify.internal;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.PreparedFit;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.spectrum.SpectralAxis;

/**
 * {@link FitAlgorithm#CURVE_OF_GROWTH}: each system a {@link CurveOfGrowthSystem} over the compounds' curves of
 * growth. A record without components, so that every instance is equal.
 */
public record CurveOfGrowthAlgorithm() implements FitAlgorithm {

    /** The name in method files and stored method versions. */
    public static final String NAME = "curve-of-growth";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Set<ShiftTerm> shiftTerms() {
        return Set.of(ShiftTerm.SCALE);
    }

    /**
     * @throws IllegalArgumentException also if a reference is on a non-uniform axis, which the band-limited
     *                                  resampling of the curves cannot take
     */
    @Override
    public PreparedFit prepare(QuantificationMethod method, SpectralAxis axis) {
        Map<String, CurveOfGrowth> curves = new LinkedHashMap<>();
        for (String compound : method.fittedCompounds()) {
            curves.put(compound, curve(method.references(compound), compound));
        }
        return new SystemsFit(method, axis, (label, compounds, points, wavenumbers) -> new CurveOfGrowthSystem(label,
                compounds.stream().map(curves::get).toList(), points, wavenumbers, method.shiftTerm(),
                method.tolerance(), method.maxIterations()));
    }

    private static CurveOfGrowth curve(List<ReferenceSpectrum> refs, String compound) {
        int n = refs.size();
        double[] amounts = new double[n];
        double[] first = new double[n];
        double[] step = new double[n];
        double[][] values = new double[n][];
        for (int i = 0; i < n; i++) {
            ReferenceSpectrum r = refs.get(i);
            SpectralAxis a = r.absorbance().axis();
            if (!a.isUniform()) {
                throw new IllegalArgumentException("reference of " + compound + " at " + r.ppmMetres()
                        + " ppm·m is on a non-uniform axis; the curve-of-growth fit resamples references "
                        + "band-limited and needs uniform axes");
            }
            amounts[i] = r.ppmMetres();
            first[i] = a.first();
            step[i] = a.step();
            values[i] = r.absorbance().toArray();
        }
        return new CurveOfGrowth(compound, amounts, first, step, values);
    }

    @Override
    public String toString() {
        return NAME;
    }
}
