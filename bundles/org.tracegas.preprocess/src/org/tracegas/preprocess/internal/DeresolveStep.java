package org.tracegas.preprocess.internal;

import java.util.Map;
import java.util.Set;
import java.util.SortedMap;

import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.preprocess.SpectrumStep;
import org.tracegas.preprocess.SpectrumStepFactory;
import org.tracegas.spectrum.Spectrum;

/** Step "deresolve": convolution with the line shape of apodization and resolution (cm-1). */
public final class DeresolveStep implements SpectrumStep {

    public static final String ID = "deresolve";

    private final InstrumentLineShape lineShape;

    public DeresolveStep(InstrumentLineShape lineShape) {
        this.lineShape = lineShape;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public SortedMap<String, String> parameters() {
        return StepParameters.of("apodization", lineShape.apodization().name(), "resolution",
                Double.toString(lineShape.nominalResolution()));
    }

    @Override
    public Spectrum apply(Spectrum input) {
        return lineShape.apply(input);
    }

    /** Creates deresolution steps. */
    public static final class Factory implements SpectrumStepFactory {

        @Override
        public String id() {
            return ID;
        }

        @Override
        public SpectrumStep create(Map<String, String> parameters) {
            StepParameters p = new StepParameters(ID, parameters, Set.of("apodization", "resolution"));
            double resolution = p.number("resolution");
            Apodization apodization = p.build(() -> Apodization.parse(p.text("apodization")));
            return new DeresolveStep(p.build(() -> InstrumentLineShape.forResolution(apodization, resolution)));
        }
    }
}
