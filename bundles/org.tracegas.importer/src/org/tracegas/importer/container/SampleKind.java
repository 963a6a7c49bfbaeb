package org.tracegas.importer.container;

/** Whether an interferogram was measured through the sample gas or the reference (background) gas. */
public enum SampleKind {
    SAMPLE, BACKGROUND
}
