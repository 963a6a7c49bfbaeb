package org.tracegas.store;

import java.util.List;
import java.util.Optional;

import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;

/**
 * Versions of analysis methods and reference libraries. The content of a version is a canonical
 * serialization supplied by the caller ({@code key=value} lines); its SHA-256 is stored with it. A
 * version used by a result is frozen: changing it means making a new version that records its parent,
 * its author and the reason.
 * <p>
 * Versions are returned as model {@link ContentVersion}s, each a fresh object read from the store: changing one
 * changes nothing stored.
 */
public interface VersionService {

    /** Creates a method or library with its first version. */
    ContentVersion create(Session actor, VersionKind kind, String name, String content, String reason);

    /** Makes a new version derived from {@code parentVersionId}, frozen or not. */
    ContentVersion revise(Session actor, String parentVersionId, String content, String reason);

    /**
     * Changes a version that no result uses yet, in place.
     *
     * @throws FrozenVersionException    if a result uses it
     * @throws ConcurrentChangeException if it was changed since {@code expectedVersion}
     */
    ContentVersion updateDraft(Session actor, String versionId, long expectedVersion, String content,
            String reason);

    ContentVersion version(String versionId);

    String content(String versionId);

    /** Field-by-field comparison of two versions' contents. */
    VersionDiff diff(String olderVersionId, String newerVersionId);

    /** The newest version of the item of a kind and name, if there is one. */
    Optional<ContentVersion> latest(VersionKind kind, String name);

    /** The newest version of every method or every library, ordered by name. */
    List<ContentVersion> latest(VersionKind kind);
}
