package org.tracegas.preprocess.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SortedMap;
import java.util.stream.Collectors;

import org.tracegas.preprocess.PolynomialBaseline;
import org.tracegas.preprocess.SpectrumStep;
import org.tracegas.preprocess.SpectrumStepFactory;
import org.tracegas.preprocess.WavenumberRange;
import org.tracegas.spectrum.Spectrum;

/** Step "baseline": parameters degree and regions ("low:high,low:high", a single point as "point"). */
public final class BaselineStep implements SpectrumStep {

    public static final String ID = "baseline";

    private final PolynomialBaseline baseline;

    public BaselineStep(PolynomialBaseline baseline) {
        this.baseline = baseline;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public SortedMap<String, String> parameters() {
        String regions = baseline.regions().stream().map(WavenumberRange::toString).collect(Collectors.joining(","));
        return StepParameters.of("degree", Integer.toString(baseline.degree()), "regions", regions);
    }

    @Override
    public Spectrum apply(Spectrum input) {
        return baseline.subtract(input);
    }

    /** Creates baseline steps. */
    public static final class Factory implements SpectrumStepFactory {

        @Override
        public String id() {
            return ID;
        }

        @Override
        public SpectrumStep create(Map<String, String> parameters) {
            StepParameters p = new StepParameters(ID, parameters, Set.of("degree", "regions"));
            int degree = p.integer("degree", 1);
            List<WavenumberRange> regions = new ArrayList<>();
            for (String r : p.text("regions").split(",")) {
                regions.add(p.build(() -> WavenumberRange.parse(r)));
            }
            return new BaselineStep(p.build(() -> new PolynomialBaseline(degree, regions)));
        }
    }
}
