package org.tracegas.ui.prefs;

import java.nio.file.Path;
import java.util.Map;

import org.eclipse.jface.preference.IPreferenceStore;
import org.tracegas.ui.session.WorkspaceLocation;

/**
 * Preference keys of the desk and their defaults: where the workspace is, nothing else. Acceptance criteria
 * (a background's age limit, noise limits) belong to the versioned method and QA plan, never to one user's
 * preferences, so that every result is judged by the criteria recorded with it.
 */
public final class DeskPreferences {

    /** Folder of the embedded workspace. */
    public static final String WORKSPACE_FOLDER = "workspaceFolder";
    /** A lab server's jdbc:postgresql: URL; empty for the embedded workspace. */
    public static final String SERVER_URL = "serverUrl";
    /** The lab server's database account. */
    public static final String SERVER_USER = "serverUser";
    /**
     * Environment variable holding the lab server account's password; kept out of the preferences, which are
     * a plain text file.
     */
    public static final String SERVER_PASSWORD_VARIABLE = "TRACEGAS_SERVER_PASSWORD";

    private DeskPreferences() {
    }

    public static void setDefaults(IPreferenceStore store) {
        store.setDefault(WORKSPACE_FOLDER, defaultWorkspaceFolder().toString());
        store.setDefault(SERVER_URL, "");
        store.setDefault(SERVER_USER, "tracegas");
    }

    /** $TRACEGAS_WORKSPACE when set (the start script passes it on), else tracegas-workspace in the home folder. */
    static Path defaultWorkspaceFolder() {
        String fromEnvironment = System.getenv("TRACEGAS_WORKSPACE");
        return fromEnvironment != null && !fromEnvironment.isBlank() ? Path.of(fromEnvironment).toAbsolutePath()
                : Path.of(System.getProperty("user.home"), "tracegas-workspace");
    }

    public static Path workspaceFolder(IPreferenceStore store) {
        return Path.of(store.getString(WORKSPACE_FOLDER));
    }

    /**
     * The lab server when a server URL is set, else the workspace folder.
     *
     * @param environment where the server password is looked up ({@value #SERVER_PASSWORD_VARIABLE})
     */
    public static WorkspaceLocation location(IPreferenceStore store, Map<String, String> environment) {
        String url = store.getString(SERVER_URL).trim();
        if (url.isEmpty()) {
            return new WorkspaceLocation.Folder(workspaceFolder(store));
        }
        return new WorkspaceLocation.LabServer(url, store.getString(SERVER_USER).trim(),
                environment.getOrDefault(SERVER_PASSWORD_VARIABLE, ""));
    }
}
