package org.tracegas.report;

import org.tracegas.report.internal.Check;

/** A software or reference-spectrum library and its version. */
public record LibraryVersion(String name, String version) {

    public LibraryVersion {
        Check.text("library name", name);
        Check.text("library version", version);
    }
}
