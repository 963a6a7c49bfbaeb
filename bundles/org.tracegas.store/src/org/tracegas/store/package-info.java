/**
 * Storage of the workspace on an embedded H2 database in a local folder or on a PostgreSQL server.
 * Every change goes through a service of {@link org.tracegas.store.WorkspaceStore}: one transaction per
 * operation, with its audit record written in the same transaction.
 */
package org.tracegas.store;
