package org.tracegas.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.InterferogramTransform;

/**
 * The records of small container files read whole: backgrounds transformed to single beams, and the other
 * records (QA measurements) as they are. Stack files are not read this way; they stream through the batch path.
 */
public record ContainerContents(List<Background> backgrounds, List<ContainerRecord> others) {

    public ContainerContents {
        backgrounds = List.copyOf(backgrounds);
        others = List.copyOf(others);
    }

    public static ContainerContents read(List<Path> files, InterferogramTransform transform)
            throws ImportException, IOException {
        List<Background> backgrounds = new ArrayList<>();
        List<ContainerRecord> others = new ArrayList<>();
        for (Path file : files) {
            try (ContainerReader reader = ContainerReader.open(file)) {
                for (ContainerRecord r = reader.readNext(); r != null; r = reader.readNext()) {
                    if (r.header().kind() == SampleKind.BACKGROUND) {
                        backgrounds.add(new Background("background " + r.header().time(), r.header().time(),
                                transform.singleBeam(r.interferogram())));
                    } else {
                        others.add(r);
                    }
                }
            }
        }
        return new ContainerContents(backgrounds, others);
    }
}
