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
import org.tracegas.model.QaOutcome;
import org.tracegas.model.QaOutcomes;
import org.tracegas.model.VersionKind;
import org.tracegas.store.QaService;
import org.tracegas.store.Session;

final class JdbcQaService implements QaService {

    private final Transactions transactions;

    JdbcQaService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public List<QaOutcome> recordAll(Session actor, String projectId, String methodVersionId,
            List<QaOutcome> checks) {
        if (checks == null || checks.isEmpty() || checks.stream().anyMatch(java.util.Objects::isNull)) {
            throw new IllegalArgumentException("checks must hold at least one check and no null");
        }
        for (int i = 0; i < checks.size(); i++) {
            requireComplete(checks.get(i), " (checks[" + i + "])");
        }
        return transactions.run("recording " + checks.size() + " QA check(s) in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            if (JdbcVersionService.load(tx, methodVersionId).getKind() != VersionKind.METHOD) {
                throw new IllegalArgumentException("methodVersionId " + methodVersionId + " is not a method version");
            }
            JdbcVersionService.freeze(tx, methodVersionId);
            Instant now = Instant.now().truncatedTo(ChronoUnit.MICROS);
            List<QaOutcome> stored = new ArrayList<>();
            for (int i = 0; i < checks.size(); i++) {
                QaOutcome c = copy(checks.get(i));
                c.setId(UUID.randomUUID().toString());
                c.setProjectId(projectId);
                c.setMethodVersionId(methodVersionId);
                c.setRecordedBy(actor.userId());
                c.setRecorded(now);
                tx.update("INSERT INTO qa_check (id, project_id, method_version_id, seq, check_name, passed, measured,"
                        + " unit, lower_limit, upper_limit, rule, source, recorded_by, recorded_at)"
                        + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)", c.getId(), projectId,
                        methodVersionId, i, c.getCheck(), c.isPassed(), c.getMeasured(), c.getUnit(),
                        c.getLowerLimit(), c.getUpperLimit(), c.getRule(), c.getSource(), actor.userId(), now);
                tx.wrote(DataKind.QA_CHECK, c.getId());
                tx.audit(AuditEntry.builder(actor.userId(), AuditAction.DECISION, "qa-check", c.getId())
                        .newValue(values(c)).build());
                stored.add(c);
            }
            return stored;
        });
    }

    @Override
    public List<QaOutcome> checks(Session actor, String projectId) {
        return transactions.run("reading the QA checks of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return tx.queryList("SELECT * FROM qa_check WHERE project_id = ? ORDER BY recorded_at, seq",
                    JdbcQaService::map, projectId);
        });
    }

    /**
     * The checks an outcome passes before anything is stored, with the messages a QA check has always been
     * refused with.
     *
     * @param where names the outcome at the end of the message, e.g. {@code " (checks[2])"}
     */
    private static void requireComplete(QaOutcome c, String where) {
        String[][] fields = {{"check", c.getCheck()}, {"unit", c.getUnit()}, {"rule", c.getRule()},
            {"source", c.getSource()}};
        for (String[] field : fields) {
            if (field[1] == null || (field[1].isBlank() && !field[0].equals("unit"))) {
                throw new IllegalArgumentException(field[0] + " of a QA check must not be blank" + where);
            }
        }
        // the measured value may be NaN: a check without a usable value is stored as failed
        if (Double.isNaN(c.getLowerLimit()) || Double.isNaN(c.getUpperLimit())) {
            throw new IllegalArgumentException("limits of QA check " + c.getCheck() + " must be numbers" + where);
        }
    }

    /** A new outcome with the given one's values, which the store completes and keeps; the given one stays. */
    private static QaOutcome copy(QaOutcome c) {
        return QaOutcomes.of(c.getCheck(), c.isPassed(), c.getMeasured(), c.getUnit(), c.getLowerLimit(),
                c.getUpperLimit(), c.getRule(), c.getSource());
    }

    private static QaOutcome map(ResultSet rs) throws SQLException {
        QaOutcome c = QaOutcomes.of(rs.getString("check_name"), rs.getBoolean("passed"), rs.getDouble("measured"),
                rs.getString("unit"), rs.getDouble("lower_limit"), rs.getDouble("upper_limit"), rs.getString("rule"),
                rs.getString("source"));
        c.setId(rs.getString("id"));
        c.setProjectId(rs.getString("project_id"));
        c.setMethodVersionId(rs.getString("method_version_id"));
        c.setRecordedBy(rs.getString("recorded_by"));
        c.setRecorded(Tx.instant(rs, "recorded_at"));
        return c;
    }

    private static String values(QaOutcome c) {
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("project", c.getProjectId());
        fields.put("methodVersion", c.getMethodVersionId());
        fields.put("check", c.getCheck());
        fields.put("passed", c.isPassed());
        fields.put("measured", c.getMeasured());
        fields.put("unit", c.getUnit());
        fields.put("lower", c.getLowerLimit());
        fields.put("upper", c.getUpperLimit());
        fields.put("rule", c.getRule());
        fields.put("source", c.getSource());
        return AuditValues.canonical(fields);
    }
}
