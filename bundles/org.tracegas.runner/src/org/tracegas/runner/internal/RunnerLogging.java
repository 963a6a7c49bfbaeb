package org.tracegas.runner.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.logging.ConsoleHandler;
import java.util.logging.FileHandler;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.Logger;
import java.util.logging.SimpleFormatter;

/**
 * Keeps the console for the runner's own output and progress: what the libraries log (Flyway's migration
 * notes, PDFBox's font notes, the database drivers) goes through java.util.logging to {@value #LOG_FILE} in
 * the workspace folder, and only severe errors reach the console; the runner says what went wrong itself.
 */
final class RunnerLogging implements AutoCloseable {

    /** The log file in the workspace folder. */
    static final String LOG_FILE = "runner.log";

    /**
     * Flyway 9.22 warns at every opening that H2 2.3.232 is newer than the H2 it was tested with. The store's
     * migrations are tested on that H2 by the store's own tests, and a Flyway that knows H2 2.3 (10 and later)
     * splits its database support into bundles the target platform does not carry; the warning tells the user
     * nothing, so its logger is held at SEVERE (a reference is kept: java.util.logging holds loggers weakly).
     */
    private static final Logger FLYWAY_DATABASE_NOTICE = Logger
            .getLogger("org.flywaydb.core.internal.database.base.Database");

    private final Handler file;

    private RunnerLogging(Handler file) {
        this.file = file;
    }

    /**
     * Sets the console to severe errors and opens the log file in the workspace folder the command line names with
     * {@code --workspace}, when there is such a folder (a command that creates a workspace makes it first).
     */
    static RunnerLogging configure(List<String> arguments) {
        Logger root = Logger.getLogger("");
        for (Handler h : root.getHandlers()) {
            if (h instanceof ConsoleHandler) {
                h.setLevel(Level.SEVERE);
            }
        }
        FLYWAY_DATABASE_NOTICE.setLevel(Level.SEVERE);
        int at = arguments.indexOf("--workspace");
        if (at < 0 || at + 1 >= arguments.size()) {
            return new RunnerLogging(null);
        }
        Path folder = Path.of(arguments.get(at + 1)).toAbsolutePath();
        boolean creates = !arguments.isEmpty() && List.of("demo", "workspace-init").contains(arguments.get(0));
        try {
            if (creates) {
                Files.createDirectories(folder);
            }
            if (!Files.isDirectory(folder)) {
                return new RunnerLogging(null); // the command names the missing folder itself
            }
            FileHandler handler = new FileHandler(folder.resolve(LOG_FILE).toString(), true);
            handler.setFormatter(new SimpleFormatter());
            handler.setLevel(Level.INFO);
            root.addHandler(handler);
            return new RunnerLogging(handler);
        } catch (IOException e) {
            root.warning("cannot write the log file in " + folder + ": " + e.getMessage());
            return new RunnerLogging(null);
        }
    }

    /** The log file's handler, or null when there is no workspace folder to write it to. */
    Handler file() {
        return file;
    }

    @Override
    public void close() {
        if (file != null) {
            Logger.getLogger("").removeHandler(file);
            file.close();
        }
    }
}
