package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.tracegas.model.WorkBatch;

/**
 * What every runner of a quantification batch works with, kept as the batch's description: the project, the
 * method version, the background files and, for a method whose path source is CTS-derived, the effective path
 * the CTS readings measured when the batch was split (so that every runner corrects to the same path) and the
 * stored instrument that acquired the files, when the split named it (so that every runner stores each
 * measurement with it). Each unit's payload is one sample file.
 *
 * <pre>
 * tracegas-quantification-batch 1
 * project = ...              id of the project
 * method-version = ...       id of the METHOD version
 * background = ...           a background file, one line each, in order
 * cts-path-m = ...           the CTS-derived path in m, exactly as computed; absent for a nominal path
 * instrument = ...           id of the stored instrument that acquired the files; absent when not named
 * </pre>
 */
record BatchDescription(String projectId, String methodVersionId, List<Path> backgrounds,
        OptionalDouble ctsPathM, Optional<String> instrumentId) {

    private static final String FORMAT = "tracegas-quantification-batch 1";
    private static final String PROJECT = "project = ";
    private static final String METHOD_VERSION = "method-version = ";
    private static final String BACKGROUND = "background = ";
    private static final String CTS_PATH = "cts-path-m = ";
    private static final String INSTRUMENT = "instrument = ";
    /**
     * The most characters the instrument line takes: the store's ids are at most 36 characters (its id columns'
     * width). A batch-split checks that its description fits with it before the instrument is recorded.
     */
    static final int INSTRUMENT_LINE_ROOM = INSTRUMENT.length() + 36 + 1;

    BatchDescription {
        backgrounds = List.copyOf(backgrounds);
    }

    String text() {
        StringBuilder s = new StringBuilder(FORMAT).append('\n');
        s.append(PROJECT).append(projectId).append('\n').append(METHOD_VERSION).append(methodVersionId).append('\n');
        backgrounds.forEach(b -> s.append(BACKGROUND).append(b).append('\n'));
        // Double.toString reads back as the same double: every runner corrects to the path computed
        ctsPathM.ifPresent(p -> s.append(CTS_PATH).append(Double.toString(p)).append('\n'));
        instrumentId.ifPresent(i -> s.append(INSTRUMENT).append(i).append('\n'));
        return s.toString();
    }

    /** This description naming the stored instrument, once it is recorded. */
    BatchDescription withInstrument(Optional<String> id) {
        return new BatchDescription(projectId, methodVersionId, backgrounds, ctsPathM, id);
    }

    /**
     * The description of a batch recorded by batch-split.
     *
     * @throws BadInputException naming the batch and the line at fault, e.g. for a batch recorded otherwise
     */
    static BatchDescription of(WorkBatch batch) throws BadInputException {
        String where = "work batch " + batch.getId() + " description";
        List<String> lines = batch.getDescription().lines().toList();
        if (lines.isEmpty() || !lines.get(0).equals(FORMAT)) {
            throw new BadInputException(where + " line 1: expected '" + FORMAT
                    + "'; the batch was not recorded by batch-split");
        }
        String project = null;
        String version = null;
        List<Path> backgrounds = new ArrayList<>();
        OptionalDouble ctsPath = OptionalDouble.empty();
        Optional<String> instrument = Optional.empty();
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.startsWith(PROJECT) && project == null) {
                project = line.substring(PROJECT.length());
            } else if (line.startsWith(METHOD_VERSION) && version == null) {
                version = line.substring(METHOD_VERSION.length());
            } else if (line.startsWith(BACKGROUND)) {
                backgrounds.add(Path.of(line.substring(BACKGROUND.length())));
            } else if (line.startsWith(CTS_PATH) && ctsPath.isEmpty()) {
                ctsPath = OptionalDouble.of(path(where, i + 1, line.substring(CTS_PATH.length())));
            } else if (line.startsWith(INSTRUMENT) && instrument.isEmpty() && !line.substring(INSTRUMENT.length())
                    .isBlank()) {
                instrument = Optional.of(line.substring(INSTRUMENT.length()));
            } else {
                throw new BadInputException(where + " line " + (i + 1) + ": unexpected or repeated '" + line + "'");
            }
        }
        if (project == null || version == null || backgrounds.isEmpty()) {
            throw new BadInputException(where + ": project, method-version and at least one background are needed");
        }
        if (!project.equals(batch.getProject().getId())) {
            throw new BadInputException(where + ": project " + project + " is not the batch's project "
                    + batch.getProject().getId());
        }
        return new BatchDescription(project, version, backgrounds, ctsPath, instrument);
    }

    private static double path(String where, int line, String text) throws BadInputException {
        try {
            double p = Double.parseDouble(text);
            if (p > 0 && Double.isFinite(p)) {
                return p;
            }
        } catch (NumberFormatException e) {
            // named below
        }
        throw new BadInputException(where + " line " + line + ": cts-path-m must be a positive path in m, was '"
                + text + "'");
    }
}
