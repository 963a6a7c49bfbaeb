package org.tracegas.store;

import org.tracegas.audit.SignatureMeaning;

/**
 * What a reviewer signs: one content of one report of a project.
 *
 * @param projectId  the project the report belongs to
 * @param reportId   the report's identifier, as printed on it
 * @param content    the report content's canonical bytes; their SHA-256 is the report's content hash and is
 *                   stored with the signature
 * @param authorId   the user who made the report (the independent-signer rule is checked against it)
 * @param typedLogin the login typed at signing; must be the session's own
 * @param password   the password typed at signing; cleared after use
 * @param meaning    what the signature means
 * @param comment    optional remark, or null
 */
public record ReportSignatureRequest(String projectId, String reportId, byte[] content, String authorId,
        String typedLogin, char[] password, SignatureMeaning meaning, String comment) {

    /** @throws IllegalArgumentException naming the missing field */
    public ReportSignatureRequest {
        require("projectId", projectId);
        require("reportId", reportId);
        require("authorId", authorId);
        require("typedLogin", typedLogin);
        if (content == null || content.length == 0) {
            throw new IllegalArgumentException("content: the signed report content is required");
        }
        if (password == null) {
            throw new IllegalArgumentException("password: must be typed at signing");
        }
        if (meaning == null) {
            throw new IllegalArgumentException("meaning: must be given");
        }
    }

    private static void require(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + ": must not be blank");
        }
    }
}
