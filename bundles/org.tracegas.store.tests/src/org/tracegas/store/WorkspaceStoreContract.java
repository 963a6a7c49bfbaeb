package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.audit.VerificationReport;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Client;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.model.Role;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.User;
import org.tracegas.model.VersionKind;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * The behaviour every backend must show, run against a real database by each subclass. Each test gets
 * an empty database, an administrator, an analyst and one project of the analyst.
 */
abstract class WorkspaceStoreContract {

    private static final char[] ADMIN_PASSWORD = "admin-password-1".toCharArray();
    private static final char[] ANALYST_PASSWORD = "analyst-password-1".toCharArray();
    /** SHA-256 of "abc": FIPS 180-2, Appendix B.1. */
    private static final String SHA256_OF_ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";

    private TestBackend backend;
    private WorkspaceStore store;
    private Session admin;
    private Session analyst;
    private Project project;

    /** A backend on a fresh, empty database. */
    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void setUp() throws Exception {
        backend = newBackend();
        store = backend.open();
        admin = store.users().createFirstAdministrator("admin", "Workspace Administrator", ADMIN_PASSWORD);
        store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), ANALYST_PASSWORD);
        analyst = store.users().logIn("ana", ANALYST_PASSWORD);
        String client = store.projects().createClient(analyst, "Cement works").getId();
        project = store.projects().createProject(analyst, client, "CW-2026-01", "Kiln stack spring campaign");
    }

    @AfterEach
    void tearDown() throws Exception {
        try (TestBackend b = backend) {
            if (store != null) {
                store.close();
            }
        }
    }

    @Test
    void migrationFromEmptyAppliesTheSchemaOnceAndReopeningKeepsIt() throws Exception {
        assertEquals(List.of("1", "2", "3", "4", "5", "6", "20", "21", "22", "23", "24", "25"), column("SELECT \"version\" FROM \"schema_history\" WHERE \"success\" = TRUE"
                + " AND \"version\" IS NOT NULL ORDER BY \"installed_rank\""));
        store.close();
        store = backend.open();
        assertEquals(List.of("1", "2", "3", "4", "5", "6", "20", "21", "22", "23", "24", "25"), column("SELECT \"version\" FROM \"schema_history\" WHERE \"version\" IS NOT NULL"
                + " ORDER BY \"installed_rank\""));
        assertEquals("Kiln stack spring campaign", store.projects().project(analyst, project.getId()).getName());
    }

    @Test
    void spectrumRoundTripIsBitExactAndStoredAsLittleEndianBinary() throws Exception {
        // edge values of IEEE 754 binary64: negative zero, smallest subnormal, largest finite, a NaN payload
        double[] values = {0.125, -0.0, Double.MIN_VALUE, Double.MAX_VALUE, Math.PI, Math.ulp(1.0),
            Double.longBitsToDouble(0x7ff8_0000_0000_0123L), -1.0e-300};
        Spectrum uniform = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 4000.0, -0.482117, values.length),
                values, Ordinate.ABSORBANCE);
        Spectrum explicit = new Spectrum(SpectralAxis.of(AxisUnit.WAVENUMBER, 600.1, 600.35, 601.0, 602.5, 610.0,
                611.0, 650.0, 700.0), values, Ordinate.SINGLE_BEAM);

        for (Spectrum original : List.of(uniform, explicit)) {
            String id = store.spectra().store(analyst, project.getId(), SpectrumInput.of(SpectralContent.ABSORBANCE,
                    original));
            org.tracegas.model.ProcessedSpectrum back = store.spectra().load(analyst, id);
            assertEquals(original.axis(), back.getSpectrum().axis());
            assertEquals(original.ordinate(), back.getSpectrum().ordinate());
            assertArrayEquals(rawBits(original.toArray()), rawBits(back.getSpectrum().toArray()));
            assertArrayEquals(rawBits(original.axis().toArray()), rawBits(back.getSpectrum().axis().toArray()));

            byte[] blob = bytes("SELECT value_data FROM spectral_data WHERE id = ?", id);
            assertEquals(8 * values.length, blob.length);
            ByteBuffer le = ByteBuffer.wrap(blob).order(ByteOrder.LITTLE_ENDIAN);
            // 0.125 = 0x3FC0000000000000 (IEEE 754-2019, binary64): little-endian puts 0xC0, 0x3F last
            assertEquals(0x3FC0_0000_0000_0000L, le.getLong(0));
            assertEquals((byte) 0x3F, blob[7]);
        }
        assertEquals(List.of("1"), column("SELECT COUNT(*) FROM spectral_data WHERE axis_values IS NULL"));
    }

    @Test
    void float32EncodingRoundsEachValueToTheNearestFloat() {
        double[] values = {0.1, 1.0 / 3.0, 12345.678, -2.5e-7};
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 500, 1, values.length), values,
                Ordinate.ABSORBANCE);
        String id = store.spectra().store(analyst, project.getId(), new SpectrumInput(null, SpectralContent.ABSORBANCE,
                s, SampleEncoding.FLOAT32_LE));
        double[] back = store.spectra().load(analyst, id).getSpectrum().toArray();
        for (int i = 0; i < values.length; i++) {
            assertEquals((double) (float) values[i], back[i], 0.0, "value " + i);
        }
    }

    @Test
    void tenThousandSpectraAreStreamedWithoutHoldingThem() throws Exception {
        int count = 10_000;
        int points = 2048; // 16 KiB per spectrum, 160 MiB in all
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 600.0, 0.5, points);
        for (int batch = 0; batch < count / 1000; batch++) {
            List<SpectrumInput> inputs = new ArrayList<>();
            for (int i = 0; i < 1000; i++) {
                double[] v = new double[points];
                v[0] = batch * 1000 + i; // sequence number, to check the order
                v[points - 1] = -v[0];
                inputs.add(SpectrumInput.of(SpectralContent.ABSORBANCE, new Spectrum(axis, v, Ordinate.ABSORBANCE)));
            }
            store.spectra().storeAll(analyst, project.getId(), inputs);
        }

        long before = usedHeapAfterGc();
        long peak = 0;
        int seen = 0;
        try (Stream<org.tracegas.model.ProcessedSpectrum> stream = store.spectra().stream(analyst, project.getId())) {
            Iterator<org.tracegas.model.ProcessedSpectrum> it = stream.iterator();
            while (it.hasNext()) {
                Spectrum s = it.next().getSpectrum();
                assertEquals(seen, s.get(0), 0.0);
                assertEquals(-seen, s.get(points - 1), 0.0);
                seen++;
                if (seen % 2500 == 0) {
                    peak = Math.max(peak, usedHeapAfterGc() - before);
                }
            }
        }
        assertEquals(count, seen);
        // all rows at once would take 160 MiB; the cursor holds one fetch window of a few MiB
        assertTrue(peak < 40L << 20, "heap grew by " + (peak >> 20) + " MiB while streaming");
    }

    @Test
    void versionIsFrozenByUseAndAnEditMakesANewVersionWithParentAuthorReasonAndHash() {
        VersionService versions = store.versions();
        ContentVersion library = versions.create(analyst, VersionKind.LIBRARY, "Kiln gases", "abc", "first issue");
        assertEquals(SHA256_OF_ABC, library.getContentHash());
        ContentVersion v1 = versions.create(analyst, VersionKind.METHOD, "CO in flue gas",
                "compound=CO\nregion=2000-2200\nresidualLimit=0.01\n", "first issue");
        assertEquals(1, v1.getNumber());
        assertNull(v1.getParentId());
        assertFalse(v1.isFrozen());

        ContentVersion draft = versions.updateDraft(analyst, v1.getId(), v1.getRowVersion(),
                "compound=CO\nregion=2050-2200\nresidualLimit=0.01\n", "narrower region before first use");
        assertEquals(v1.getRowVersion() + 1, draft.getRowVersion());

        Result result = store.results().record(analyst, project.getId(), result(v1.getId(), library.getId()));
        assertTrue(versions.version(v1.getId()).isFrozen());
        assertTrue(versions.version(library.getId()).isFrozen());
        long frozenRow = versions.version(v1.getId()).getRowVersion();
        assertThrows(FrozenVersionException.class, () -> versions.updateDraft(analyst, v1.getId(), frozenRow,
                "compound=CO\n", "too late"));

        ContentVersion v2 = versions.revise(analyst, v1.getId(),
                "compound=CO\nregion=2050-2220\ninterferent=H2O\n", "wider region, water as interferent");
        assertEquals(2, v2.getNumber());
        assertEquals(v1.getId(), v2.getParentId());
        assertEquals(v1.getItemId(), v2.getItemId());
        assertEquals(analyst.userId(), v2.getAuthorId());
        assertEquals("wider region, water as interferent", v2.getReason());
        assertNotEquals(versions.version(v1.getId()).getContentHash(), v2.getContentHash());
        assertFalse(v2.isFrozen());

        VersionDiff diff = versions.diff(v1.getId(), v2.getId());
        assertEquals(new VersionDiff.Change("2050-2200", "2050-2220"), diff.changed().get("region"));
        assertEquals("H2O", diff.added().get("interferent"));
        assertEquals("0.01", diff.removed().get("residualLimit"));
        assertEquals(Set.of("region"), diff.changed().keySet());

        Result stored = store.results().results(analyst, project.getId()).get(0);
        assertEquals(result.getId(), stored.getId());
        assertEquals(v1.getId(), stored.getProvenance().methodVersionId());
        assertEquals(library.getId(), stored.getProvenance().libraryVersionId());
        assertEquals(List.of(ResultFlag.HIGH_RESIDUAL), stored.getFlags());
    }

    @Test
    void wrongPasswordsLockTheAccountAfterFiveFailures() throws Exception {
        char[] wrong = "not-the-password".toCharArray();
        for (int attempt = 1; attempt <= 4; attempt++) {
            LoginFailedException e = assertThrows(LoginFailedException.class, () -> store.users().logIn("ana", wrong));
            assertFalse(e.locked(), "attempt " + attempt);
        }
        // a success resets the count, so four more failures still do not lock
        store.users().logIn("ana", ANALYST_PASSWORD);
        for (int attempt = 1; attempt <= 4; attempt++) {
            assertFalse(assertThrows(LoginFailedException.class, () -> store.users().logIn("ana", wrong)).locked());
        }
        assertTrue(assertThrows(LoginFailedException.class, () -> store.users().logIn("ana", wrong)).locked());
        // locked: even the right password is refused
        assertTrue(assertThrows(LoginFailedException.class,
                () -> store.users().logIn("ana", ANALYST_PASSWORD)).locked());
        assertTrue(store.users().user(analyst.userId()).isLocked());
        assertThrows(AccessDeniedException.class, () -> store.projects().project(analyst, project.getId()));
        assertEquals(List.of("10"), column("SELECT COUNT(*) FROM audit_record WHERE action = 'REFUSED'"
                + " AND object_id = '" + analyst.userId() + "'"));

        store.users().unlock(admin, analyst.userId());
        assertEquals(analyst.userId(), store.users().logIn("ana", ANALYST_PASSWORD).userId());
        assertFalse(assertThrows(LoginFailedException.class, () -> store.users().logIn("nobody", wrong)).locked());
    }

    @Test
    void storedPasswordIsASaltedPbkdf2HashNotThePassword() throws Exception {
        List<String> rows = column("SELECT password_iterations FROM app_user ORDER BY login");
        assertEquals(2, rows.size());
        for (String iterations : rows) {
            assertTrue(Integer.parseInt(iterations) >= 210_000, iterations);
        }
        byte[] saltAdmin = bytes("SELECT password_salt FROM app_user WHERE login = ?", "admin");
        byte[] saltAna = bytes("SELECT password_salt FROM app_user WHERE login = ?", "ana");
        assertEquals(16, saltAdmin.length);
        assertFalse(java.util.Arrays.equals(saltAdmin, saltAna));
        assertEquals(32, bytes("SELECT password_hash FROM app_user WHERE login = ?", "ana").length);
    }

    @Test
    void usersWithoutAGrantAreRefusedAndReadGrantsDoNotAllowWriting() {
        store.users().createUser(admin, "rita", "Rita Viewer", Set.of(Role.REVIEWER), "reviewer-pass".toCharArray());
        Session reviewer = store.users().logIn("rita", "reviewer-pass".toCharArray());
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 1, 3), new double[] {1, 2, 3},
                Ordinate.ABSORBANCE);
        String id = store.spectra().store(analyst, project.getId(), SpectrumInput.of(SpectralContent.ABSORBANCE, s));

        AccessDeniedException denied = assertThrows(AccessDeniedException.class,
                () -> store.projects().project(reviewer, project.getId()));
        assertTrue(denied.getMessage().contains("rita") && denied.getMessage().contains("CW-2026-01"),
                denied.getMessage());
        assertThrows(AccessDeniedException.class, () -> store.spectra().load(reviewer, id));
        assertThrows(AccessDeniedException.class, () -> store.spectra().stream(reviewer, project.getId()));
        assertThrows(AccessDeniedException.class,
                () -> store.projects().grant(reviewer, project.getId(), reviewer.userId(), AccessLevel.WRITE));

        store.projects().grant(analyst, project.getId(), reviewer.userId(), AccessLevel.READ);
        assertEquals(project.getId(), store.projects().project(reviewer, project.getId()).getId());
        assertEquals(s, store.spectra().load(reviewer, id).getSpectrum());
        assertThrows(AccessDeniedException.class,
                () -> store.projects().rename(reviewer, project.getId(), project.getRowVersion(), "Renamed"));
        assertThrows(AccessDeniedException.class,
                () -> store.spectra().store(reviewer, project.getId(), SpectrumInput.of(SpectralContent.ABSORBANCE,
                        s)));
        assertThrows(AccessDeniedException.class, () -> store.users().createUser(analyst, "eve", "Eve",
                Set.of(Role.ADMINISTRATOR), "eve-password".toCharArray()));
    }

    @Test
    void staleWriterGetsConcurrentChangeAndNothingIsOverwritten() {
        Project seenByFirst = store.projects().project(analyst, project.getId());
        Project seenBySecond = store.projects().project(analyst, project.getId());
        Project renamed = store.projects().rename(analyst, project.getId(), seenByFirst.getRowVersion(), "First name");
        assertEquals(seenByFirst.getRowVersion() + 1, renamed.getRowVersion());

        ConcurrentChangeException e = assertThrows(ConcurrentChangeException.class,
                () -> store.projects().rename(analyst, project.getId(), seenBySecond.getRowVersion(), "Second name"));
        assertEquals("project", e.objectType());
        assertEquals(project.getId(), e.objectId());
        assertEquals(seenBySecond.getRowVersion(), e.expectedVersion());
        assertEquals(renamed.getRowVersion(), e.currentVersion());
        assertTrue(e.getMessage().contains(project.getId()) && e.getMessage().contains("version 0")
                && e.getMessage().contains("version is 1"), e.getMessage());
        assertEquals("First name", store.projects().project(analyst, project.getId()).getName());

        User user = store.users().user(analyst.userId());
        store.users().changeRoles(admin, user.getId(), user.getRowVersion(), Set.of(Role.ANALYST, Role.REVIEWER));
        assertThrows(ConcurrentChangeException.class,
                () -> store.users().changeRoles(admin, user.getId(), user.getRowVersion(), Set.of(Role.QUALITY_MANAGER)));
        assertEquals(List.of(Role.ANALYST, Role.REVIEWER), store.users().user(analyst.userId()).getRoles());
    }

    @Test
    void aUserIsReadBackAsTheModelObjectItWasCreatedAsWithoutCredentials() {
        User created = store.users().createUser(admin, "rev", "Dr. Rhea Viewer", Set.of(Role.REVIEWER, Role.ANALYST),
                "reviewer-password-1".toCharArray());
        assertEquals(List.of(Role.ANALYST, Role.REVIEWER), created.getRoles(), "roles in declaration order");
        assertFalse(created.isLocked());
        User read = store.users().user(created.getId());
        assertTrue(EcoreUtil.equals(created, read), "the read user is the created one, field by field");
        assertTrue(EcoreUtil.equals(created, store.users().findByLogin("rev").orElseThrow()));
        // the password hash, its salt and the failure count stay in the store (common practice, no source)
        assertEquals(Set.of("id", "rowVersion", "login", "displayName", "roles", "locked"),
                read.eClass().getEAllStructuralFeatures().stream().map(f -> f.getName())
                        .collect(java.util.stream.Collectors.toSet()));
    }

    @Test
    void failedBatchRollsBackSpectraAndTheirAuditRecords() throws Exception {
        String measurement = store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.SAMPLE,
                Instant.parse("2026-04-01T08:00:00Z"), 453.15, 1013.0);
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 1, 2), new double[] {1, 2},
                Ordinate.ABSORBANCE);
        SpectrumInput good = new SpectrumInput(measurement, SpectralContent.ABSORBANCE, s, SampleEncoding.FLOAT64_LE);
        // the third names a measurement that does not exist: the database refuses it after two rows and two
        // audit records were written in the same transaction
        SpectrumInput bad = new SpectrumInput("no-such-measurement", SpectralContent.ABSORBANCE, s,
                SampleEncoding.FLOAT64_LE);

        assertThrows(StoreException.class, () -> store.spectra().storeAll(analyst, project.getId(),
                List.of(good, good, bad)));
        assertEquals(List.of("0"), column("SELECT COUNT(*) FROM spectral_data"));
        assertEquals(List.of("0"), column("SELECT COUNT(*) FROM audit_record WHERE object_type = 'spectral-data'"));

        List<String> ids = store.spectra().storeAll(analyst, project.getId(), List.of(good, good));
        assertEquals(List.of("2"), column("SELECT COUNT(*) FROM spectral_data"));
        assertEquals(ids.stream().sorted().toList(), column("SELECT object_id FROM audit_record"
                + " WHERE object_type = 'spectral-data' ORDER BY object_id"));
    }

    @Test
    void everyChangeWritesItsAuditRecordWithOldAndNewValues() throws Exception {
        Project renamed = store.projects().rename(analyst, project.getId(), project.getRowVersion(), "Kiln stack");
        try (Connection c = backend.raw(); PreparedStatement ps = c.prepareStatement(
                "SELECT user_id, action, object_version, old_value, new_value FROM audit_record"
                        + " WHERE object_type = 'project' AND object_id = ? ORDER BY seq")) {
            ps.setString(1, project.getId());
            try (ResultSet rs = ps.executeQuery()) {
                assertTrue(rs.next());
                assertEquals("CREATE", rs.getString("action"));
                assertTrue(rs.next());
                assertEquals(analyst.userId(), rs.getString("user_id"));
                assertEquals("CHANGE", rs.getString("action"));
                assertEquals(renamed.getRowVersion(), rs.getLong("object_version"));
                assertTrue(rs.getString("old_value").contains("name=Kiln stack spring campaign\n"));
                assertTrue(rs.getString("new_value").contains("name=Kiln stack\n"));
                assertFalse(rs.next());
            }
        }
        // a refused change leaves no record
        assertThrows(ConcurrentChangeException.class,
                () -> store.projects().rename(analyst, project.getId(), project.getRowVersion(), "Stale"));
        assertEquals(List.of("3"), column("SELECT COUNT(*) FROM audit_record WHERE object_id = '" + project.getId()
                + "' OR object_id LIKE '" + project.getId() + "/%'"));
    }

    @Test
    void lookUpsFindProjectsMeasurementsAndNewestVersions() {
        assertTrue(store.users().hasUsers());
        Project found = store.projects().findByCode(analyst, "CW-2026-01").orElseThrow();
        assertEquals(List.of(project.getId(), project.getCode(), project.getName(), project.getClient().getId()),
                List.of(found.getId(), found.getCode(), found.getName(), found.getClient().getId()));
        assertTrue(store.projects().findByCode(analyst, "NO-SUCH-CODE").isEmpty());

        Instant later = Instant.parse("2026-04-01T09:00:00Z");
        Instant earlier = Instant.parse("2026-04-01T08:00:00Z");
        String second = store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.SAMPLE, later,
                453.15, 1013.0);
        String first = store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.BACKGROUND,
                earlier, 453.0, 1012.5);
        List<Measurement> measurements = store.projects().measurements(analyst, project.getId());
        assertEquals(List.of(first, second), measurements.stream().map(Measurement::getId).toList());
        Measurement m = measurements.get(0);
        assertEquals(List.of(first, project.getId(), MeasurementKind.BACKGROUND, earlier, 453.0, 1012.5,
                analyst.userId()), List.of(m.getId(), m.getProject().getId(), m.getKind(), m.getTime(),
                        m.getCellTemperature(), m.getCellPressure(), m.getOperatorId()));
        assertSame(m.getProject(), measurements.get(1).getProject(), "the measurements are in one project");
        assertFalse(m.isSetContent(), "a measurement not imported from a file has no values of its own");

        ContentVersion v1 = store.versions().create(analyst, VersionKind.METHOD, "SO2", "compound=SO2\n", "first");
        ContentVersion v2 = store.versions().revise(analyst, v1.getId(), "compound=SO2\nregion=1100-1200\n", "region");
        assertEquals(v2.getId(), store.versions().latest(VersionKind.METHOD, "SO2").orElseThrow().getId());
        assertTrue(store.versions().latest(VersionKind.LIBRARY, "SO2").isEmpty());

        ContentVersion co = store.versions().create(analyst, VersionKind.METHOD, "CO", "compound=CO\n", "first");
        ContentVersion kiln = store.versions().create(analyst, VersionKind.LIBRARY, "Kiln", "CO=1\n", "first");
        // names in order, each with its newest version only: SO2 has versions 1 and 2
        assertEquals(List.of(co.getId(), v2.getId()),
                store.versions().latest(VersionKind.METHOD).stream().map(ContentVersion::getId).toList());
        List<ContentVersion> libraries = store.versions().latest(VersionKind.LIBRARY);
        assertEquals(1, libraries.size());
        assertTrue(EcoreUtil.equals(kiln, libraries.get(0)), "the listed version is the created one, field by field");
        assertThrows(IllegalArgumentException.class, () -> store.versions().latest(null));
    }

    @Test
    void projectAndClientListingsShowOnlyWhatTheActorMayReadOrderedByCodeAndName() {
        String glass = store.projects().createClient(admin, "Float glass plant").getId();
        Project furnace = store.projects().createProject(admin, glass, "AB-2026-07", "Furnace flue");
        Project hidden = store.projects().createProject(admin, glass, "ZZ-2026-01", "Not granted to ana");
        Project secondCement = store.projects().createProject(analyst, project.getClient().getId(), "CW-2025-11",
                "Kiln stack autumn campaign");

        // ana created the two CW projects and holds no grant on the glass plant's projects yet
        List<Project> readable = store.projects().projects(analyst);
        assertEquals(List.of(secondCement.getId(), project.getId()), readable.stream().map(Project::getId).toList());
        assertSame(readable.get(0).getClient(), readable.get(1).getClient(), "one client object per client");
        List<Client> clients = store.projects().clients(analyst);
        assertEquals(List.of(project.getClient().getId()), clients.stream().map(Client::getId).toList());
        assertEquals("Cement works", clients.get(0).getName());
        assertEquals(List.of("CW-2025-11", "CW-2026-01"),
                clients.get(0).getProjects().stream().map(Project::getCode).toList());

        store.projects().grant(admin, furnace.getId(), analyst.userId(), AccessLevel.READ);
        assertEquals(List.of("AB-2026-07", "CW-2025-11", "CW-2026-01"),
                store.projects().projects(analyst).stream().map(Project::getCode).toList());
        assertEquals(List.of("Cement works", "Float glass plant"),
                store.projects().clients(analyst).stream().map(Client::getName).toList());
        assertEquals(List.of(furnace.getId(), hidden.getId()),
                store.projects().projects(admin).stream().map(Project::getId).toList());
        assertEquals(List.of("AB-2026-07"), store.projects().clients(analyst).get(1).getProjects().stream()
                .map(Project::getCode).toList(), "a client holds only the projects the actor may read");

        store.users().createUser(admin, "nell", "Nell Newcomer", Set.of(Role.REVIEWER), "newcomer-pass".toCharArray());
        Session newcomer = store.users().logIn("nell", "newcomer-pass".toCharArray());
        assertTrue(store.projects().projects(newcomer).isEmpty());
        assertTrue(store.projects().clients(newcomer).isEmpty());
        assertThrows(IllegalArgumentException.class, () -> store.projects().projects(null));
        Session stranger = new Session("no-such-user", "ghost", Set.of(Role.ADMINISTRATOR));
        assertThrows(AccessDeniedException.class, () -> store.projects().clients(stranger));
    }

    @Test
    void batchOfResultsIsRecordedWhollyOrNotAtAll() throws Exception {
        ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "CO", "compound=CO\n", "first");
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, "Kiln", "CO=1\n", "first");
        Result good = result(method.getId(), library.getId());
        Result wrongKind = result(library.getId(), library.getId()); // a library version given as method version

        assertThrows(IllegalArgumentException.class,
                () -> store.results().recordAll(analyst, project.getId(), List.of(good, wrongKind)));
        assertTrue(store.results().results(analyst, project.getId()).isEmpty());
        assertFalse(store.versions().version(method.getId()).isFrozen(), "the rolled-back batch froze nothing");
        assertEquals(List.of("0"), column("SELECT COUNT(*) FROM audit_record WHERE object_type = 'result'"));

        List<Result> stored = store.results().recordAll(analyst, project.getId(), List.of(good, good));
        assertEquals(2, stored.size());
        assertEquals(List.of("2"), column("SELECT COUNT(*) FROM audit_record WHERE object_type = 'result'"));
        assertTrue(store.versions().version(method.getId()).isFrozen());
    }

    @Test
    void incompleteResultsAreRefusedWithTheFieldNamedAndNothingIsStored() throws Exception {
        ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "CO", "compound=CO\n", "first");
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, "Kiln", "CO=1\n", "first");
        Result blankCompound = result(method.getId(), library.getId());
        blankCompound.setCompound(" ");
        Result noUnit = result(method.getId(), library.getId());
        noUnit.setUnit(null);
        Result noProvenance = result(method.getId(), library.getId());
        noProvenance.setProvenance(null);

        assertEquals("compound must not be blank", assertThrows(IllegalArgumentException.class,
                () -> store.results().record(analyst, project.getId(), blankCompound)).getMessage());
        assertEquals("unit must not be blank", assertThrows(IllegalArgumentException.class,
                () -> store.results().record(analyst, project.getId(), noUnit)).getMessage());
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> store.results().record(analyst, project.getId(), noProvenance)).getMessage()
                .startsWith("provenance must not be null"));
        assertEquals("results[1].compound must not be blank", assertThrows(IllegalArgumentException.class,
                () -> store.results().recordAll(analyst, project.getId(),
                        List.of(result(method.getId(), library.getId()), blankCompound))).getMessage());
        // the provenance is one value, refused when it is made: a version, the software or the input hash missing
        assertEquals("methodVersionId must not be blank", assertThrows(IllegalArgumentException.class,
                () -> new Provenance("", library.getId(), "0.1.0", "ab".repeat(32))).getMessage());
        assertEquals("softwareVersion must not be blank", assertThrows(IllegalArgumentException.class,
                () -> new Provenance(method.getId(), library.getId(), null, "ab".repeat(32))).getMessage());
        assertEquals("inputHash must be 64 lower-case hex digits (SHA-256), was " + "AB".repeat(32),
                assertThrows(IllegalArgumentException.class,
                        () -> new Provenance(method.getId(), library.getId(), "0.1.0", "AB".repeat(32))).getMessage());

        assertTrue(store.results().results(analyst, project.getId()).isEmpty());
        assertEquals(List.of("0"), column("SELECT COUNT(*) FROM analysis_result"));
        assertEquals(List.of("0"), column("SELECT COUNT(*) FROM audit_record WHERE object_type = 'result'"));
        assertFalse(store.versions().version(method.getId()).isFrozen(), "a refused result froze nothing");
        assertFalse(store.versions().version(library.getId()).isFrozen(), "a refused result froze nothing");
    }

    @Test
    void recordingLeavesTheGivenResultAsItWasAndReadsBackEveryValue() {
        ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "CO", "compound=CO\n", "first");
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, "Kiln", "CO=1\n", "first");
        Result given = result(method.getId(), library.getId());

        Result recorded = store.results().record(analyst, project.getId(), given);

        assertNull(given.getId(), "the store records a copy");
        assertNull(given.getRecordedBy());
        Result read = store.results().results(analyst, project.getId()).get(0);
        for (Result r : List.of(recorded, read)) {
            assertEquals(project.getId(), r.getProjectId());
            assertEquals(analyst.userId(), r.getRecordedBy());
            assertEquals("CO", r.getCompound());
            assertEquals(12.5, r.getConcentration());
            assertEquals(0.8, r.getStandardUncertainty());
            assertEquals(0.3, r.getDetectionLimit());
            assertEquals("ppm", r.getUnit());
            assertEquals(given.getProvenance(), r.getProvenance());
            assertNull(r.getConditions());
        }
        assertEquals(recorded.getId(), read.getId());
        assertEquals(recorded.getRecorded(), read.getRecorded());
    }

    @Test
    void auditTrailOfTheStoreVerifiesIntact() {
        store.projects().rename(analyst, project.getId(), project.getRowVersion(), "Kiln stack");
        VerificationReport report = store.verifyAuditTrail();
        assertTrue(report.intact(), report.toString());
        // first administrator, analyst, log-in, client, project, grant, rename
        assertEquals(7, report.recordsChecked());
    }

    private static Result result(String methodVersionId, String libraryVersionId) {
        return Results.of(null, "CO", 12.5, 0.8, 0.3, "ppm", Set.of(ResultFlag.HIGH_RESIDUAL),
                new Provenance(methodVersionId, libraryVersionId, "0.1.0",
                        "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855"),
                null);
    }

    private static long[] rawBits(double[] values) {
        long[] bits = new long[values.length];
        for (int i = 0; i < values.length; i++) {
            bits[i] = Double.doubleToRawLongBits(values[i]);
        }
        return bits;
    }

    private static long usedHeapAfterGc() {
        System.gc();
        return ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
    }

    private List<String> column(String sql) throws SQLException {
        try (Connection c = backend.raw(); PreparedStatement ps = c.prepareStatement(sql);
                ResultSet rs = ps.executeQuery()) {
            List<String> values = new ArrayList<>();
            while (rs.next()) {
                values.add(rs.getString(1));
            }
            return values;
        }
    }

    private byte[] bytes(String sql, String param) throws SQLException {
        try (Connection c = backend.raw(); PreparedStatement ps = c.prepareStatement(sql)) {
            ps.setString(1, param);
            try (ResultSet rs = ps.executeQuery()) {
                assertTrue(rs.next(), sql);
                return rs.getBytes(1);
            }
        }
    }
}
