package org.tracegas.preprocess.internal;

import java.util.Map;
import java.util.Set;
import java.util.SortedMap;

import org.tracegas.preprocess.SincResampler;
import org.tracegas.preprocess.SpectrumStep;
import org.tracegas.preprocess.SpectrumStepFactory;
import org.tracegas.preprocess.WavenumberShift;
import org.tracegas.spectrum.Spectrum;

/** Step "shift": features moved by offset (cm-1) on the same axis; optional halfWidth of the kernel. */
public final class ShiftStep implements SpectrumStep {

    public static final String ID = "shift";

    private final WavenumberShift shift;
    private final int halfWidth;

    public ShiftStep(double offset, int halfWidth) {
        this.shift = new WavenumberShift(offset, new SincResampler(halfWidth));
        this.halfWidth = halfWidth;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public SortedMap<String, String> parameters() {
        return StepParameters.of("offset", Double.toString(shift.offset()), "halfWidth", Integer.toString(halfWidth));
    }

    @Override
    public Spectrum apply(Spectrum input) {
        return shift.apply(input);
    }

    /** Creates shift steps. */
    public static final class Factory implements SpectrumStepFactory {

        @Override
        public String id() {
            return ID;
        }

        @Override
        public SpectrumStep create(Map<String, String> parameters) {
            StepParameters p = new StepParameters(ID, parameters, Set.of("offset", "halfWidth"));
            double offset = p.number("offset");
            int halfWidth = p.integer("halfWidth", SincResampler.DEFAULT_HALF_WIDTH);
            return p.build(() -> new ShiftStep(offset, halfWidth));
        }
    }
}
