package org.tracegas.store.internal;

import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.Instrument;
import org.tracegas.model.WorkspacePackage;
import org.tracegas.store.InstrumentService;
import org.tracegas.store.Session;
import org.tracegas.store.StoreException;

final class JdbcInstrumentService implements InstrumentService {

    private static final String SELECT = "SELECT " + ModelRows.INSTRUMENT_COLUMNS + " FROM instrument ins";

    private final Transactions transactions;

    JdbcInstrumentService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public Instrument record(Session actor, Instrument described) {
        if (described == null) {
            throw new IllegalArgumentException("instrument must not be null");
        }
        JdbcUserService.requireText("name", described.getName());
        JdbcUserService.requireText("serialNumber", described.getSerialNumber());
        requirePositive("laserWavenumber (cm-1)", described.getLaserWavenumber());
        requirePositive("maxPathDifference (cm)", described.getMaxPathDifference());
        if (described.isSetFieldOfView()) {
            requirePositive("fieldOfView (mrad)", described.getFieldOfView());
        }
        requirePositive("cellPathLength (m)", described.getCellPathLength());
        return transactions.run("recording instrument " + described.getName(), tx -> {
            Guard.roles(tx, actor);
            Optional<Instrument> stored = find(tx, described.getName(), described.getSerialNumber());
            if (stored.isPresent()) {
                requireSameFigures(stored.get(), described);
                return stored.get();
            }
            String id = UUID.randomUUID().toString();
            Double fieldOfView = described.isSetFieldOfView() ? described.getFieldOfView() : null;
            tx.update("INSERT INTO instrument (id, name, serial_number, laser_wavenumber, max_path_difference,"
                    + " field_of_view, cell_path_length, row_version) VALUES (?, ?, ?, ?, ?, ?, ?, 0)", id,
                    described.getName(), described.getSerialNumber(), described.getLaserWavenumber(),
                    described.getMaxPathDifference(), fieldOfView, described.getCellPathLength());
            tx.wrote(DataKind.INSTRUMENT, id);
            Map<String, Object> fields = new LinkedHashMap<>();
            fields.put("name", described.getName());
            fields.put("serialNumber", described.getSerialNumber());
            fields.put("laserWavenumber", described.getLaserWavenumber());
            fields.put("maxPathDifference", described.getMaxPathDifference());
            if (fieldOfView != null) {
                fields.put("fieldOfView", fieldOfView);
            }
            fields.put("cellPathLength", described.getCellPathLength());
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "instrument", id)
                    .newValue(AuditValues.canonical(fields)).build());
            return find(tx, described.getName(), described.getSerialNumber()).orElseThrow();
        });
    }

    /** A stored instrument's figures are fixed: one that differs is another set-up, to be named apart. */
    private static void requireSameFigures(Instrument stored, Instrument described) {
        for (var figure : List.of(WorkspacePackage.Literals.INSTRUMENT__LASER_WAVENUMBER,
                WorkspacePackage.Literals.INSTRUMENT__MAX_PATH_DIFFERENCE,
                WorkspacePackage.Literals.INSTRUMENT__FIELD_OF_VIEW,
                WorkspacePackage.Literals.INSTRUMENT__CELL_PATH_LENGTH)) {
            Object was = stored.eIsSet(figure) ? stored.eGet(figure) : null;
            Object is = described.eIsSet(figure) ? described.eGet(figure) : null;
            if (was == null ? is != null : !was.equals(is)) {
                throw new StoreException(figure.getName() + ": instrument '" + stored.getName() + "' serial "
                        + stored.getSerialNumber() + " is stored with " + (was == null ? "none" : was) + ", not "
                        + (is == null ? "none" : is) + "; a changed set-up is recorded under another name");
            }
        }
    }

    private static void requirePositive(String field, double value) {
        if (!(value > 0 && Double.isFinite(value))) {
            throw new IllegalArgumentException(field + " must be positive and finite, was " + value);
        }
    }

    @Override
    public Optional<Instrument> find(Session actor, String name, String serialNumber) {
        JdbcUserService.requireText("name", name);
        JdbcUserService.requireText("serialNumber", serialNumber);
        return transactions.run("finding instrument " + name, tx -> {
            Guard.roles(tx, actor);
            return find(tx, name, serialNumber);
        });
    }

    private static Optional<Instrument> find(Tx tx, String name, String serialNumber) throws SQLException {
        return tx.queryOne(SELECT + " WHERE ins.name = ? AND ins.serial_number = ?",
                rs -> ModelRows.instrument(rs, new HashMap<>()), name, serialNumber);
    }

    @Override
    public List<Instrument> instruments(Session actor) {
        return transactions.run("listing the instruments", tx -> {
            Guard.roles(tx, actor);
            return new ArrayList<>(tx.queryList(SELECT + " ORDER BY ins.name, ins.serial_number, ins.id",
                    rs -> ModelRows.instrument(rs, new HashMap<>())));
        });
    }
}
