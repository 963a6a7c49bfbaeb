package org.tracegas.method;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.HitranLineListReader;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.ReferenceSynthesizer;
import org.tracegas.library.synthesis.SynthesisRequest;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;

/** Makes the synthetic references of a library plan, line by line from each gas's HITRAN-format line list. */
public final class LibrarySynthesis {

    private LibrarySynthesis() {
    }

    /**
     * @return the library, or null when cancelled
     * @throws FileFormatException naming the line list or the plan line at fault
     */
    public static ReferenceLibrary run(LibraryPlan plan, ProgressListener progress, CancellationFlag cancel)
            throws IOException {
        int total = plan.gases().stream().mapToInt(g -> g.ppmMetres().size()).sum();
        int done = 0;
        List<ReferenceSpectrum> references = new ArrayList<>();
        HitranLineListReader reader = new HitranLineListReader();
        for (LibraryPlan.Gas gas : plan.gases()) {
            LineByLineModel model = new LineByLineModel(reader.read(gas.lineList()), gas.compound().molarMass(),
                    gas.partitionFunction());
            ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(model, gas.compound());
            for (double ppmMetres : gas.ppmMetres()) {
                if (cancel.isCancelled()) {
                    return null;
                }
                try {
                    AbsorptionPath path = new AbsorptionPath(plan.temperatureK(), plan.pressureKPa(),
                            ppmMetres / plan.pathLengthM(), plan.pathLengthM());
                    references.add(synthesizer.synthesize(new SynthesisRequest(path, plan.axis(), plan.apodization(),
                            plan.resolution(), plan.relativeUncertainty())));
                } catch (IllegalArgumentException e) {
                    throw new FileFormatException(plan.file(), gas.line(), "ppm-m", gas.compound().name() + " at "
                            + ppmMetres + " ppm·m: " + e.getMessage());
                }
                progress.progress(++done, total);
            }
        }
        return new ReferenceLibrary(plan.name(), references);
    }
}
