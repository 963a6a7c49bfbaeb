package org.tracegas.store.internal;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.store.NewQaCheck;
import org.tracegas.store.QaCheckInfo;
import org.tracegas.store.QaService;
import org.tracegas.store.Session;
import org.tracegas.store.VersionKind;

final class JdbcQaService implements QaService {

    private final Transactions transactions;

    JdbcQaService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public List<QaCheckInfo> recordAll(Session actor, String projectId, String methodVersionId,
            List<NewQaCheck> checks) {
        if (checks == null || checks.isEmpty() || checks.stream().anyMatch(java.util.Objects::isNull)) {
            throw new IllegalArgumentException("checks must hold at least one check and no null");
        }
        return transactions.run("recording " + checks.size() + " QA check(s) in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            if (JdbcVersionService.load(tx, methodVersionId).kind() != VersionKind.METHOD) {
                throw new IllegalArgumentException("methodVersionId " + methodVersionId + " is not a method version");
            }
            JdbcVersionService.freeze(tx, methodVersionId);
            Instant now = Instant.now().truncatedTo(ChronoUnit.MICROS);
            List<QaCheckInfo> stored = new ArrayList<>();
            for (int i = 0; i < checks.size(); i++) {
                NewQaCheck c = checks.get(i);
                QaCheckInfo info = new QaCheckInfo(UUID.randomUUID().toString(), projectId, methodVersionId, c,
                        actor.userId(), now);
                tx.update("INSERT INTO qa_check (id, project_id, method_version_id, seq, check_name, passed, measured,"
                        + " unit, lower_limit, upper_limit, rule, source, recorded_by, recorded_at)"
                        + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)", info.id(), projectId, methodVersionId,
                        i, c.check(), c.passed(), c.measured(), c.unit(), c.lower(), c.upper(), c.rule(), c.source(),
                        actor.userId(), now);
                tx.wrote(DataKind.QA_CHECK, info.id());
                tx.audit(AuditEntry.builder(actor.userId(), AuditAction.DECISION, "qa-check", info.id())
                        .newValue(values(info)).build());
                stored.add(info);
            }
            return stored;
        });
    }

    @Override
    public List<QaCheckInfo> checks(Session actor, String projectId) {
        return transactions.run("reading the QA checks of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return tx.queryList("SELECT * FROM qa_check WHERE project_id = ? ORDER BY recorded_at, seq",
                    JdbcQaService::map, projectId);
        });
    }

    private static QaCheckInfo map(ResultSet rs) throws SQLException {
        NewQaCheck outcome = new NewQaCheck(rs.getString("check_name"), rs.getBoolean("passed"),
                rs.getDouble("measured"), rs.getString("unit"), rs.getDouble("lower_limit"),
                rs.getDouble("upper_limit"), rs.getString("rule"), rs.getString("source"));
        return new QaCheckInfo(rs.getString("id"), rs.getString("project_id"), rs.getString("method_version_id"),
                outcome, rs.getString("recorded_by"), Tx.instant(rs, "recorded_at"));
    }

    private static String values(QaCheckInfo info) {
        NewQaCheck c = info.outcome();
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("project", info.projectId());
        fields.put("methodVersion", info.methodVersionId());
        fields.put("check", c.check());
        fields.put("passed", c.passed());
        fields.put("measured", c.measured());
        fields.put("unit", c.unit());
        fields.put("lower", c.lower());
        fields.put("upper", c.upper());
        fields.put("rule", c.rule());
        fields.put("source", c.source());
        return AuditValues.canonical(fields);
    }
}
