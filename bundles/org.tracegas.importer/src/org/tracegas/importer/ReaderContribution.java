package org.tracegas.importer;

/**
 * A registered reader.
 *
 * @param id     unique id, for example "org.tracegas.importer.jcamp"
 * @param name   name shown to users
 * @param reader the reader
 */
public record ReaderContribution(String id, String name, ImportReader reader) {

    public ReaderContribution {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("reader id must not be blank");
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("name of reader " + id + " must not be blank");
        }
        if (reader == null) {
            throw new IllegalArgumentException("reader " + id + " must not be null");
        }
    }
}
