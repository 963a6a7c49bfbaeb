package org.tracegas.report;

import org.tracegas.report.internal.Check;

/**
 * An analysis method as it was used.
 *
 * @param name    method name
 * @param version method version
 * @param hash    content hash of the method definition (hex)
 */
public record MethodVersion(String name, String version, String hash) {

    public MethodVersion {
        Check.text("method name", name);
        Check.text("method version", version);
        Check.text("method hash", hash);
    }
}
