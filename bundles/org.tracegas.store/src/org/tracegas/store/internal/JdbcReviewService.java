package org.tracegas.store.internal;

import java.util.List;

import org.tracegas.audit.CredentialCheck;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.audit.SignatureRequest;
import org.tracegas.audit.SignatureService;
import org.tracegas.model.AccessLevel;
import org.tracegas.store.LoginFailedException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ReportSignatureRequest;
import org.tracegas.store.ReviewService;
import org.tracegas.store.Session;
import org.tracegas.store.UserService;

final class JdbcReviewService implements ReviewService {

    private final Transactions transactions;
    private final UserService users;
    private final SignatureService signatures;

    JdbcReviewService(Transactions transactions, UserService users) {
        this.transactions = transactions;
        this.users = users;
        // the typed password goes through the log-in, so a wrong one counts towards the lock-out
        CredentialCheck check = (userId, password) -> {
            try {
                return users.logIn(users.user(userId).login(), password.clone()).userId().equals(userId);
            } catch (LoginFailedException | NoSuchObjectException e) {
                return false;
            }
        };
        this.signatures = new SignatureService(check);
    }

    /** The signature or the refusal of one attempt; the refusal is committed by the signature service. */
    private record Attempt(Signature signature, SignatureRefusedException refused) {
    }

    @Override
    public Signature sign(Session signer, ReportSignatureRequest r) throws SignatureRefusedException {
        if (signer == null || r == null) {
            throw new IllegalArgumentException("signer and request must not be null");
        }
        String printedName = users.user(signer.userId()).displayName();
        String signerId = signer.login().equals(r.typedLogin()) ? signer.userId() : r.typedLogin();
        Attempt attempt = transactions.run("signing report " + r.reportId() + " of project " + r.projectId(), tx -> {
            Guard.requireProject(tx, signer, r.projectId(), AccessLevel.READ);
            SignatureRequest request = new SignatureRequest(signer.userId(), signerId, r.password(), printedName,
                    r.meaning(), OBJECT_TYPE, objectId(r.projectId(), r.reportId()), 0, r.content(), r.authorId(),
                    r.comment() == null || r.comment().isBlank() ? null : r.comment());
            try {
                return new Attempt(signatures.sign(tx.connection(), request), null);
            } catch (SignatureRefusedException e) {
                return new Attempt(null, e);
            }
        });
        if (attempt.refused() != null) {
            throw attempt.refused();
        }
        return attempt.signature();
    }

    @Override
    public List<Signature> signatures(Session reader, String projectId, String reportId) {
        return transactions.run("reading the signatures of report " + reportId, tx -> {
            Guard.requireProject(tx, reader, projectId, AccessLevel.READ);
            return SignatureService.signaturesOf(tx.connection(), OBJECT_TYPE, objectId(projectId, reportId));
        });
    }

    // report identifiers are the lab's; the project keeps two projects' reports of the same id apart
    private static String objectId(String projectId, String reportId) {
        return projectId + "/" + reportId;
    }
}
