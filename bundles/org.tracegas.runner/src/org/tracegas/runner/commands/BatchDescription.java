package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.store.WorkBatchInfo;

/**
 * What every runner of a quantification batch works with, kept as the batch's description: the project, the
 * method version and the background files. Each unit's payload is one sample file.
 *
 * <pre>
 * tracegas-quantification-batch 1
 * project = ...              id of the project
 * method-version = ...       id of the METHOD version
 * background = ...           a background file, one line each, in order
 * </pre>
 */
record BatchDescription(String projectId, String methodVersionId, List<Path> backgrounds) {

    private static final String FORMAT = "tracegas-quantification-batch 1";
    private static final String PROJECT = "project = ";
    private static final String METHOD_VERSION = "method-version = ";
    private static final String BACKGROUND = "background = ";

    BatchDescription {
        backgrounds = List.copyOf(backgrounds);
    }

    String text() {
        StringBuilder s = new StringBuilder(FORMAT).append('\n');
        s.append(PROJECT).append(projectId).append('\n').append(METHOD_VERSION).append(methodVersionId).append('\n');
        backgrounds.forEach(b -> s.append(BACKGROUND).append(b).append('\n'));
        return s.toString();
    }

    /**
     * The description of a batch recorded by batch-split.
     *
     * @throws BadInputException naming the batch and the line at fault, e.g. for a batch recorded otherwise
     */
    static BatchDescription of(WorkBatchInfo batch) throws BadInputException {
        String where = "work batch " + batch.id() + " description";
        List<String> lines = batch.description().lines().toList();
        if (lines.isEmpty() || !lines.get(0).equals(FORMAT)) {
            throw new BadInputException(where + " line 1: expected '" + FORMAT
                    + "'; the batch was not recorded by batch-split");
        }
        String project = null;
        String version = null;
        List<Path> backgrounds = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.startsWith(PROJECT) && project == null) {
                project = line.substring(PROJECT.length());
            } else if (line.startsWith(METHOD_VERSION) && version == null) {
                version = line.substring(METHOD_VERSION.length());
            } else if (line.startsWith(BACKGROUND)) {
                backgrounds.add(Path.of(line.substring(BACKGROUND.length())));
            } else {
                throw new BadInputException(where + " line " + (i + 1) + ": unexpected or repeated '" + line + "'");
            }
        }
        if (project == null || version == null || backgrounds.isEmpty()) {
            throw new BadInputException(where + ": project, method-version and at least one background are needed");
        }
        if (!project.equals(batch.projectId())) {
            throw new BadInputException(where + ": project " + project + " is not the batch's project "
                    + batch.projectId());
        }
        return new BatchDescription(project, version, backgrounds);
    }
}
