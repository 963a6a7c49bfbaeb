package org.tracegas.store;

import java.time.Instant;

/**
 * One stored version of a method or library.
 *
 * @param itemId      the method or library this version belongs to
 * @param number      1 for the first version, then counting up
 * @param parentId    the version it was derived from, or null for the first
 * @param authorId    the user who made it
 * @param contentHash SHA-256, hex, of the canonical content (UTF-8)
 * @param frozen      true once a result uses it
 * @param rowVersion  version for optimistic locking of a draft
 */
public record VersionInfo(String id, VersionKind kind, String itemId, String name, int number, String parentId,
        String authorId, String reason, Instant created, String contentHash, boolean frozen, long rowVersion) {
}
