package org.tracegas.store;

import org.tracegas.audit.SignatureMeaning;

/**
 * What a reviewer signs on a stored result; the store builds the signed content from the stored result (see
 * {@link ReviewService#signResult}).
 *
 * @param resultId   the stored result
 * @param typedLogin the login typed at signing; must be the session's own
 * @param password   the password typed at signing; cleared after use
 * @param meaning    what the signature means
 * @param comment    optional remark, or null
 */
public record ResultSignatureRequest(String resultId, String typedLogin, char[] password, SignatureMeaning meaning,
        String comment) {

    /** @throws IllegalArgumentException naming the missing field */
    public ResultSignatureRequest {
        if (resultId == null || resultId.isBlank()) {
            throw new IllegalArgumentException("resultId: must not be blank");
        }
        if (typedLogin == null || typedLogin.isBlank()) {
            throw new IllegalArgumentException("typedLogin: must not be blank");
        }
        if (password == null) {
            throw new IllegalArgumentException("password: must be typed at signing");
        }
        if (meaning == null) {
            throw new IllegalArgumentException("meaning: must be given");
        }
    }
}
