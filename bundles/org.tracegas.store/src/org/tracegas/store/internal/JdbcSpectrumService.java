package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.SpectrumService;
import org.tracegas.store.StoreException;

final class JdbcSpectrumService implements SpectrumService {

    private final Transactions transactions;
    private final Backend backend;

    JdbcSpectrumService(Transactions transactions, Backend backend) {
        this.transactions = transactions;
        this.backend = backend;
    }

    @Override
    public String store(Session actor, String projectId, SpectrumInput spectrum) {
        return storeAll(actor, projectId, List.of(spectrum)).get(0);
    }

    @Override
    public List<String> storeAll(Session actor, String projectId, List<SpectrumInput> spectra) {
        for (int i = 0; i < spectra.size(); i++) {
            if (spectra.get(i) == null) {
                throw new IllegalArgumentException("spectra[" + i + "] is null");
            }
        }
        return transactions.run("storing " + spectra.size() + " spectra in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            List<String> ids = new ArrayList<>(spectra.size());
            try (PreparedStatement ps = tx.connection().prepareStatement(SpectrumRows.INSERT)) {
                for (SpectrumInput input : spectra) {
                    String[] idAndHash = SpectrumRows.bindInsert(ps, projectId, input);
                    ps.executeUpdate();
                    ids.add(idAndHash[0]);
                    tx.wrote(DataKind.SPECTRAL_DATA, idAndHash[0]);
                    tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "spectral-data", idAndHash[0])
                            .newValue(values(projectId, input, idAndHash[1])).build());
                }
            }
            return ids;
        });
    }

    @Override
    public ProcessedSpectrum load(Session actor, String dataId) {
        return transactions.run("reading spectrum " + dataId, tx -> {
            Guard.requireProjectOf(tx, actor, "spectral_data", "spectral data", dataId, AccessLevel.READ);
            return tx.queryOne("SELECT " + SpectrumRows.COLUMNS + " FROM spectral_data WHERE id = ?",
                    SpectrumRows::read, dataId).orElseThrow();
        });
    }

    @Override
    public List<ProcessedSpectrum> ofMeasurement(Session actor, String measurementId) {
        return transactions.run("reading the spectra of measurement " + measurementId, tx -> {
            Guard.requireProjectOf(tx, actor, "measurement", "measurement", measurementId, AccessLevel.READ);
            return tx.queryList("SELECT " + SpectrumRows.COLUMNS + " FROM spectral_data WHERE measurement_id = ?"
                    + " ORDER BY seq", SpectrumRows::read, measurementId);
        });
    }

    @Override
    public Stream<ProcessedSpectrum> stream(Session actor, String projectId) {
        Connection c = null;
        PreparedStatement ps = null;
        try {
            c = transactions.openReadConnection();
            Guard.requireProject(new Tx(c), actor, projectId, AccessLevel.READ);
            ps = c.prepareStatement(backend.spectraOfProject(), ResultSet.TYPE_FORWARD_ONLY,
                    ResultSet.CONCUR_READ_ONLY);
            ps.setString(1, projectId);
            return SpectrumCursor.stream(c, ps);
        } catch (SQLException | RuntimeException e) {
            closeQuietly(ps, c, e);
            if (e instanceof SQLException sql) {
                throw new StoreException("reading the spectra of project " + projectId + " failed: "
                        + sql.getMessage(), sql);
            }
            throw (RuntimeException) e;
        }
    }

    private static void closeQuietly(PreparedStatement ps, Connection c, Exception cause) {
        try (c; ps) {
            if (c != null) {
                c.rollback();
            }
        } catch (SQLException e) {
            cause.addSuppressed(e);
        }
    }

    private static String values(String projectId, SpectrumInput input, String sha256) {
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("project", projectId);
        fields.put("measurement", input.measurementId());
        fields.put("content", input.content().getName());
        fields.put("axis", input.spectrum().axis());
        fields.put("encoding", input.encoding());
        fields.put("sha256", sha256);
        return AuditValues.canonical(fields);
    }
}
