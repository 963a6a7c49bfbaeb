package org.tracegas.quantify;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

import org.tracegas.quantify.internal.Absorptivity;
import org.tracegas.quantify.internal.CurveOfGrowth;
import org.tracegas.quantify.internal.CurveOfGrowthSystem;
import org.tracegas.quantify.internal.FitPoints;
import org.tracegas.quantify.internal.FitSystem;
import org.tracegas.quantify.internal.Resampler;
import org.tracegas.quantify.internal.SystemSolver;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * A method made ready for samples on one axis by its {@link FitAlgorithm}: references resampled onto the axis and
 * everything else that does not depend on the sample computed (design matrices decomposed, pseudo-inverses or Gram
 * matrices formed). Analytes whose fits share the same compounds and regions share one system,
 * solved once per sample. Immutable and safe to share between threads.
 */
public final class PreparedMethod {

    private final QuantificationMethod method;
    private final SpectralAxis axis;
    private final List<SystemSolver> systems;
    private final int[] systemOfAnalyte;
    private final int[] columnOfAnalyte;

    private PreparedMethod(QuantificationMethod method, SpectralAxis axis) {
        this.method = method;
        this.axis = axis;
        double[] wavenumbers = axis.toArray();
        double[] weights = method.weights().map(w -> resample(w, wavenumbers)).orElse(null);
        boolean curveOfGrowth = method.algorithm() == FitAlgorithm.CURVE_OF_GROWTH;
        Map<String, Absorptivity> absorptivities = new LinkedHashMap<>();
        Map<String, CurveOfGrowth> curves = new LinkedHashMap<>();
        for (String compound : method.fittedCompounds()) {
            if (curveOfGrowth) {
                curves.put(compound, curve(compound));
            } else {
                absorptivities.put(compound, absorptivity(compound));
            }
        }
        Map<List<Object>, Integer> systemIndex = new LinkedHashMap<>();
        List<SystemSolver> built = new ArrayList<>();
        List<Analyte> analytes = method.analytes();
        this.systemOfAnalyte = new int[analytes.size()];
        this.columnOfAnalyte = new int[analytes.size()];
        for (int a = 0; a < analytes.size(); a++) {
            Analyte analyte = analytes.get(a);
            List<Object> key = List.of(new TreeSet<>(analyte.fittedCompounds()), analyte.regions());
            Integer index = systemIndex.get(key);
            if (index == null) {
                String label = "fit of " + analyte.compound();
                FitPoints points = new FitPoints(label, analyte.regions(), wavenumbers, weights);
                List<String> compounds = analyte.fittedCompounds();
                built.add(curveOfGrowth
                        ? new CurveOfGrowthSystem(label, compounds.stream().map(curves::get).toList(), points,
                                wavenumbers, method.shiftTerm(), method.tolerance(), method.maxIterations())
                        : new FitSystem(label, compounds.stream().map(absorptivities::get).toList(), points,
                                wavenumbers, method.nonlinearity(), method.shiftTerm(), method.tolerance(),
                                method.maxIterations()));
                index = built.size() - 1;
                systemIndex.put(key, index);
            }
            systemOfAnalyte[a] = index;
            SystemSolver system = built.get(index);
            for (int c = 0; c < system.compounds(); c++) {
                if (system.compound(c).equals(analyte.compound())) {
                    columnOfAnalyte[a] = c;
                }
            }
        }
        this.systems = List.copyOf(built);
    }

    /**
     * @param method the method
     * @param axis   the wavenumber axis of the samples to come
     * @throws IllegalArgumentException if the axis is not in wavenumbers, a reference or the weights do not cover a
     *                                  region, a region holds too few points, compounds cannot be told apart in
     *                                  a fit, or a reference's axis does not suit the algorithm; the message names
     *                                  the analyte and compound
     */
    public static PreparedMethod prepare(QuantificationMethod method, SpectralAxis axis) {
        if (method == null) {
            throw new IllegalArgumentException("method must not be null");
        }
        if (axis == null || axis.unit() != AxisUnit.WAVENUMBER || axis.size() < 2) {
            throw new IllegalArgumentException("axis must be a WAVENUMBER axis of at least 2 points, was " + axis);
        }
        return new PreparedMethod(method, axis);
    }

    private Absorptivity absorptivity(String compound) {
        List<ReferenceSpectrum> refs = method.references(compound);
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

    private CurveOfGrowth curve(String compound) {
        List<ReferenceSpectrum> refs = method.references(compound);
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

    private static double[] resample(Spectrum weights, double[] wavenumbers) {
        Resampler r = new Resampler(weights.axis().toArray(), weights.toArray());
        double[] out = new double[wavenumbers.length];
        for (int i = 0; i < out.length; i++) {
            // NaN where the weights end: a fit point there is refused by the fit system
            out[i] = r.covers(wavenumbers[i]) ? r.at(wavenumbers[i]) : Double.NaN;
        }
        return out;
    }

    public QuantificationMethod method() {
        return method;
    }

    public SpectralAxis axis() {
        return axis;
    }

    /** Number of distinct least-squares systems solved per sample. */
    public int systemCount() {
        return systems.size();
    }

    SystemSolver system(int index) {
        return systems.get(index);
    }

    int systemOfAnalyte(int analyte) {
        return systemOfAnalyte[analyte];
    }

    int columnOfAnalyte(int analyte) {
        return columnOfAnalyte[analyte];
    }
}
