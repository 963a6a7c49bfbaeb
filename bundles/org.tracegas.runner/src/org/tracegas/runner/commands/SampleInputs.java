package org.tracegas.runner.commands;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.tracegas.pipeline.ContainerContents;
import org.tracegas.pipeline.ProjectQuantification;
import org.tracegas.method.StoredMethod;
import org.tracegas.importer.ImportException;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.InterferogramTransform;

/**
 * The backgrounds and sample files of a quantification, read once before anything is stored or recorded, so
 * that a missing or damaged file, a background among the samples or a file given twice stops the job before
 * it starts.
 *
 * @param backgrounds the background records of the --backgrounds files as single beams of the method's transform
 * @param samples     number of samples in the sample files
 */
record SampleInputs(List<Background> backgrounds, long samples) {

    SampleInputs {
        backgrounds = List.copyOf(backgrounds);
    }

    /** @throws BadInputException naming the file (and record and field) at fault */
    static SampleInputs read(StoredMethod method, List<Path> backgroundFiles, List<Path> files)
            throws BadInputException {
        List<Background> backgrounds = backgrounds(method, backgroundFiles);
        requireReadable(files);
        Set<Path> seen = new HashSet<>();
        for (Path f : files) {
            if (!seen.add(f.normalize())) {
                throw new BadInputException("--file " + f + " is given twice; its samples would be stored twice");
            }
        }
        try {
            return new SampleInputs(backgrounds, ProjectQuantification.countSamples(files));
        } catch (ImportException | IOException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

    /**
     * The background records of the files, transformed as the method says.
     *
     * @throws BadInputException naming the file at fault, or saying that the files hold no background
     */
    static List<Background> backgrounds(StoredMethod method, List<Path> backgroundFiles) throws BadInputException {
        requireReadable(backgroundFiles);
        List<Background> backgrounds;
        try {
            backgrounds = ContainerContents.read(backgroundFiles, new InterferogramTransform(method.transform()))
                    .backgrounds();
        } catch (ImportException | IOException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        if (backgrounds.isEmpty()) {
            throw new BadInputException("the --backgrounds files " + backgroundFiles + " hold no background record");
        }
        return backgrounds;
    }

    private static void requireReadable(List<Path> files) throws BadInputException {
        for (Path f : files) {
            if (!Files.isRegularFile(f) || !Files.isReadable(f)) {
                throw new BadInputException("cannot read " + f + ": no such file, or not readable");
            }
        }
    }
}
