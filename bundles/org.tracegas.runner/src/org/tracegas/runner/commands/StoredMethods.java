package org.tracegas.runner.commands;

import org.tracegas.installation.InstalledSoftware;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.VersionKind;
import org.tracegas.runner.UsageException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** How the commands that work with results find a project and a stored version of a method. */
final class StoredMethods {

    /** What results record as their software: the installation's release and its add-ons with versions. */
    static final String SOFTWARE = InstalledSoftware.describeRunning("tracegas-runner");
    static final String USAGE = """
              --method <name> [--method-version <n>]   the stored method, its version n (default: the newest)""";

    /** A version of a method and the method rebuilt from it. */
    record Found(ContentVersion version, StoredMethod method) {
    }

    private StoredMethods() {
    }

    /**
     * The version --method-version names, or the newest one; versions of a method form one line from its first
     * version, each revised from the one before, so the wanted one lies on the newest one's line of parents.
     */
    static Found find(WorkspaceStore store, Options options) throws UsageException, FileFormatException {
        String name = options.text("--method");
        ContentVersion version = store.versions().latest(VersionKind.METHOD, name)
                .orElseThrow(() -> new UsageException("no method named '" + name + "'; define it with method-define"));
        if (options.has("--method-version")) {
            int wanted = options.positiveInteger("--method-version");
            int newest = version.getNumber();
            while (version.getNumber() != wanted && version.getParentId() != null) {
                version = store.versions().version(version.getParentId());
            }
            if (version.getNumber() != wanted) {
                throw new UsageException("method '" + name + "' has no version " + wanted + " among the versions up to its newest, "
                        + newest);
            }
        }
        return rebuild(store, version);
    }

    /**
     * The method version a work batch was recorded with.
     *
     * @throws BadInputException if the id names no METHOD version
     */
    static Found byId(WorkspaceStore store, String versionId) throws BadInputException, FileFormatException {
        ContentVersion version;
        try {
            version = store.versions().version(versionId);
        } catch (NoSuchObjectException e) {
            throw new BadInputException("no stored version " + versionId, e);
        }
        if (version.getKind() != VersionKind.METHOD) {
            throw new BadInputException("version " + versionId + " is a " + version.getKind()
                    + " version, not a method");
        }
        return rebuild(store, version);
    }

    private static Found rebuild(WorkspaceStore store, ContentVersion version) throws FileFormatException {
        return new Found(version, StoredMethod.parse(store.versions().content(version.getId()),
                "method version " + version.getId()));
    }

    static Project project(WorkspaceStore store, Session actor, String code) throws UsageException {
        return store.projects().findByCode(actor, code)
                .orElseThrow(() -> new UsageException("no project with code " + code));
    }
}
