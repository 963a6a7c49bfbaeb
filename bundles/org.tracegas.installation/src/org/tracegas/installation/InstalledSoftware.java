package org.tracegas.installation;

import java.io.IOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.stream.Collectors;

import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;
import org.tracegas.installation.internal.P2Profile;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * The software of an installation: the workbench release and the add-on features installed into it, read
 * from the installation's p2 profile, with the changes {@code tracegas-addons} logged. Results record its
 * {@link #resultSoftware()} as their software, so a result computed with a lab's reader names that reader's
 * version; {@link #recordIn} writes it to a workspace's audit trail whenever it changed.
 *
 * @param location where the software is installed (a folder), not blank
 * @param product  the workbench release, e.g. "Tracegas Workbench 0.1.0.202612041858", not blank
 * @param addons   the add-on features, in the profile's order
 * @param history  the changes tracegas-addons logged, oldest first
 */
public record InstalledSoftware(String location, String product, List<Addon> addons, List<AddonChange> history) {

    private static final String INSTALL_AREA = "osgi.install.area";
    /** The length of the results' software column (store schema V1: software_version VARCHAR(100)). */
    public static final int RESULT_SOFTWARE_LENGTH = 100;
    private static final int DIGEST_DIGITS = 16;
    /** How many of the latest logged changes the audit record names. */
    static final int CHANGES_NAMED = 5;

    /** @throws IllegalArgumentException naming the missing or blank field */
    public InstalledSoftware {
        AddonLog.requireText("location", location);
        AddonLog.requireText("product", product);
        addons = List.copyOf(Objects.requireNonNull(addons, "addons"));
        history = List.copyOf(Objects.requireNonNull(history, "history"));
    }

    /** What results record as their software: the release and each add-on with its version. */
    public String description() {
        return addons.isEmpty() ? product
                : product + " with " + addons.stream().map(Addon::toString).collect(Collectors.joining(", "));
    }

    /**
     * The software as results record it, at most {@value #RESULT_SOFTWARE_LENGTH} characters (the results'
     * column): the {@link #description()} when it fits, else the release, the number of add-ons and the first
     * digits of the description's SHA-256, which the audit record of this software names beside the full list.
     */
    public String resultSoftware() {
        String full = description();
        return full.length() <= RESULT_SOFTWARE_LENGTH ? full
                : product + " with " + addons.size() + " add-ons #" + digest(full);
    }

    /** Why the software differs from the last record: the latest changes tracegas-addons logged. */
    String reason() {
        String named = "results name it \"" + resultSoftware() + "\"";
        if (history.isEmpty()) {
            return "software of the installation at " + location + "; " + named + " (no add-on changes logged)";
        }
        List<AddonChange> latest = history.subList(Math.max(0, history.size() - CHANGES_NAMED), history.size());
        return "software of the installation at " + location + "; " + named + "; latest add-on changes: "
                + latest.stream().map(AddonChange::toString).collect(Collectors.joining("; "));
    }

    private static String digest(String text) {
        try {
            byte[] hash = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash).substring(0, DIGEST_DIGITS);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    /**
     * Writes this software to the workspace's audit trail when it differs from what was last recorded for
     * this installation (see {@code AuditService.recordSoftware}).
     *
     * @return whether a record was written
     */
    public boolean recordIn(WorkspaceStore store, Session actor) {
        return store.audit().recordSoftware(actor, location, description(), reason());
    }

    /**
     * The running installation's software, when p2 manages the installation (an installed product); empty in
     * a runtime without a p2 profile, such as a test or development launch.
     *
     * @throws IOException naming file, line and field when the add-on log is malformed
     */
    public static Optional<InstalledSoftware> running() throws IOException {
        Optional<P2Profile.Roots> roots = selfProfile();
        if (roots.isEmpty()) {
            return Optional.empty();
        }
        Path location = folder(property(INSTALL_AREA));
        return Optional.of(new InstalledSoftware(location.toString(), product(roots.get()), roots.get().addons(),
                AddonLog.read(location.resolve("p2").resolve(AddonLog.FILE))));
    }

    /**
     * The running installation's {@link #resultSoftware()} (its log is not read), or {@code fallback} when p2
     * does not manage the installation.
     */
    public static String describeRunning(String fallback) {
        return selfProfile().map(r -> new InstalledSoftware("-", product(r), r.addons(), List.of()).resultSoftware())
                .orElse(fallback);
    }

    private static String product(P2Profile.Roots roots) {
        return "Tracegas Workbench " + roots.productVersion();
    }

    private static Optional<P2Profile.Roots> selfProfile() {
        String productId = property("eclipse.product");
        if (productId == null || property(INSTALL_AREA) == null) {
            return Optional.empty();
        }
        try {
            return P2Profile.self(FrameworkUtil.getBundle(InstalledSoftware.class).getBundleContext(), productId);
        } catch (NoClassDefFoundError e) {
            return Optional.empty(); // p2 is not part of this runtime
        }
    }

    /** A framework property (config.ini), or null outside OSGi. */
    private static String property(String name) {
        try {
            Bundle self = FrameworkUtil.getBundle(InstalledSoftware.class);
            return self == null || self.getBundleContext() == null ? null : self.getBundleContext().getProperty(name);
        } catch (NoClassDefFoundError e) {
            return null; // plain Java without the OSGi framework: no installation
        }
    }

    private static Path folder(String installArea) throws IOException {
        try {
            return Path.of(new URI(installArea.replace(" ", "%20")));
        } catch (URISyntaxException | IllegalArgumentException e) {
            throw new IOException("osgi.install.area " + installArea + " is not a file URL", e);
        }
    }
}
