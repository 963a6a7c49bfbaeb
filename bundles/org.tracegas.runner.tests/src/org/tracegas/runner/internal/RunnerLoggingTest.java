package org.tracegas.runner.internal;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.logging.ConsoleHandler;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.Logger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Library logging goes to the workspace's log file; the console gets severe errors only, never the H2 notice. */
class RunnerLoggingTest {

    @TempDir
    Path folder;

    @Test
    void libraryNotesGoToTheWorkspaceLogFile() throws Exception {
        Path ws = folder.resolve("ws");
        try (RunnerLogging logging = RunnerLogging.configure(List.of("demo", "--workspace", ws.toString()))) {
            Logger.getLogger("org.flywaydb.core.internal.command.DbMigrate").info("Migrating schema to version 1");
            Logger.getLogger("org.apache.pdfbox.pdmodel.font.PDType1Font").warning("Using fallback font");
            Logger.getLogger("org.flywaydb.core.internal.database.base.Database")
                    .warning("Flyway upgrade recommended: H2 is newer than this version of Flyway");
            logging.file().flush();
            for (Handler h : Logger.getLogger("").getHandlers()) {
                if (h instanceof ConsoleHandler) {
                    assertTrue(h.getLevel().intValue() >= Level.SEVERE.intValue(), "console at " + h.getLevel());
                }
            }
        }
        String log = Files.readString(ws.resolve(RunnerLogging.LOG_FILE));
        assertTrue(log.contains("Migrating schema to version 1") && log.contains("Using fallback font"), log);
        assertFalse(log.contains("Flyway upgrade recommended"), log);
    }

    @Test
    void aMissingWorkspaceFolderIsNotCreatedForItsLog() {
        Path typo = folder.resolve("wrokspace");
        try (RunnerLogging logging = RunnerLogging.configure(List.of("audit-verify", "--workspace", typo.toString()))) {
            assertNull(logging.file());
        }
        assertFalse(Files.exists(typo));
    }
}
