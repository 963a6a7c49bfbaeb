package org.tracegas.installation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AddonLogTest {

    @TempDir
    Path dir;

    @Test
    void readsTheLinesTracegasAddonsAppends() throws IOException {
        // the line format of features/org.tracegas.addons.feature/root/tracegas-addons (log_change)
        Path log = Files.writeString(dir.resolve(AddonLog.FILE),
                "2026-12-01T08:00:00Z\tlabadmin\tinstall\torg.example.lab.reader.feature\tfile:/srv/addons\n"
                        + "\n"
                        + "2026-12-02T09:30:00Z\tlabadmin\tremove\torg.example.lab.reader.feature\t-\n");
        List<AddonChange> changes = AddonLog.read(log);
        assertEquals(2, changes.size());
        assertEquals(new AddonChange(Instant.parse("2026-12-01T08:00:00Z"), "labadmin", "install",
                "org.example.lab.reader.feature", "file:/srv/addons"), changes.get(0));
        assertEquals("2026-12-02T09:30:00Z labadmin remove org.example.lab.reader.feature",
                changes.get(1).toString());
    }

    @Test
    void aMissingLogMeansNoChanges() throws IOException {
        assertEquals(List.of(), AddonLog.read(dir.resolve("absent.log")));
    }

    @Test
    void aMalformedLineIsNamedWithFileLineAndField() throws IOException {
        Path log = Files.writeString(dir.resolve(AddonLog.FILE),
                "2026-12-01T08:00:00Z\tlabadmin\tinstall\tfeature\tfile:/srv\nyesterday\tlabadmin\tinstall\tf\tr\n");
        IOException time = assertThrows(IOException.class, () -> AddonLog.read(log));
        assertTrue(time.getMessage().startsWith(log + ", line 2, field time"), time.getMessage());

        Files.writeString(log, "2026-12-01T08:00:00Z\tlabadmin\tinstall\n");
        IOException fields = assertThrows(IOException.class, () -> AddonLog.read(log));
        assertTrue(fields.getMessage().startsWith(log + ", line 1: expected 5"), fields.getMessage());

        Files.writeString(log, "2026-12-01T08:00:00Z\t \tinstall\tf\tr\n");
        IOException user = assertThrows(IOException.class, () -> AddonLog.read(log));
        assertTrue(user.getMessage().startsWith(log + ", line 1, field user"), user.getMessage());
    }
}
