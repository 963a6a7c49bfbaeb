package org.tracegas.store.internal;

import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Measurement;
import org.tracegas.store.ImportService;
import org.tracegas.store.ImportedFile;
import org.tracegas.store.MeasurementChecks;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.RawFile;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;

final class JdbcImportService implements ImportService {

    private final Transactions transactions;

    JdbcImportService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public ImportedFile importFile(Session actor, String projectId, RawFile file, List<Measurement> measurements) {
        if (file == null) {
            throw new IllegalArgumentException("file must not be null");
        }
        if (measurements == null || measurements.isEmpty()) {
            throw new IllegalArgumentException("measurements of " + file.fileName() + " must not be empty");
        }
        for (int i = 0; i < measurements.size(); i++) {
            if (measurements.get(i) == null) {
                throw new IllegalArgumentException("measurements[" + i + "] of " + file.fileName() + " is null");
            }
            try {
                MeasurementChecks.requireImportable(measurements.get(i));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("measurements[" + i + "] of " + file.fileName() + ": "
                        + e.getMessage(), e);
            }
        }
        return transactions.run("importing " + file.fileName() + " into project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            Optional<ImportedFile> known = find(tx, projectId, file.sha256());
            if (known.isPresent()) {
                return known.get();
            }
            Instant now = Instant.now().truncatedTo(ChronoUnit.MICROS);
            tx.update("INSERT INTO raw_file (project_id, sha256, file_name, format, byte_count, content, imported_by,"
                    + " imported_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?)", projectId, file.sha256(), file.fileName(),
                    file.format(), (long) file.size(), file.content(), actor.userId(), now);
            List<String> ids = new ArrayList<>(measurements.size());
            List<AuditEntry> audit = new ArrayList<>();
            List<List<RowBindings.RowRef>> bound = new ArrayList<>();
            for (int i = 0; i < measurements.size(); i++) {
                Measurement m = measurements.get(i);
                String id = UUID.randomUUID().toString();
                ids.add(id);
                tx.update(JdbcProjectService.INSERT_MEASUREMENT, id, projectId, m.getKind(), m.getTime(),
                        m.getCellTemperature(), m.getCellPressure(), actor.userId());
                String[] spectrum;
                try (PreparedStatement ps = tx.connection().prepareStatement(SpectrumRows.INSERT)) {
                    spectrum = SpectrumRows.bindInsert(ps, projectId,
                            new SpectrumInput(id, m.getContent(), m.getSpectrum(), SampleEncoding.FLOAT64_LE));
                    ps.executeUpdate();
                }
                String labels = AuditValues.canonical(m.getLabels().map());
                tx.update("INSERT INTO imported_measurement (measurement_id, project_id, raw_sha256, record_index,"
                        + " title, content, spectrum_id, labels) VALUES (?, ?, ?, ?, ?, ?, ?, ?)", id, projectId,
                        file.sha256(), i, m.getTitle(), m.getContent(), spectrum[0], labels);
                Map<String, Object> fields = JdbcProjectService.measurementValues(projectId, m.getKind(),
                        m.getTime(), m.getCellTemperature(), m.getCellPressure());
                fields.put("title", m.getTitle());
                fields.put("sourceFile", file.fileName());
                fields.put("sourceSha256", file.sha256());
                fields.put("sourceRecord", i);
                fields.put("labelsSha256", SpectrumCodec.sha256Hex(labels.getBytes(
                        java.nio.charset.StandardCharsets.UTF_8)));
                fields.put("spectrum", spectrum[0]);
                fields.put("spectrumContent", m.getContent().getName());
                fields.put("spectrumAxis", m.getSpectrum().axis());
                fields.put("spectrumEncoding", SampleEncoding.FLOAT64_LE);
                fields.put("spectrumSha256", spectrum[1]);
                audit.add(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "measurement", id)
                        .newValue(AuditValues.canonical(fields)).build());
                bound.add(List.of(new RowBindings.RowRef(DataKind.MEASUREMENT, id),
                        new RowBindings.RowRef(DataKind.SPECTRAL_DATA, spectrum[0]),
                        new RowBindings.RowRef(DataKind.IMPORTED_MEASUREMENT, id)));
            }
            Map<String, Object> fileFields = new LinkedHashMap<>();
            fileFields.put("project", projectId);
            fileFields.put("fileName", file.fileName());
            fileFields.put("format", file.format());
            fileFields.put("bytes", file.size());
            fileFields.put("sha256", file.sha256());
            fileFields.put("measurements", String.join(",", ids));
            audit.add(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "raw-file",
                    projectId + "/" + file.sha256()).newValue(AuditValues.canonical(fileFields)).build());
            bound.add(List.of(new RowBindings.RowRef(DataKind.RAW_FILE, projectId + "/" + file.sha256())));
            tx.auditAll(audit, bound);
            return new ImportedFile(file.sha256(), file.fileName(), file.format(), file.size(), now, ids, true);
        });
    }

    @Override
    public Optional<ImportedFile> find(Session actor, String projectId, String sha256) {
        return transactions.run("looking up file " + sha256 + " in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return find(tx, projectId, sha256);
        });
    }

    private static Optional<ImportedFile> find(Tx tx, String projectId, String sha256) throws SQLException {
        Optional<ImportedFile> file = tx.queryOne("SELECT sha256, file_name, format, byte_count, imported_at"
                + " FROM raw_file WHERE project_id = ? AND sha256 = ?", rs -> new ImportedFile(rs.getString(1).trim(),
                        rs.getString(2), rs.getString(3), rs.getLong(4), Tx.instant(rs, "imported_at"), List.of(),
                        false), projectId, sha256);
        if (file.isEmpty()) {
            return file;
        }
        List<String> ids = tx.queryList("SELECT measurement_id FROM imported_measurement WHERE project_id = ?"
                + " AND raw_sha256 = ? ORDER BY record_index", rs -> rs.getString(1), projectId, sha256);
        ImportedFile f = file.get();
        return Optional.of(new ImportedFile(f.sha256(), f.fileName(), f.format(), f.byteCount(), f.importedAt(), ids,
                false));
    }

    @Override
    public byte[] content(Session actor, String projectId, String sha256) {
        return transactions.run("reading file " + sha256 + " of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return tx.queryOne("SELECT content FROM raw_file WHERE project_id = ? AND sha256 = ?",
                    rs -> rs.getBytes(1), projectId, sha256)
                    .orElseThrow(() -> new NoSuchObjectException("raw file", sha256));
        });
    }

    @Override
    public List<Measurement> measurements(Session actor, String projectId) {
        return transactions.run("reading the imported measurements of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return ModelRows.measurements(tx, ModelRows.project(tx, projectId), " AND i.measurement_id IS NOT NULL",
                    "ORDER BY m.measured_at, f.file_name, i.record_index");
        });
    }

    /** Reads back the canonical text the labels were stored as ({@link AuditValues#canonical}). */
    static Map<String, String> labels(String canonical) {
        Map<String, String> labels = new LinkedHashMap<>();
        for (String line : canonical.split("\n")) {
            int eq = line.indexOf('=');
            if (eq < 1) {
                continue;
            }
            String raw = line.substring(eq + 1);
            StringBuilder value = new StringBuilder(raw.length());
            for (int i = 0; i < raw.length(); i++) {
                char ch = raw.charAt(i);
                if (ch == '\\' && i + 1 < raw.length()) {
                    char next = raw.charAt(++i);
                    value.append(switch (next) {
                        case 'n' -> '\n';
                        case 'r' -> '\r';
                        case '0' -> '\0';
                        default -> next;
                    });
                } else {
                    value.append(ch);
                }
            }
            labels.put(line.substring(0, eq), value.toString());
        }
        return labels;
    }
}
