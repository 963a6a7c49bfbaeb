package org.tracegas.ui.session;

import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

import org.tracegas.audit.CredentialCheck;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.audit.SignatureRequest;
import org.tracegas.audit.SignatureService;
import org.tracegas.store.LoginFailedException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ResultInfo;
import org.tracegas.store.Session;
import org.tracegas.store.UserService;

/**
 * Electronic review and approval of stored results. The password typed at signing is checked by the user
 * store (so a wrong one counts towards the lock-out like a failed log-in); nobody signs their own results
 * as reviewer or approver.
 */
public final class ResultApproval {

    /** Object type of results in the audit trail. */
    public static final String OBJECT_TYPE = "result";

    private static final java.time.format.DateTimeFormatter SHOWN = java.time.format.DateTimeFormatter
            .ofPattern("yyyy-MM-dd HH:mm 'UTC'").withZone(java.time.ZoneOffset.UTC);

    private final WorkspaceAccess access;
    private final SignatureService signatures;

    public ResultApproval(WorkspaceAccess access) {
        this.access = access;
        UserService users = access.store().users();
        CredentialCheck check = (userId, password) -> {
            try {
                return users.logIn(users.user(userId).login(), password.clone()).userId().equals(userId);
            } catch (LoginFailedException | NoSuchObjectException e) {
                return false;
            }
        };
        this.signatures = new SignatureService(check);
    }

    /** The signer's printed name as shown in the signature dialog and with the signature. */
    public String printedName(Session session) {
        return access.store().users().user(session.userId()).displayName();
    }

    /**
     * Signs a result in the session's name.
     *
     * @param typedLogin the login typed at signing; must be the session's own
     * @param password   typed at signing; cleared afterwards
     * @throws SignatureRefusedException wrong password, own result, or another user's login (the refusal is
     *                                   in the audit trail)
     */
    public Signature sign(Session session, ResultInfo result, String typedLogin, char[] password,
            SignatureMeaning meaning, String comment) throws SignatureRefusedException, SQLException {
        String signerId = session.login().equals(typedLogin) ? session.userId() : typedLogin;
        SignatureRequest request = new SignatureRequest(session.userId(), signerId, password, printedName(session),
                meaning, OBJECT_TYPE, result.id(), 0, signedContent(result), result.recordedBy(),
                comment == null || comment.isBlank() ? null : comment);
        try (Connection c = access.connection()) {
            c.setAutoCommit(false);
            try {
                Signature s = signatures.sign(c, request);
                c.commit();
                return s;
            } catch (SQLException | RuntimeException e) {
                c.rollback();
                throw e;
            }
        }
    }

    /** Signatures given on a result so far. */
    public List<Signature> signaturesOf(String resultId) throws SQLException {
        try (Connection c = access.connection()) {
            return SignatureService.signaturesOf(c, OBJECT_TYPE, resultId);
        }
    }

    /** "APPROVED by Jane Roe 2026-03-10 14:03 UTC; ..." or "not signed". */
    public String signatureSummary(String resultId) throws SQLException {
        List<Signature> s = signaturesOf(resultId);
        return s.isEmpty() ? "not signed" : s.stream().map(g -> g.meaning() + " by " + g.printedName() + " "
                + SHOWN.format(g.signedAt())).collect(Collectors.joining("; "));
    }

    /** The login of a user id, or the id itself when there is no such user. */
    public String loginOf(String userId) {
        try {
            return access.store().users().user(userId).login();
        } catch (NoSuchObjectException e) {
            return userId;
        }
    }

    /** The exact text a signature covers: the result's values and what made them. */
    static byte[] signedContent(ResultInfo r) {
        String text = String.format(Locale.ROOT,
                "result=%s%ncompound=%s%nconcentration=%s%nuncertainty=%s%ndetection_limit=%s%nunit=%s%n"
                        + "method_version=%s%nlibrary_version=%s%ninput_sha256=%s%nrecorded_by=%s%nrecorded=%s%n",
                r.id(), r.values().compound(), r.values().concentration(), r.values().uncertainty(),
                r.values().detectionLimit(), r.values().unit(), r.values().methodVersionId(),
                r.values().libraryVersionId(), r.values().inputHash(), r.recordedBy(), r.recorded());
        return text.getBytes(StandardCharsets.UTF_8);
    }
}
