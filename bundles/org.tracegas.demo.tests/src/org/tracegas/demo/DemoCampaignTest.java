package org.tracegas.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/** The demo's users live in the demo's workspace, and what the demo prints about them lets one log in. */
class DemoCampaignTest {

    @TempDir
    Path folder;

    @Test
    void printedDemoUsersLogIn() {
        String printed = DemoCampaign.demoUsers();
        Matcher password = Pattern.compile("demo password (\\S+),").matcher(printed);
        assertTrue(password.find(), printed);
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("db"))) {
            DemoCampaign.DemoStaff.ensure(store);
            for (String login : new String[] { DemoCampaign.ADMIN, DemoCampaign.ANALYST, DemoCampaign.REVIEWER }) {
                assertTrue(printed.contains(login), login);
                assertEquals(login, store.users().logIn(login, password.group(1).toCharArray()).login());
            }
        }
    }
}
