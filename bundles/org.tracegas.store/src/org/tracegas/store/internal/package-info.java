/** JDBC implementation of the workspace store; not API. */
package org.tracegas.store.internal;
