package org.tracegas.method;

import java.util.Optional;

import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;

/**
 * Records a method or library version unless the newest version of that name holds the same content: running
 * the same job twice gives one version, a changed content a new version derived from the newest.
 */
public final class VersionRecorder {

    private VersionRecorder() {
    }

    public static VersionInfo ensure(WorkspaceStore store, Session actor, VersionKind kind, String name,
            String content, String reason) {
        Optional<VersionInfo> latest = store.versions().latest(kind, name);
        if (latest.isPresent() && store.versions().content(latest.get().id()).equals(content)) {
            return latest.get();
        }
        return latest.map(v -> store.versions().revise(actor, v.id(), content, reason))
                .orElseGet(() -> store.versions().create(actor, kind, name, content, reason));
    }
}
