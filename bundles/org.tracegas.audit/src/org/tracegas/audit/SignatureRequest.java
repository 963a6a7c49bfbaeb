package org.tracegas.audit;

import java.util.Objects;

/**
 * A request to sign one version of one object electronically. Both identification components, user id
 * and password, are entered again at every signing (21 CFR 11.200(a)(1): the stricter case, which also
 * covers signings outside a continuous session).
 *
 * @param sessionUserId the user logged in at the workstation (a signature is only given in one's own session)
 * @param signerId      the user id typed at signing
 * @param password      the password typed at signing; cleared by {@link SignatureService#sign} after use
 * @param printedName   the signer's printed name as shown with the signature (21 CFR 11.50(a)(1))
 * @param meaning       meaning of the signature (21 CFR 11.50(a)(3))
 * @param objectType    kind of the signed object, e.g. "report"
 * @param objectId      id of the signed object
 * @param objectVersion the exact version signed
 * @param signedContent the exact content signed (e.g. canonical text or the report file); its SHA-256 is
 *                      stored with the signature (21 CFR 11.70)
 * @param authorId      author of the signed object; required when the meaning needs an independent signer
 * @param comment       optional remark stored as the record's reason, or null
 */
public record SignatureRequest(String sessionUserId, String signerId, char[] password, String printedName,
        SignatureMeaning meaning, String objectType, String objectId, long objectVersion, byte[] signedContent,
        String authorId, String comment) {

    /** @throws IllegalArgumentException naming the missing or blank field */
    public SignatureRequest {
        AuditEntry.requireText("sessionUserId", sessionUserId, AuditEntry.MAX_NAME_LENGTH);
        AuditEntry.requireText("signerId", signerId, AuditEntry.MAX_NAME_LENGTH);
        if (password == null) {
            throw new IllegalArgumentException("password: must be given at signing (21 CFR 11.200(a)(1))");
        }
        AuditEntry.requireText("printedName", printedName, 400);
        Objects.requireNonNull(meaning, "meaning");
        AuditEntry.requireText("objectType", objectType, AuditEntry.MAX_NAME_LENGTH);
        AuditEntry.requireText("objectId", objectId, AuditEntry.MAX_OBJECT_ID_LENGTH);
        if (objectVersion < 0) {
            throw new IllegalArgumentException("objectVersion: must not be negative, was " + objectVersion);
        }
        if (signedContent == null) {
            throw new IllegalArgumentException("signedContent: the signed content is required to bind the signature to it");
        }
        if (meaning.requiresIndependentSigner() && (authorId == null || authorId.isBlank())) {
            throw new IllegalArgumentException("authorId: required for a " + meaning + " signature");
        }
    }
}
