package org.tracegas.importer;

/** The reader picked for a file and why. */
public record ReaderChoice(ReaderContribution contribution, Recognition recognition) {
}
