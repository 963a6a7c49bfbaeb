package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.tracegas.model.Project;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkBatches;
import org.tracegas.model.WorkspaceFactory;

/** A batch's description as batch-split writes it and batch-work reads it back. */
class BatchDescriptionTest {

    private static final String HEAD = """
            tracegas-quantification-batch 1
            project = project-7
            method-version = version-3
            background = bg-1.tgc
            """;

    private static WorkBatch batch(String description) {
        Project project = WorkspaceFactory.eINSTANCE.createProject();
        project.setId("project-7");
        WorkBatch batch = WorkBatches.of("version-3", description);
        batch.setId("batch-1");
        project.getBatches().add(batch);
        return batch;
    }

    @Test
    void instrumentIsReadBackWithTheRest() throws Exception {
        BatchDescription written = new BatchDescription("project-7", "version-3", List.of(Path.of("bg-1.tgc"),
                Path.of("bg-2.tgc")), OptionalDouble.of(4.8512), Optional.empty())
                .withInstrument(Optional.of("instrument-5"));
        assertEquals(written, BatchDescription.of(batch(written.text())));
    }

    @Test
    void batchSplitWithoutInstrumentNamesNone() throws Exception {
        BatchDescription read = BatchDescription.of(batch(HEAD));
        assertEquals(Optional.empty(), read.instrumentId());
    }

    @Test
    void blankOrSecondInstrumentLineIsNamed() {
        assertLineRefused(HEAD + "instrument = \n", 5);
        assertLineRefused(HEAD + "instrument = instrument-5\ninstrument = instrument-6\n", 6);
    }

    private static void assertLineRefused(String description, int line) {
        BadInputException e = assertThrows(BadInputException.class, () -> BatchDescription.of(batch(description)));
        assertTrue(e.getMessage().contains("work batch batch-1 description line " + line
                + ": unexpected or repeated 'instrument = "), e.getMessage());
    }
}
