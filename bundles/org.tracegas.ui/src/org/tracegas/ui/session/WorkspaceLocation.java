package org.tracegas.ui.session;

import java.nio.file.Path;

/** Where the desk's workspace lies: a local folder (embedded database) or a lab server (PostgreSQL). */
public sealed interface WorkspaceLocation {

    /** One line naming the workspace for the user, e.g. in the log-in dialog; never shows a password. */
    String description();

    /** A workspace folder; its database lives in {@code folder/db}, as for the headless runner. */
    record Folder(Path folder) implements WorkspaceLocation {

        /** @throws IllegalArgumentException if the folder is null */
        public Folder {
            if (folder == null) {
                throw new IllegalArgumentException("workspace folder must not be null");
            }
            folder = folder.toAbsolutePath();
        }

        @Override
        public String description() {
            return "local workspace in " + folder;
        }
    }

    /**
     * A lab server.
     *
     * @param url      a jdbc:postgresql:// URL
     * @param user     the database account
     * @param password the database account's password
     */
    record LabServer(String url, String user, String password) implements WorkspaceLocation {

        /** @throws IllegalArgumentException naming the URL if it is not a jdbc:postgresql:// URL */
        public LabServer {
            if (url == null || !url.startsWith("jdbc:postgresql://")) {
                throw new IllegalArgumentException("lab server URL must start with jdbc:postgresql://, was " + url);
            }
        }

        @Override
        public String description() {
            return "lab server " + withoutSecrets(url) + (user == null || user.isBlank() ? "" : " as " + user);
        }

        /** The URL without its query part, which may carry a password. */
        private static String withoutSecrets(String url) {
            int query = url.indexOf('?');
            return query < 0 ? url : url.substring(0, query);
        }

        @Override
        public String toString() {
            return description();
        }
    }
}
