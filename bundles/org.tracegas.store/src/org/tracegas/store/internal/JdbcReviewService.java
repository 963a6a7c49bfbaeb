package org.tracegas.store.internal;

import java.sql.SQLException;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.tracegas.audit.CredentialCheck;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.audit.SignatureRequest;
import org.tracegas.audit.SignatureService;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Result;
import org.tracegas.store.LoginFailedException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ReportSignatureRequest;
import org.tracegas.store.ResultSignatureRequest;
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
                return users.logIn(users.user(userId).getLogin(), password.clone()).userId().equals(userId);
            } catch (LoginFailedException | NoSuchObjectException e) {
                return false;
            }
        };
        this.signatures = new SignatureService(check);
    }

    /** What a signature is given on: the object, its project, the signed bytes and their author. */
    private record Subject(String projectId, String objectType, String objectId, byte[] content, String authorId) {
    }

    /** Finds the subject inside the signing or reading transaction, so the checks and the signature agree. */
    @FunctionalInterface
    private interface Lookup {
        Subject find(Tx tx) throws SQLException;
    }

    /** The signature or the refusal of one attempt; the refusal is committed by the signature service. */
    private record Attempt(Signature signature, SignatureRefusedException refused) {
    }

    @Override
    public Signature sign(Session signer, ReportSignatureRequest r) throws SignatureRefusedException {
        requireArguments(signer, r);
        return sign(signer, "signing report " + r.reportId() + " of project " + r.projectId(), report(r.projectId(),
                r.reportId(), r.content(), r.authorId()), r.typedLogin(), r.password(), r.meaning(), r.comment());
    }

    @Override
    public List<Signature> signatures(Session reader, String projectId, String reportId) {
        return signatures(reader, "reading the signatures of report " + reportId,
                report(projectId, reportId, null, null));
    }

    @Override
    public Optional<String> otherProjectWithReport(String projectId, String reportId) {
        return transactions.run("looking for report " + reportId + " in other projects", tx -> {
            Optional<String> issued = tx.queryOne("SELECT p.code FROM report r JOIN project p ON p.id = r.project_id"
                    + " WHERE r.report_id = ? AND r.project_id <> ? ORDER BY r.issued_at FETCH FIRST 1 ROWS ONLY",
                    rs -> rs.getString(1), reportId, projectId);
            if (issued.isPresent()) {
                return issued;
            }
            // a signature's object id is "<project id>/<report id>"; project ids are UUIDs, which hold no slash
            List<String> projects = tx.queryList("SELECT DISTINCT object_id FROM audit_record WHERE object_type = ?",
                    rs -> rs.getString(1), OBJECT_TYPE).stream().filter(id -> id.endsWith("/" + reportId))
                    .map(id -> id.substring(0, id.indexOf('/'))).filter(p -> !p.equals(projectId)).toList();
            for (String other : projects) {
                Optional<String> code = tx.queryOne("SELECT code FROM project WHERE id = ?", rs -> rs.getString(1),
                        other);
                if (code.isPresent()) {
                    return code;
                }
            }
            return Optional.empty();
        });
    }

    @Override
    public Signature signResult(Session signer, ResultSignatureRequest r) throws SignatureRefusedException {
        requireArguments(signer, r);
        return sign(signer, "signing result " + r.resultId(), result(r.resultId()), r.typedLogin(), r.password(),
                r.meaning(), r.comment());
    }

    @Override
    public List<Signature> resultSignatures(Session reader, String resultId) {
        return signatures(reader, "reading the signatures of result " + resultId, result(resultId));
    }

    private static Lookup report(String projectId, String reportId, byte[] content, String authorId) {
        Subject s = new Subject(projectId, OBJECT_TYPE, objectId(projectId, reportId), content, authorId);
        return tx -> s;
    }

    private static Lookup result(String resultId) {
        return tx -> {
            Result r = tx.queryOne("SELECT * FROM analysis_result WHERE id = ?", JdbcResultService::map, resultId)
                    .orElseThrow(() -> new NoSuchObjectException(RESULT_TYPE, resultId));
            return new Subject(r.getProjectId(), RESULT_TYPE, r.getId(), ResultContent.of(r), r.getRecordedBy());
        };
    }

    private Signature sign(Session signer, String operation, Lookup lookup, String typedLogin, char[] password,
            SignatureMeaning meaning, String comment) throws SignatureRefusedException {
        Attempt attempt;
        try {
            String printedName = users.user(signer.userId()).getDisplayName();
            String signerId = signer.login().equals(typedLogin) ? signer.userId() : typedLogin;
            attempt = transactions.run(operation, tx -> {
                Subject s = lookup.find(tx);
                Guard.requireProject(tx, signer, s.projectId(), AccessLevel.READ);
                SignatureRequest request = new SignatureRequest(signer.userId(), signerId, password, printedName,
                        meaning, s.objectType(), s.objectId(), 0, s.content(), s.authorId(),
                        comment == null || comment.isBlank() ? null : comment);
                try {
                    return new Attempt(signatures.sign(tx.connection(), request), null);
                } catch (SignatureRefusedException e) {
                    return new Attempt(null, e);
                }
            });
        } finally {
            // also when the attempt ends before the signature service clears it (no access, no such object)
            Arrays.fill(password, '\0');
        }
        if (attempt.refused() != null) {
            throw attempt.refused();
        }
        return attempt.signature();
    }

    private List<Signature> signatures(Session reader, String operation, Lookup lookup) {
        return transactions.run(operation, tx -> {
            Subject s = lookup.find(tx);
            Guard.requireProject(tx, reader, s.projectId(), AccessLevel.READ);
            return SignatureService.signaturesOf(tx.connection(), s.objectType(), s.objectId());
        });
    }

    private static void requireArguments(Session signer, Object request) {
        if (signer == null || request == null) {
            throw new IllegalArgumentException("signer and request must not be null");
        }
    }

    // report identifiers are the lab's; the project keeps two projects' reports of the same id apart
    private static String objectId(String projectId, String reportId) {
        return projectId + "/" + reportId;
    }
}
