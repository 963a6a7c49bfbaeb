package org.tracegas.ui.session;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.stream.Collectors;

import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.model.Result;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ResultSignatureRequest;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Electronic review and approval of stored results, as the desk shows them. The store signs: it checks the
 * password typed at signing through the log-in (so a wrong one counts towards the lock-out), refuses signing
 * one's own results as reviewer or approver, and defines the content a result signature covers.
 */
public final class ResultApproval {

    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'")
            .withZone(ZoneOffset.UTC);

    private final WorkspaceStore store;

    public ResultApproval(WorkspaceAccess access) {
        this.store = access.store();
    }

    /** The signer's printed name as shown in the signature dialog and with the signature. */
    public String printedName(Session session) {
        return store.users().user(session.userId()).getDisplayName();
    }

    /**
     * Signs a result in the session's name.
     *
     * @param typedLogin the login typed at signing; must be the session's own
     * @param password   typed at signing; cleared afterwards
     * @throws SignatureRefusedException wrong password, own result, or another user's login (the refusal is
     *                                   in the audit trail)
     * @throws org.tracegas.store.StoreException if the signature cannot be stored or the project not read
     */
    public Signature sign(Session session, Result result, String typedLogin, char[] password,
            SignatureMeaning meaning, String comment) throws SignatureRefusedException {
        return store.reviews().signResult(session,
                new ResultSignatureRequest(result.getId(), typedLogin, password, meaning, comment));
    }

    /** Signatures given on a result so far, as the reader may see them. */
    public List<Signature> signaturesOf(Session reader, String resultId) {
        return store.reviews().resultSignatures(reader, resultId);
    }

    /** "APPROVED by Jane Roe 2026-03-10 14:03 UTC; ..." or "not signed". */
    public String signatureSummary(Session reader, String resultId) {
        List<Signature> s = signaturesOf(reader, resultId);
        return s.isEmpty() ? "not signed" : s.stream().map(g -> g.meaning() + " by " + g.printedName() + " "
                + SHOWN.format(g.signedAt())).collect(Collectors.joining("; "));
    }

    /** The login of a user id, or the id itself when there is no such user. */
    public String loginOf(String userId) {
        try {
            return store.users().user(userId).getLogin();
        } catch (NoSuchObjectException e) {
            return userId;
        }
    }
}
