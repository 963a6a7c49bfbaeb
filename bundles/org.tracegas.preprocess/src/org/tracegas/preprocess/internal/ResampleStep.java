package org.tracegas.preprocess.internal;

import java.util.Map;
import java.util.Set;
import java.util.SortedMap;

import org.tracegas.preprocess.SincResampler;
import org.tracegas.preprocess.SpectrumStep;
import org.tracegas.preprocess.SpectrumStepFactory;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** Step "resample": onto the uniform wavenumber axis first, step, size; optional halfWidth of the kernel. */
public final class ResampleStep implements SpectrumStep {

    public static final String ID = "resample";

    private final SpectralAxis target;
    private final SincResampler resampler;

    public ResampleStep(SpectralAxis target, SincResampler resampler) {
        if (!target.isUniform()) {
            throw new IllegalArgumentException("resample target axis must be uniform to be written in a recipe");
        }
        this.target = target;
        this.resampler = resampler;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public SortedMap<String, String> parameters() {
        return StepParameters.of("first", Double.toString(target.first()), "step", Double.toString(target.step()),
                "size", Integer.toString(target.size()), "halfWidth", Integer.toString(resampler.halfWidth()));
    }

    @Override
    public Spectrum apply(Spectrum input) {
        return resampler.resample(input, target);
    }

    /** Creates resampling steps. */
    public static final class Factory implements SpectrumStepFactory {

        @Override
        public String id() {
            return ID;
        }

        @Override
        public SpectrumStep create(Map<String, String> parameters) {
            StepParameters p = new StepParameters(ID, parameters, Set.of("first", "step", "size", "halfWidth"));
            double first = p.number("first");
            double step = p.number("step");
            int size = p.integer("size", 0);
            int halfWidth = p.integer("halfWidth", SincResampler.DEFAULT_HALF_WIDTH);
            return p.build(() -> new ResampleStep(SpectralAxis.uniform(AxisUnit.WAVENUMBER, first, step, size),
                    new SincResampler(halfWidth)));
        }
    }
}
