package org.tracegas.ui.session;

import java.util.EnumSet;
import java.util.Set;

import org.tracegas.model.Role;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * The staff of the desk's demo project in the tests: an administrator, an analyst and a quality manager with a
 * password of the tests (the product has none built in), and the demo project seeded for them.
 */
public final class DemoStaff {

    public static final String ANALYST = "avogel";
    public static final String MANAGER = "qmorel";
    /** The password of every test user; for tests only. */
    public static final String PASSWORD = "test-only-desk-2026";

    private DemoStaff() {
    }

    /** Makes the staff in an empty workspace and seeds the demo project for them. */
    public static SeededProject.Seeded seed(WorkspaceStore store) {
        Session admin = store.users().createFirstAdministrator("admin", "Workspace administrator",
                PASSWORD.toCharArray());
        store.users().createUser(admin, ANALYST, "Anna Vogel", Set.of(Role.ANALYST), PASSWORD.toCharArray());
        String managerId = store.users().createUser(admin, MANAGER, "Quentin Morel",
                EnumSet.of(Role.QUALITY_MANAGER, Role.REVIEWER), PASSWORD.toCharArray()).getId();
        return SeededProject.seed(store, admin, store.users().logIn(ANALYST, PASSWORD.toCharArray()), managerId);
    }
}
