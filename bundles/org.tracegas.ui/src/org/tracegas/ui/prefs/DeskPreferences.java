package org.tracegas.ui.prefs;

import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;

import org.eclipse.jface.preference.IPreferenceStore;
import org.tracegas.ui.session.WorkspaceLocation;

/** Preference keys of the desk and their defaults. */
public final class DeskPreferences {

    /** Longest accepted age of a background spectrum, in minutes. */
    public static final String BACKGROUND_AGE_MINUTES = "backgroundAgeMinutes";
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

    public static final int DEFAULT_BACKGROUND_AGE_MINUTES = 60;

    private DeskPreferences() {
    }

    public static void setDefaults(IPreferenceStore store) {
        store.setDefault(BACKGROUND_AGE_MINUTES, DEFAULT_BACKGROUND_AGE_MINUTES);
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

    public static Duration backgroundAgeLimit(IPreferenceStore store) {
        return Duration.ofMinutes(store.getInt(BACKGROUND_AGE_MINUTES));
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
