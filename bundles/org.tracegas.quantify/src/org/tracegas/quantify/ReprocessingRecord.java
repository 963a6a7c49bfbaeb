package org.tracegas.quantify;

/**
 * What a result was computed from: equal records promise bit-identical numbers.
 *
 * @param methodHash      SHA-256 of the method's canonical text
 * @param libraryHash     identifies the reference library version, as passed in by the caller
 * @param softwareVersion software version, as passed in by the caller
 * @param inputHash       SHA-256 of the sample's axis and values as raw IEEE 754 bits
 */
public record ReprocessingRecord(String methodHash, String libraryHash, String softwareVersion, String inputHash) {

    /** @throws IllegalArgumentException naming the field that is blank */
    public ReprocessingRecord {
        require(methodHash, "methodHash");
        require(libraryHash, "libraryHash");
        require(softwareVersion, "softwareVersion");
        require(inputHash, "inputHash");
    }

    private static void require(String value, String field) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
    }
}
