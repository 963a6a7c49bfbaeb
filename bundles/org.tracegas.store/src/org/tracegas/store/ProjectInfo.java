package org.tracegas.store;

/**
 * A stored project (campaign) of a client.
 *
 * @param rowVersion version for optimistic locking of changes to this project
 */
public record ProjectInfo(String id, String clientId, String code, String name, long rowVersion) {
}
