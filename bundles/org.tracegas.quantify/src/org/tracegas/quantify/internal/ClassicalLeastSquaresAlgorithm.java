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
 * {@link FitAlgorithm#CLASSICAL_LEAST_SQUARES}: each system a {@link FitSystem} over the compounds' absorptivities.
 * A record without components, so that every instance (the constant, the one the extension registry creates) is
 * equal.
 */
public record ClassicalLeastSquaresAlgorithm() implements FitAlgorithm {

    /** The name in method files and stored method versions. */
    public static final String NAME = "classical-least-squares";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Set<ShiftTerm> shiftTerms() {
        return Set.of(ShiftTerm.SHIFT, ShiftTerm.SHIFT_AND_WIDTH);
    }

    @Override
    public PreparedFit prepare(QuantificationMethod method, SpectralAxis axis) {
        Map<String, Absorptivity> absorptivities = new LinkedHashMap<>();
        for (String compound : method.fittedCompounds()) {
            absorptivities.put(compound, absorptivity(method.references(compound), compound));
        }
        return new SystemsFit(method, axis, (label, compounds, points, wavenumbers) -> new FitSystem(label,
                compounds.stream().map(absorptivities::get).toList(), points, wavenumbers, method.nonlinearity(),
                method.shiftTerm(), method.tolerance(), method.maxIterations()));
    }

    private static Absorptivity absorptivity(List<ReferenceSpectrum> refs, String compound) {
        int n = refs.size();
        double[] amounts = new double[n];
        double[][] axes = new double[n][];
        double[][] values = new double[n][];
        for (int i = 0; i < n; i++) {
            amounts[i] = refs.get(i).ppmMetres();
            axes[i] = refs.get(i).absorbance().axis().toArray();
            values[i] = refs.get(i).absorbance().toArray();
        }
        return new Absorptivity(compound, amounts, axes, values);
    }

    @Override
    public String toString() {
        return NAME;
    }
}
