package org.tracegas.model;

/**
 * What made a result: the exact method and library versions, the software and the spectral input. Equal
 * provenance promises bit-identical numbers; the results of one fitted spectrum share one value.
 *
 * @param methodVersionId  the method version used; it is frozen by recording the result
 * @param libraryVersionId the library version used; it is frozen by recording the result
 * @param softwareVersion  version of the software that computed the result
 * @param inputHash        SHA-256, hex, of the spectral input
 */
public record Provenance(String methodVersionId, String libraryVersionId, String softwareVersion,
        String inputHash) {

    /** @throws IllegalArgumentException naming the field that is blank, or the input hash that is no SHA-256 */
    public Provenance {
        requireText("methodVersionId", methodVersionId);
        requireText("libraryVersionId", libraryVersionId);
        requireText("softwareVersion", softwareVersion);
        if (inputHash == null || !inputHash.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("inputHash must be 64 lower-case hex digits (SHA-256), was "
                    + inputHash);
        }
    }

    private static void requireText(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
    }
}
