package org.tracegas.store;

/** A stored client: the organisation projects (campaigns) are made for. */
public record ClientInfo(String id, String name) {
}
