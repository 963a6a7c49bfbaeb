package org.tracegas.method;

import java.util.Optional;

import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Records a method or library version unless the newest version of that name holds the same content: running
 * the same job twice gives one version, a changed content a new version derived from the newest.
 */
public final class VersionRecorder {

    private VersionRecorder() {
    }

    public static ContentVersion ensure(WorkspaceStore store, Session actor, VersionKind kind, String name,
            String content, String reason) {
        Optional<ContentVersion> latest = store.versions().latest(kind, name);
        if (latest.isPresent() && store.versions().content(latest.get().getId()).equals(content)) {
            return latest.get();
        }
        return latest.map(v -> store.versions().revise(actor, v.getId(), content, reason))
                .orElseGet(() -> store.versions().create(actor, kind, name, content, reason));
    }
}
