package org.tracegas.runner.commands;

import org.tracegas.campaign.StoredMethod;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.runner.UsageException;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;

/** How the commands that work with results find a project and the newest stored version of a method. */
final class StoredMethods {

    static final String SOFTWARE = "tracegas-runner";

    /** The newest version of a method and the method rebuilt from it. */
    record Found(VersionInfo version, StoredMethod method) {
    }

    private StoredMethods() {
    }

    static Found newest(WorkspaceStore store, String name) throws UsageException, FileFormatException {
        VersionInfo version = store.versions().latest(VersionKind.METHOD, name)
                .orElseThrow(() -> new UsageException("no method named '" + name + "'; define it with method-define"));
        return new Found(version, StoredMethod.parse(store.versions().content(version.id()),
                "method version " + version.id()));
    }

    static ProjectInfo project(WorkspaceStore store, Session actor, String code) throws UsageException {
        return store.projects().findByCode(actor, code)
                .orElseThrow(() -> new UsageException("no project with code " + code));
    }
}
