package org.tracegas.audit;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.tracegas.audit.SignatureRefusedException.Reason;
import org.tracegas.audit.internal.ChainHash;
import org.tracegas.audit.internal.ChainWriter;
import org.tracegas.audit.internal.ChainWriter.Pending;
import org.tracegas.audit.internal.ChainWriter.SignatureFields;

/**
 * Electronic signatures for review and approval of results and reports, modelled on 21 CFR Part 11:
 * 11.50 (printed name, date and time, meaning), 11.70 (signature linked to its record: the SHA-256 of the
 * exact signed content and the object version are stored in the chained audit record), 11.200(a)(1)
 * (user id and password checked again at signing), and EU GMP Annex 11 section 14 (same impact as a
 * handwritten signature, permanently linked, with time and date). Nobody reviews or approves their own
 * work.
 */
public final class SignatureService {

    private final CredentialCheck credentials;

    public SignatureService(CredentialCheck credentials) {
        this.credentials = Objects.requireNonNull(credentials, "credentials");
    }

    /**
     * Signs inside the caller's transaction (auto-commit off); on success nothing is committed, so the
     * caller commits the signature together with the object's new state.
     *
     * <p>On refusal the current transaction of {@code c} is rolled back, the refused attempt is appended
     * as a {@link AuditAction#REFUSED} record and committed, and the exception is thrown: call this with
     * no other uncommitted work on {@code c}. The password array is cleared in every case.
     *
     * @throws SignatureRefusedException wrong credentials, own work, or signer not the session user
     * @throws IllegalStateException     when {@code c} is in auto-commit mode
     */
    public Signature sign(Connection c, SignatureRequest r) throws SQLException, SignatureRefusedException {
        Reason refusal;
        try {
            refusal = refusal(r);
        } finally {
            Arrays.fill(r.password(), '\0');
        }
        String contentSha256 = ChainHash.sha256Hex(r.signedContent());
        if (refusal != null) {
            if (c.getAutoCommit()) {
                throw new IllegalStateException("connection: auto-commit is on; signing runs in the caller's transaction");
            }
            c.rollback();
            AuditRecord refused = AuditTrail.append(c, refusedEntry(r, refusal, contentSha256));
            c.commit();
            throw new SignatureRefusedException(refusal, refused);
        }
        AuditEntry entry = AuditEntry.builder(r.signerId(), AuditAction.SIGNATURE, r.objectType(), r.objectId())
                .version(r.objectVersion()).reason(r.comment()).build();
        AuditRecord stored = ChainWriter.append(c, List.of(new Pending(entry,
                new SignatureFields(r.printedName(), r.meaning(), contentSha256)))).get(0);
        return Signature.of(stored);
    }

    /** All signatures given on the object, in the order given (any version). */
    public static List<Signature> signaturesOf(Connection c, String objectType, String objectId) throws SQLException {
        List<Signature> out = new ArrayList<>();
        AuditReview.forEach(c, AuditQuery.all().object(objectType, objectId).actions(AuditAction.SIGNATURE).build(),
                record -> out.add(Signature.of(record)));
        return List.copyOf(out);
    }

    private Reason refusal(SignatureRequest r) {
        if (!r.signerId().equals(r.sessionUserId())) {
            return Reason.NOT_SESSION_USER;
        }
        if (!credentials.matches(r.signerId(), r.password())) {
            return Reason.WRONG_CREDENTIALS;
        }
        if (r.meaning().requiresIndependentSigner() && r.signerId().equals(r.authorId())) {
            return Reason.OWN_WORK;
        }
        return null;
    }

    private static AuditEntry refusedEntry(SignatureRequest r, Reason refusal, String contentSha256) {
        Map<String, Object> attempt = new LinkedHashMap<>();
        attempt.put("attempted_signer", r.signerId());
        attempt.put("meaning", r.meaning());
        attempt.put("content_sha256", contentSha256);
        attempt.put("refusal", refusal);
        return AuditEntry.builder(r.sessionUserId(), AuditAction.REFUSED, r.objectType(), r.objectId())
                .version(r.objectVersion()).newValue(AuditValues.canonical(attempt)).build();
    }
}
