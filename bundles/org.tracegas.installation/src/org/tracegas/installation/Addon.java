package org.tracegas.installation;

/**
 * A feature installed into the installation on top of the workbench's own, such as a lab's reader.
 *
 * @param id      the feature's id (without p2's ".feature.group"), not blank
 * @param version its version with qualifier, not blank
 */
public record Addon(String id, String version) {

    /** @throws IllegalArgumentException naming the blank field */
    public Addon {
        AddonLog.requireText("id", id);
        AddonLog.requireText("version", version);
    }

    @Override
    public String toString() {
        return id + " " + version;
    }
}
