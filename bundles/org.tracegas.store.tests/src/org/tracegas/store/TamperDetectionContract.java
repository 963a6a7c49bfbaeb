package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Savepoint;
import java.sql.Statement;
import java.sql.Types;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import java.util.UUID;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.audit.ChainAnchor;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.QaOutcomes;
import org.tracegas.model.Result;
import org.tracegas.store.internal.DataVerifier;

/**
 * Changes made to stored data outside the store's services, as someone with the database's own shell would
 * make them (foreign keys and triggers off where the database lets an owner do so), are found and named. A
 * small workspace is seeded through the services; then, many times over, one random tampering (change one
 * value, delete a row, insert a copy under a new id, swap one value between two rows) is made in an open
 * transaction on every data table, the workspace verified inside that transaction, and the transaction rolled
 * back. Every tampering must be reported with exactly the rows it touched, and no other row.
 *
 * <p>The test knows the tables from the schema, not from the store's binding code: it tampers with every
 * column except the bookkeeping columns listed in {@link #UNBOUND}.
 */
abstract class TamperDetectionContract {

    /** Tamperings of each kind per run; {@code -Dtracegas.test.tamper.rounds} changes it. */
    static final int ROUNDS = Integer.getInteger("tracegas.test.tamper.rounds", 1000);

    /** Data table to (kind name as findings give it, key columns). */
    static final Map<String, String[]> TABLES = new LinkedHashMap<>();
    static {
        TABLES.put("app_user", new String[] {"user", "id"});
        TABLES.put("client", new String[] {"client", "id"});
        TABLES.put("project", new String[] {"project", "id"});
        TABLES.put("project_grant", new String[] {"project-grant", "project_id", "user_id"});
        TABLES.put("measurement", new String[] {"measurement", "id"});
        TABLES.put("spectral_data", new String[] {"spectral-data", "id"});
        TABLES.put("versioned_item", new String[] {"versioned-item", "id"});
        TABLES.put("content_version", new String[] {"content-version", "id"});
        TABLES.put("analysis_result", new String[] {"result", "id"});
        TABLES.put("qa_check", new String[] {"qa-check", "id"});
        TABLES.put("site", new String[] {"site", "id"});
        TABLES.put("emission_source", new String[] {"emission-source", "id"});
        TABLES.put("instrument", new String[] {"instrument", "id"});
        TABLES.put("project_source", new String[] {"project-source", "project_id"});
        TABLES.put("measurement_instrument", new String[] {"measurement-instrument", "measurement_id"});
        TABLES.put("report", new String[] {"report-issue", "id"});
    }

    /** Columns that change without a change of data (locking, storage position, log-in counter, use mark). */
    static final Set<String> UNBOUND = Set.of("row_version", "seq@spectral_data", "failed_logins", "frozen");
    /** Text columns with a unique or check constraint that a copied row must not repeat. */
    static final Set<String> UNIQUE_TEXT = Set.of("login", "name", "code");

    /** Values of columns a check constraint limits to a list, each with another allowed value. */
    static final Map<String, String> CHECKED_ALTERNATIVES = Map.of("READ", "WRITE", "WRITE", "READ", "METHOD",
            "LIBRARY", "LIBRARY", "METHOD");

    enum Tampering {
        CHANGE, DELETE, INSERT, SWAP
    }

    private TestBackend backend;
    private AnalysisFixture fixture;
    private final Random random = new Random(20260317L);

    abstract TestBackend newBackend() throws Exception;

    /** A connection of the database's owner, with referential checks off for this session or database. */
    abstract Connection tamperingConnection() throws SQLException;

    @BeforeEach
    void seed() throws Exception {
        backend = newBackend();
        fixture = new AnalysisFixture(backend);
        WorkspaceStore store = fixture.store;
        String m = store.projects().recordMeasurement(fixture.analyst, fixture.project.getId(), MeasurementKind.SAMPLE,
                SampleBlocks.START, 438.15, 1013.0);
        store.spectra().store(fixture.analyst, fixture.project.getId(), new SpectrumInput(m,
                org.tracegas.model.SpectralContent.ABSORBANCE, SampleBlocks.processed(0, 0, fixture.method.getId(),
                        fixture.library.getId()).absorbance(), SampleEncoding.FLOAT32_LE));
        Result result = SampleBlocks.processed(0, 1, fixture.method.getId(), fixture.library.getId()).results().get(0);
        result.setMeasurementId(m);
        store.results().record(fixture.analyst, fixture.project.getId(), result);
        // a second client and project, so that every table holds two rows to swap values between
        org.tracegas.model.Project second = store.projects().createProject(fixture.analyst,
                store.projects().createClient(fixture.analyst, "Second client").getId(), "WU-2", "Kiln campaign");
        String analyzer = placeAndInstrument(store, fixture.project, "Works", "Stack", "TB-0007", 6.4);
        String kilnAnalyzer = placeAndInstrument(store, second, "Kiln works", "Kiln stack", "TB-0008", 10.0);
        // measurements linked to their instrument in the block's write, two instruments to swap between
        store.blocks().store(fixture.analyst, fixture.project.getId(), SampleBlocks.madeBy(analyzer,
                SampleBlocks.block(1, 2, 3, fixture.method.getId(), fixture.library.getId())));
        store.blocks().store(fixture.analyst, fixture.project.getId(), SampleBlocks.madeBy(kilnAnalyzer,
                SampleBlocks.block(3, 1, 3, fixture.method.getId(), fixture.library.getId())));
        store.qa().recordAll(fixture.analyst, fixture.project.getId(), fixture.method.getId(), List.of(
                QaOutcomes.of("Spike recovery SO2", true, 96.5, "%", 70, 130, "70 .. 130 %",
                        "EPA Method 320, section 9.2"),
                QaOutcomes.of("Noise level", true, 0.0012, "absorbance", Double.NEGATIVE_INFINITY, 0.002,
                        "RMS <= 0.002", "common practice, no source")));
        for (int pages : new int[] {0, 9}) { // one issue of unknown page count, one of nine pages
            org.tracegas.model.Report r = org.tracegas.model.WorkspaceFactory.eINSTANCE.createReport();
            r.setReportId("WU-1-R" + pages);
            r.setTitle("Client, stack campaign");
            // SHA-256 of "abc": FIPS 180-2, appendix B.1
            r.setContentSha256("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
            r.setFileName("report.pdf");
            if (pages > 0) {
                r.setPageCount(pages);
            }
            r.setMethodVersionId(fixture.method.getId());
            r.setLibraryVersionId(fixture.library.getId());
            store.reports().record(fixture.analyst, fixture.project.getId(), r);
        }
        store.users().changeRoles(admin(), fixture.reader.userId(), 0,
                Set.of(org.tracegas.model.Role.ANALYST, org.tracegas.model.Role.REVIEWER));
    }

    /** A site with a source the project measures, and an instrument: its id. */
    private String placeAndInstrument(WorkspaceStore store, org.tracegas.model.Project project, String site,
            String source, String serial, double cellPathM) {
        String siteId = store.sites().createSite(fixture.analyst, project.getClient().getId(), site, "").getId();
        store.sites().setSource(fixture.analyst, project.getId(), store.sites().createSource(fixture.analyst, siteId,
                source, "port " + serial).getId());
        org.tracegas.model.Instrument i = org.tracegas.model.WorkspaceFactory.eINSTANCE.createInstrument();
        i.setName("Analyzer");
        i.setSerialNumber(serial);
        i.setLaserWavenumber(15798.0);
        i.setMaxPathDifference(cellPathM / 6.4);
        i.setFieldOfView(cellPathM * 2);
        i.setCellPathLength(cellPathM);
        return store.instruments().record(fixture.analyst, i).getId();
    }

    private Session admin() {
        return fixture.store.users().logIn("admin", "admin-pw-12".toCharArray());
    }

    @AfterEach
    void tearDown() throws Exception {
        fixture.close();
    }

    @Test
    void theSeededWorkspaceVerifiesIntactWithEveryTableBound() throws Exception {
        WorkspaceVerification v = fixture.store.audit().verifyWorkspace(List.of());
        assertTrue(v.intact(), v.dataFindings().toString());
        long rows = 0;
        for (String table : TABLES.keySet()) {
            long n = fixture.count("SELECT COUNT(*) FROM " + table);
            assertTrue(n > 0, "seed leaves table " + table + " empty");
            rows += n;
        }
        assertEquals(rows, v.rowsChecked());
    }

    @Test
    void everyRandomTamperingIsFoundAndNamedAndNoUntouchedRowIsReported() throws Exception {
        Map<Tampering, Integer> done = new LinkedHashMap<>();
        Map<String, Integer> perTable = new LinkedHashMap<>();
        try (Connection c = tamperingConnection()) {
            c.setAutoCommit(false);
            List<String> tables = new ArrayList<>(TABLES.keySet());
            for (Tampering t : Tampering.values()) {
                int n = 0;
                int draws = 0;
                while (n < ROUNDS) {
                    if (++draws > 20 * ROUNDS) {
                        throw new AssertionError(t + ": too many draws that could not be made: " + perTable);
                    }
                    String table = tables.get(random.nextInt(tables.size()));
                    Set<String> expected = tamper(c, t, table);
                    if (expected == null) {
                        c.rollback();
                        continue; // not possible on this draw (e.g. a swap of equal values): draw again
                    }
                    WorkspaceVerification v = DataVerifier.verify(c, List.of());
                    Set<String> found = new TreeSet<>();
                    for (DataFinding f : v.dataFindings()) {
                        found.add(f.kind() + " " + f.dataKind() + " " + f.rowKey());
                    }
                    c.rollback();
                    assertEquals(expected, found, t + " on " + table + ": findings " + v.dataFindings());
                    assertTrue(v.chain().intact(), t + " on " + table + ": the untouched chain reported "
                            + v.chain().findings());
                    n++;
                    perTable.merge(t + "/" + table, 1, Integer::sum);
                }
                done.put(t, n);
                for (String table : tables) {
                    assertTrue(perTable.containsKey(t + "/" + table), t + " never made on " + table);
                }
            }
        }
        System.out.println(getClass().getSimpleName() + ": tamperings detected and named " + done + " "
                + perTable);
        assertTrue(fixture.store.audit().verifyWorkspace(List.of()).intact(), "rolled back: intact again");
    }

    @Test
    void aConsistentRewriteOfDataAndBindingsIsCaughtByTheAnchorKeptOutside() throws Exception {
        WorkspaceVerification before = fixture.store.audit().verifyWorkspace(List.of());
        ChainAnchor printed = before.head();
        try (Connection c = tamperingConnection()) {
            c.setAutoCommit(false);
            // halve one result and make everything consistent again: a fresh chain from genesis whose records
            // vouch for the changed rows (the way a forger with full database access would)
            try (Statement s = c.createStatement()) {
                s.executeUpdate("UPDATE analysis_result SET concentration = concentration / 2");
            }
            org.tracegas.store.internal.Forger.rewrite(c);
            WorkspaceVerification without = DataVerifier.verify(c, List.of());
            assertTrue(without.intact(), "a consistent rewrite passes without anchors: " + without.dataFindings()
                    + without.chain().findings());
            WorkspaceVerification with = DataVerifier.verify(c, List.of(printed));
            assertTrue(!with.intact() && !with.chain().findings().isEmpty(), "the printed anchor reveals it");
        }
    }

    /** Makes one tampering; returns the findings expected ("KIND kind key"), or null when not possible. */
    private Set<String> tamper(Connection c, Tampering t, String table) throws SQLException {
        String[] info = TABLES.get(table);
        String kind = info[0];
        List<Map<String, Object>> rows = rows(c, table);
        if (rows.isEmpty() || t == Tampering.SWAP && rows.size() < 2) {
            return null;
        }
        Map<String, Object> row = rows.get(random.nextInt(rows.size()));
        String key = key(info, row);
        Savepoint sp = c.setSavepoint();
        try {
            switch (t) {
                case CHANGE -> {
                    String col = pick(table, info, row);
                    set(c, table, info, row, col, changed(row.get(col), col, c));
                    return Set.of("CHANGED " + kind + " " + key);
                }
                case DELETE -> {
                    try (PreparedStatement ps = c.prepareStatement("DELETE FROM " + table + where(info))) {
                        bindKey(ps, info, row, 1);
                        ps.executeUpdate();
                    }
                    return Set.of("DELETED " + kind + " " + key);
                }
                case INSERT -> {
                    Map<String, Object> copy = new LinkedHashMap<>(row);
                    String newId = UUID.randomUUID().toString();
                    copy.put(info[info.length - 1], newId);
                    for (String col : UNIQUE_TEXT) {
                        if (copy.get(col) instanceof String s) {
                            copy.put(col, s + "~" + random.nextInt(1_000_000));
                        }
                    }
                    if (copy.containsKey("number")) {
                        copy.put("number", ((Number) copy.get("number")).intValue() + 1000 + random.nextInt(1000));
                    }
                    if (table.equals("spectral_data")) {
                        copy.remove("seq");
                    }
                    insert(c, table, copy);
                    return Set.of("INSERTED " + kind + " " + key(info, copy));
                }
                case SWAP -> {
                    Map<String, Object> other = rows.get(random.nextInt(rows.size()));
                    String col = pick(table, info, row);
                    if (other == row || java.util.Objects.deepEquals(row.get(col), other.get(col))) {
                        c.rollback(sp);
                        return null;
                    }
                    // through a third value, so that a unique column never holds one value twice
                    set(c, table, info, row, col, changed(row.get(col), col, c));
                    set(c, table, info, other, col, row.get(col));
                    set(c, table, info, row, col, other.get(col));
                    return new TreeSet<>(Set.of("CHANGED " + kind + " " + key, "CHANGED " + kind + " "
                            + key(info, other)));
                }
                default -> throw new IllegalStateException();
            }
        } catch (SQLException e) {
            // a unique or check constraint the database keeps even for its owner: draw again
            c.rollback(sp);
            return null;
        }
    }

    private String pick(String table, String[] info, Map<String, Object> row) {
        List<String> cols = new ArrayList<>();
        for (String col : row.keySet()) {
            boolean isKey = false;
            for (int i = 1; i < info.length; i++) {
                isKey |= info[i].equals(col);
            }
            if (!isKey && !UNBOUND.contains(col) && !UNBOUND.contains(col + "@" + table)) {
                cols.add(col);
            }
        }
        return cols.get(random.nextInt(cols.size()));
    }

    /** A different value of the same type: numbers halved (or moved when 0), text and bytes altered, time moved. */
    private Object changed(Object v, String col, Connection c) {
        if (v == null) {
            return col.endsWith("_values") ? new byte[] {1, 2, 3} : "x";
        }
        if (v instanceof Double d) {
            return d == 0 || d.isInfinite() ? 1.0 : d / 2;
        }
        if (v instanceof Number n) {
            return n.longValue() + 1;
        }
        if (v instanceof Boolean b) {
            return !b;
        }
        if (v instanceof byte[] b) {
            byte[] copy = b.clone();
            copy[random.nextInt(copy.length)] ^= 1;
            return copy;
        }
        if (v instanceof java.time.OffsetDateTime t) {
            return t.plusSeconds(1);
        }
        String s = (String) v;
        String other = CHECKED_ALTERNATIVES.get(s);
        if (other != null) {
            return other;
        }
        // a hash (64) or an id (36) fills its column: its last character changes instead
        int n = s.length();
        return n == 64 || n == 36 ? s.substring(0, n - 1) + (s.charAt(n - 1) == '0' ? '1' : '0') : s + "~";
    }

    private static List<Map<String, Object>> rows(Connection c, String table) throws SQLException {
        List<Map<String, Object>> rows = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT * FROM " + table)) {
            ResultSetMetaData md = rs.getMetaData();
            while (rs.next()) {
                Map<String, Object> row = new LinkedHashMap<>();
                for (int i = 1; i <= md.getColumnCount(); i++) {
                    String name = md.getColumnLabel(i).toLowerCase(java.util.Locale.ROOT);
                    int type = md.getColumnType(i);
                    Object v = type == Types.TIMESTAMP_WITH_TIMEZONE || type == Types.TIMESTAMP
                            ? rs.getObject(i, java.time.OffsetDateTime.class)
                            : type == Types.DOUBLE || type == Types.FLOAT ? (Object) rs.getDouble(i)
                                    : type == Types.BINARY || type == Types.VARBINARY || type == Types.LONGVARBINARY
                                            ? rs.getBytes(i) : rs.getObject(i);
                    row.put(name, rs.wasNull() ? null : v);
                }
                rows.add(row);
            }
        }
        return rows;
    }

    private static String key(String[] info, Map<String, Object> row) {
        StringBuilder k = new StringBuilder();
        for (int i = 1; i < info.length; i++) {
            k.append(i > 1 ? "/" : "").append(row.get(info[i]));
        }
        return k.toString();
    }

    private static String where(String[] info) {
        List<String> w = new ArrayList<>();
        for (int i = 1; i < info.length; i++) {
            w.add(info[i] + " = ?");
        }
        return " WHERE " + String.join(" AND ", w);
    }

    private static void bindKey(PreparedStatement ps, String[] info, Map<String, Object> row, int first)
            throws SQLException {
        for (int i = 1; i < info.length; i++) {
            ps.setObject(first + i - 1, row.get(info[i]));
        }
    }

    private static void set(Connection c, String table, String[] info, Map<String, Object> row, String col,
            Object value) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE " + table + " SET " + col + " = ?" + where(info))) {
            ps.setObject(1, value);
            bindKey(ps, info, row, 2);
            assertEquals(1, ps.executeUpdate());
        }
    }

    private static void insert(Connection c, String table, Map<String, Object> row) throws SQLException {
        String cols = String.join(", ", row.keySet());
        String marks = String.join(", ", java.util.Collections.nCopies(row.size(), "?"));
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO " + table + " (" + cols + ") VALUES (" + marks
                + ")")) {
            int i = 1;
            for (Object v : row.values()) {
                ps.setObject(i++, v);
            }
            ps.executeUpdate();
        }
    }
}
