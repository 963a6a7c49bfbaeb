package org.tracegas.installation;

import java.time.Instant;
import java.util.Objects;

/**
 * One change that {@code tracegas-addons} made to the installation, as its log keeps it: who installed,
 * updated or removed which feature, when, and from which repository.
 *
 * @param time       when the change completed
 * @param user       the operating-system user who made it, not blank
 * @param command    install, update or remove
 * @param feature    the feature's id, not blank
 * @param repository the p2 repository it came from, or "-" for a removal
 */
public record AddonChange(Instant time, String user, String command, String feature, String repository) {

    /** @throws IllegalArgumentException naming the missing or blank field */
    public AddonChange {
        Objects.requireNonNull(time, "time");
        AddonLog.requireText("user", user);
        AddonLog.requireText("command", command);
        AddonLog.requireText("feature", feature);
        AddonLog.requireText("repository", repository);
    }

    @Override
    public String toString() {
        return time + " " + user + " " + command + " " + feature + ("-".equals(repository) ? "" : " from " + repository);
    }
}
