package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.MeasurementKind;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.ImportedFile;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Imports the lab's files into a project (the import and quantify commands): every file is read before anything
 * is stored, then each is stored whole with its measurements in one transaction; a file whose bytes the project
 * holds already adds nothing and is named as such.
 */
final class FileImports {

    static final String USAGE = """
              --kind <kind>                    kind of records without a kind label (default sample; background,
                                               zero, span, spike, calibration-transfer-standard)
              --time <ISO-8601 instant>        for records whose file states none, e.g. 2026-03-17T08:00:00Z
              --cell-temperature <K>           for records whose file states none
              --cell-pressure <hPa>            for records whose file states none""";

    /** What importing the files did. */
    record Outcome(int added, int known, List<ImportedFile> files) {
    }

    private FileImports() {
    }

    static List<String> optionNames() {
        return List.of("--kind", "--time", "--cell-temperature", "--cell-pressure");
    }

    /** @throws UsageException naming the option whose value is wrong */
    static FileMeasurements.Defaults defaults(Options options) throws UsageException {
        MeasurementKind kind = null;
        if (options.has("--kind")) {
            String v = options.text("--kind");
            kind = MeasurementKind.getByName(v.strip().toUpperCase(Locale.ROOT).replace('-', '_'));
            if (kind == null) {
                throw new UsageException("option --kind: '" + v + "' is none of " + MeasurementKind.VALUES);
            }
        }
        Instant time = null;
        if (options.has("--time")) {
            try {
                time = Instant.parse(options.text("--time").strip());
            } catch (DateTimeException e) {
                throw new UsageException("option --time needs an ISO-8601 instant such as 2026-03-17T08:00:00Z, was '"
                        + options.text("--time") + "'");
            }
        }
        return new FileMeasurements.Defaults(kind, time, positive(options, "--cell-temperature"),
                positive(options, "--cell-pressure"));
    }

    private static Double positive(Options options, String name) throws UsageException {
        if (!options.has(name)) {
            return null;
        }
        String v = options.text(name);
        try {
            double d = Double.parseDouble(v.strip());
            if (d > 0 && Double.isFinite(d)) {
                return d;
            }
        } catch (NumberFormatException e) {
            // named below
        }
        throw new UsageException("option " + name + " needs a positive number, was '" + v + "'");
    }

    /**
     * Reads every file, then stores each one not yet in the project.
     *
     * @throws BadInputException naming the file, line and label at fault; nothing of any file stored
     */
    static Outcome importAll(WorkspaceStore store, Session actor, ProjectInfo project, ReaderRegistry readers,
            List<Path> files, FileMeasurements.Defaults defaults, RunnerContext context) throws BadInputException {
        return storeAll(store, actor, project, files, readAll(readers, files, defaults), context);
    }

    /** @throws BadInputException naming the file, line and label at fault */
    static List<FileMeasurements.Read> readAll(ReaderRegistry readers, List<Path> files,
            FileMeasurements.Defaults defaults) throws BadInputException {
        List<FileMeasurements.Read> read = new ArrayList<>(files.size());
        for (Path f : files) {
            try {
                read.add(FileMeasurements.read(readers, f, defaults));
            } catch (ImportException e) {
                throw new BadInputException(e.getMessage() + "; nothing imported", e);
            }
        }
        return read;
    }

    /** Stores each file read that the project does not hold yet, telling which were known. */
    static Outcome storeAll(WorkspaceStore store, Session actor, ProjectInfo project, List<Path> files,
            List<FileMeasurements.Read> read, RunnerContext context) {
        int added = 0;
        int known = 0;
        List<ImportedFile> stored = new ArrayList<>(read.size());
        for (int i = 0; i < read.size(); i++) {
            FileMeasurements.Read r = read.get(i);
            ImportedFile f = store.imports().importFile(actor, project.id(), r.file(), r.measurements());
            stored.add(f);
            if (f.added()) {
                added++;
                context.out().println(files.get(i) + ": " + f.measurementIds().size() + " measurement(s) as "
                        + f.format() + ", sha256 " + f.sha256());
            } else {
                known++;
                context.out().println(files.get(i) + ": already imported as " + f.fileName() + " on "
                        + f.importedAt() + " (sha256 " + f.sha256() + "); nothing added");
            }
        }
        return new Outcome(added, known, stored);
    }
}
