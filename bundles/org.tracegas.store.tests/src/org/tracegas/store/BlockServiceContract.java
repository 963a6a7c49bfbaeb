package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspaceFactory;

/** Blocks of processed spectra, each in one transaction, on each backend. */
abstract class BlockServiceContract extends AnalysisFixtureContract {

    private static final String COUNT_ROWS = "SELECT (SELECT COUNT(*) FROM measurement) + (SELECT COUNT(*) FROM"
            + " spectral_data) + (SELECT COUNT(*) FROM analysis_result) + (SELECT COUNT(*) FROM audit_record)";


    @Test
    void blockStoresEachMeasurementWithItsSpectrumAndResultsUnderOneAuditRecord() throws Exception {
        List<ProcessedSpectrum> block = new ArrayList<>(SampleBlocks.block(0, 3, 4, f.method.getId(),
                f.library.getId()));
        block.add(SampleBlocks.processed(3, 0, f.method.getId(), f.library.getId())); // nothing fitted: no results
        long auditBefore = f.count("SELECT COUNT(*) FROM audit_record");

        List<StoredMeasurement> stored = f.store.blocks().store(f.analyst, f.project.getId(), block);

        assertEquals(4, stored.size());
        assertEquals(List.of(4, 4, 4, 0), stored.stream().map(s -> s.resultIds().size()).toList());
        assertEquals(4, f.count("SELECT COUNT(*) FROM audit_record") - auditBefore, "one audit record per measurement");
        List<Measurement> measurements = f.store.projects().measurements(f.analyst, f.project.getId());
        assertEquals(stored.stream().map(StoredMeasurement::measurementId).toList(),
                measurements.stream().map(Measurement::getId).toList());
        List<Result> results = f.store.results().results(f.analyst, f.project.getId());
        assertEquals(12, results.size());
        for (int i = 0; i < block.size(); i++) {
            ProcessedSpectrum in = block.get(i);
            StoredMeasurement out = stored.get(i);
            assertEquals(in.time(), measurements.get(i).getTime());
            assertEquals(f.analyst.userId(), measurements.get(i).getOperatorId());
            org.tracegas.model.ProcessedSpectrum spectrum = f.store.spectra().load(f.analyst, out.spectrumId());
            assertEquals(out.measurementId(), spectrum.getMeasurementId());
            assertArrayEquals(in.absorbance().toArray(), spectrum.getSpectrum().toArray(), 0.0);
            List<Result> own = results.stream().filter(r -> r.getMeasurementId().equals(out.measurementId()))
                    .sorted((a, b) -> out.resultIds().indexOf(a.getId()) - out.resultIds().indexOf(b.getId()))
                    .toList();
            assertEquals(out.resultIds(), own.stream().map(Result::getId).toList());
            assertEquals(in.results().stream().map(BlockServiceContract::values).toList(),
                    own.stream().map(BlockServiceContract::values).toList());
            for (Result r : own) {
                assertEquals(f.project.getId(), r.getProjectId());
                assertEquals(f.analyst.userId(), r.getRecordedBy());
            }
            assertTrue(in.results().stream().allMatch(r -> r.getId() == null && r.getMeasurementId() == null),
                    "the results given stay as they were: the store records copies");

            Map<String, String> audit = auditValues(out.measurementId());
            assertEquals(spectrum.getSha256(), audit.get("spectrumSha256"));
            assertEquals(in.encoding().name(), spectrum.getSampleEncoding());
            assertEquals(null, spectrum.getRecipeSha256(), "a block's results are stored without a recipe");
            assertEquals(out.spectrumId(), audit.get("spectrum"));
            assertEquals(String.join(",", out.resultIds()), audit.get("resultIds"));
            assertEquals(Integer.toString(own.size()), audit.get("results"));
            assertEquals(resultsSha256(own), audit.get("resultsSha256"), "recomputed from the stored results");
        }
        assertTrue(f.store.versions().version(f.method.getId()).isFrozen());
        assertTrue(f.store.versions().version(f.library.getId()).isFrozen());
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void blockLinksEachMeasurementToItsInstrumentUnderTheMeasurementsOwnAuditRecord() throws Exception {
        String analyzer = f.store.instruments().record(f.analyst, analyzer("TB-2026-0011")).getId();
        List<ProcessedSpectrum> block = new ArrayList<>(SampleBlocks.madeBy(analyzer,
                SampleBlocks.block(0, 3, 2, f.method.getId(), f.library.getId())));
        // a spectrum of no known instrument (a file that names none) in the same block
        block.add(SampleBlocks.processed(3, 2, f.method.getId(), f.library.getId()));
        long auditBefore = f.count("SELECT COUNT(*) FROM audit_record");

        List<StoredMeasurement> stored = f.store.blocks().store(f.analyst, f.project.getId(), block);

        assertEquals(4, f.count("SELECT COUNT(*) FROM audit_record") - auditBefore,
                "one audit record per measurement, none of its own for a link");
        assertEquals(0, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'measurement-instrument'"));
        for (int i = 0; i < block.size(); i++) {
            String id = stored.get(i).measurementId();
            assertEquals(i < 3 ? 1 : 0, f.count("SELECT COUNT(*) FROM measurement_instrument"
                    + " WHERE measurement_id = '" + id + "' AND instrument_id = '" + analyzer + "'"));
            assertEquals(i < 3 ? analyzer : null, auditValues(id).get("instrument"));
        }
        assertEquals(3, f.count("SELECT COUNT(*) FROM measurement_instrument"));
        WorkspaceVerification v = f.store.audit().verifyWorkspace(List.of());
        assertTrue(v.intact(), v.dataFindings().toString());

        // a link changed outside the store is named: the measurement's record vouches for it
        String other = f.store.instruments().record(f.analyst, analyzer("TB-2026-0012")).getId();
        String second = stored.get(1).measurementId();
        try (Connection c = f.backend.raw(); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE measurement_instrument SET instrument_id = '" + other
                    + "' WHERE measurement_id = '" + second + "'");
        }
        v = f.store.audit().verifyWorkspace(List.of());
        assertEquals(List.of("measurement-instrument " + second),
                v.dataFindings().stream().map(d -> d.dataKind() + " " + d.rowKey()).toList());
    }

    @Test
    void blockNamingAnUnknownInstrumentOrFailingAtItsLinksWritesNothing() throws Exception {
        String analyzer = f.store.instruments().record(f.analyst, analyzer("TB-2026-0011")).getId();
        String refused = f.store.instruments().record(f.analyst, analyzer("TB-2026-0012")).getId();
        long before = f.count(COUNT_ROWS + " + (SELECT COUNT(*) FROM measurement_instrument)");
        List<ProcessedSpectrum> unknown = new ArrayList<>(SampleBlocks.madeBy(analyzer,
                SampleBlocks.block(0, 2, 1, f.method.getId(), f.library.getId())));
        unknown.addAll(SampleBlocks.madeBy("no-such-instrument", SampleBlocks.block(2, 1, 1, f.method.getId(),
                f.library.getId())));

        NoSuchObjectException e = assertThrows(NoSuchObjectException.class,
                () -> f.store.blocks().store(f.analyst, f.project.getId(), unknown));

        assertEquals("no instrument (block[2].instrumentId) with id no-such-instrument", e.getMessage());
        assertEquals(before, f.count(COUNT_ROWS + " + (SELECT COUNT(*) FROM measurement_instrument)"));

        // the database refuses the links of one instrument only when they are inserted, after the block's
        // measurements, spectra and results: the whole block is rolled back
        try (Connection c = f.backend.raw(); Statement st = c.createStatement()) {
            st.execute("ALTER TABLE measurement_instrument ADD CONSTRAINT test_refuses_one CHECK (instrument_id <> '"
                    + refused + "')");
        }
        List<ProcessedSpectrum> failing = new ArrayList<>(SampleBlocks.madeBy(analyzer,
                SampleBlocks.block(0, 2, 1, f.method.getId(), f.library.getId())));
        failing.addAll(SampleBlocks.madeBy(refused, SampleBlocks.block(2, 1, 1, f.method.getId(),
                f.library.getId())));
        assertThrows(StoreException.class, () -> f.store.blocks().store(f.analyst, f.project.getId(), failing));
        assertEquals(before, f.count(COUNT_ROWS + " + (SELECT COUNT(*) FROM measurement_instrument)"),
                "nothing half written");
        assertTrue(f.store.audit().verifyWorkspace(List.of()).intact());
    }

    /**
     * An invented analyzer with a HeNe reference laser, 15798 cm-1 (632.99 nm in air; common practice, no
     * source), 1 cm maximum path difference and a 6.4 m cell.
     */
    private static Instrument analyzer(String serial) {
        Instrument i = WorkspaceFactory.eINSTANCE.createInstrument();
        i.setName("Stack analyzer");
        i.setSerialNumber(serial);
        i.setLaserWavenumber(15798.0);
        i.setMaxPathDifference(1.0);
        i.setCellPathLength(6.4);
        return i;
    }

    @Test
    void blockEncodedOnAnotherThreadIsBoundToTheAuditTrailAsStored() throws Exception {
        List<ProcessedSpectrum> block = new ArrayList<>();
        for (ProcessedSpectrum p : SampleBlocks.block(0, 3, 2, f.method.getId(), f.library.getId())) {
            // a time finer than the microsecond both databases keep
            block.add(new ProcessedSpectrum(p.kind(), p.time().plusNanos(123_456_789), p.cellTemperature(),
                    p.cellPressure(), p.absorbance(), p.encoding(), p.results(), p.instrumentId()));
        }
        EncodedBlock encoded = CompletableFuture.supplyAsync(() -> f.store.blocks().encode(f.analyst,
                f.project.getId(), block)).get();
        long before = f.count(COUNT_ROWS);
        assertEquals(before, f.count(COUNT_ROWS), "encoding writes nothing");

        List<StoredMeasurement> stored = f.store.blocks().store(encoded);

        assertEquals(3, stored.size());
        List<Measurement> measurements = f.store.projects().measurements(f.analyst, f.project.getId());
        assertEquals(block.get(0).time().truncatedTo(ChronoUnit.MICROS), measurements.get(0).getTime());
        // the hashes taken from the values before the insert are those the verification takes from the rows
        WorkspaceVerification v = f.store.audit().verifyWorkspace(List.of());
        assertEquals(List.of(), v.dataFindings());
        assertTrue(v.intact());
    }

    @Test
    void aMeasurementsSpectraAndResultsAreFoundByTheMeasurementAlone() throws Exception {
        List<ProcessedSpectrum> block = SampleBlocks.block(0, 3, 2, f.method.getId(), f.library.getId());
        List<StoredMeasurement> stored = f.store.blocks().store(f.analyst, f.project.getId(), block);
        StoredMeasurement second = stored.get(1);

        List<org.tracegas.model.ProcessedSpectrum> spectra = f.store.spectra().ofMeasurement(f.reader,
                second.measurementId());
        List<Result> results = f.store.results().ofMeasurement(f.reader, second.measurementId());

        assertEquals(List.of(second.spectrumId()), spectra.stream().map(s -> s.getId()).toList());
        assertArrayEquals(block.get(1).absorbance().toArray(), spectra.get(0).getSpectrum().toArray(), 0.0);
        assertEquals(Set.copyOf(second.resultIds()), results.stream().map(Result::getId).collect(Collectors.toSet()));
        assertEquals(block.get(1).results().stream().map(BlockServiceContract::values).collect(Collectors.toSet()),
                results.stream().map(BlockServiceContract::values).collect(Collectors.toSet()));
        ProcessedSpectrum first = block.get(0);
        String bare = f.store.projects().recordMeasurement(f.analyst, f.project.getId(), first.kind(),
                first.time().plusSeconds(1), first.cellTemperature(), first.cellPressure());
        assertEquals(List.of(), f.store.results().ofMeasurement(f.analyst, bare), "a measurement without results");
        assertEquals(List.of(), f.store.spectra().ofMeasurement(f.analyst, bare), "nor spectra");
        NoSuchObjectException missing = assertThrows(NoSuchObjectException.class,
                () -> f.store.spectra().ofMeasurement(f.reader, "no-such-measurement"));
        assertTrue(missing.getMessage().contains("no-such-measurement"), missing.getMessage());
        // another project of the analyst's, to which the reader has no grant
        String other = f.store.projects().createProject(f.analyst, f.project.getClient().getId(), "WU-2",
                "Other stack")
                .getId();
        String elsewhere = f.store.blocks().store(f.analyst, other, SampleBlocks.block(0, 1, 1, f.method.getId(),
                f.library.getId())).get(0).measurementId();
        assertThrows(AccessDeniedException.class, () -> f.store.spectra().ofMeasurement(f.reader, elsewhere));
        assertThrows(AccessDeniedException.class, () -> f.store.results().ofMeasurement(f.reader, elsewhere));
    }

    @Test
    void encodedBlockIsStoredOnlyWithItsActorsAccessAndOnlyByItsStore() throws Exception {
        long before = f.count(COUNT_ROWS);
        EncodedBlock byReader = f.store.blocks().encode(f.reader, f.project.getId(),
                SampleBlocks.block(0, 2, 1, f.method.getId(), f.library.getId()));
        assertThrows(AccessDeniedException.class, () -> f.store.blocks().store(byReader));
        EncodedBlock foreign = () -> 1;
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> f.store.blocks().store(foreign));
        assertTrue(e.getMessage().startsWith("block: not encoded by this store"), e.getMessage());
        assertEquals(before, f.count(COUNT_ROWS));
    }

    @Test
    void wrongVersionKindDeepInTheBlockNamesItsIndexAndWritesNothing() throws Exception {
        List<ProcessedSpectrum> block = new ArrayList<>(SampleBlocks.block(0, 2, 2, f.method.getId(),
                f.library.getId()));
        // the library version given as the method version of the third spectrum's first result
        block.add(SampleBlocks.processed(2, 2, f.library.getId(), f.library.getId()));
        long before = f.count(COUNT_ROWS);

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> f.store.blocks().store(f.analyst, f.project.getId(), block));

        assertTrue(e.getMessage().startsWith("block[2].results[0].methodVersionId"), e.getMessage());
        assertEquals(before, f.count(COUNT_ROWS), "nothing half written");
    }

    @Test
    void versionsFrozenByEarlierBlocksAreStillCheckedForTheirKind() throws Exception {
        // the second block reads the versions frozen by the first, so the third finds them remembered
        f.store.blocks().store(f.analyst, f.project.getId(), SampleBlocks.block(0, 2, 1, f.method.getId(),
                f.library.getId()));
        f.store.blocks().store(f.analyst, f.project.getId(), SampleBlocks.block(2, 2, 1, f.method.getId(),
                f.library.getId()));
        long before = f.count(COUNT_ROWS);

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.store.blocks().store(
                f.analyst, f.project.getId(), SampleBlocks.block(4, 1, 1, f.library.getId(), f.library.getId())));

        assertEquals("block[0].results[0].methodVersionId " + f.library.getId()
                + " is a LIBRARY version, not a METHOD version", e.getMessage());
        assertEquals(before, f.count(COUNT_ROWS), "nothing half written");
        NoSuchObjectException missing = assertThrows(NoSuchObjectException.class, () -> f.store.blocks().store(
                f.analyst, f.project.getId(), SampleBlocks.block(4, 1, 1, f.method.getId(), "no-such-version")));
        assertTrue(missing.getMessage().contains("no-such-version"), missing.getMessage());
    }

    @Test
    void versionFrozenOnlyByARefusedBlockStaysADraftUntilAStoredBlockUsesIt() throws Exception {
        ContentVersion draft = f.store.versions().create(f.analyst, VersionKind.LIBRARY, "Kiln gases, hot cell",
                "sha=def\n", "hot cell");
        // the draft is frozen by the block's first check, then the block is refused and rolled back
        assertThrows(IllegalArgumentException.class, () -> f.store.blocks().store(f.analyst, f.project.getId(),
                SampleBlocks.block(0, 1, 1, draft.getId(), draft.getId())));
        assertFalse(f.store.versions().version(draft.getId()).isFrozen(), "the refused block froze nothing");
        ContentVersion edited = f.store.versions().updateDraft(f.analyst, draft.getId(), draft.getRowVersion(),
                "sha=0ef\n", "corrected hash");

        for (int first = 0; first < 6; first += 2) {
            f.store.blocks().store(f.analyst, f.project.getId(),
                    SampleBlocks.block(first, 2, 1, f.method.getId(), draft.getId()));
        }

        ContentVersion used = f.store.versions().version(draft.getId());
        assertTrue(used.isFrozen());
        assertThrows(FrozenVersionException.class, () -> f.store.versions().updateDraft(f.analyst, draft.getId(),
                used.getRowVersion(), "sha=1ef\n", "too late"));
        assertEquals(edited.getContentHash(), used.getContentHash());
    }

    @Test
    void badEntriesAreNamedByIndexAndField() {
        List<ProcessedSpectrum> withNull = new ArrayList<>(SampleBlocks.block(0, 1, 1, f.method.getId(),
                f.library.getId()));
        withNull.add(null);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> f.store.blocks().store(f.analyst, f.project.getId(), withNull));
        assertEquals("block[1] is null", e.getMessage());

        ProcessedSpectrum good = SampleBlocks.processed(0, 2, f.method.getId(), f.library.getId());
        Result named = EcoreUtil.copy(good.results().get(1));
        named.setMeasurementId("m-1");
        List<Result> namedMeasurement = List.of(good.results().get(0), named);
        e = assertThrows(IllegalArgumentException.class, () -> new ProcessedSpectrum(good.kind(), good.time(),
                good.cellTemperature(), good.cellPressure(), good.absorbance(), good.encoding(), namedMeasurement,
                null));
        assertTrue(e.getMessage().startsWith("results[1].measurementId must be null"), e.getMessage());

        e = assertThrows(IllegalArgumentException.class, () -> new ProcessedSpectrum(good.kind(), good.time(), 0.0,
                good.cellPressure(), good.absorbance(), good.encoding(), good.results(), null));
        assertTrue(e.getMessage().startsWith("cellTemperature"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new ProcessedSpectrum(good.kind(), good.time(),
                good.cellTemperature(), good.cellPressure(), good.absorbance(), good.encoding(), good.results(), " "));
        assertTrue(e.getMessage().startsWith("instrumentId must be null"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> f.store.blocks().store(f.analyst, f.project.getId(),
                List.of()));
    }

    @Test
    void readerMayNotStoreABlock() throws Exception {
        long before = f.count(COUNT_ROWS);
        assertThrows(AccessDeniedException.class, () -> f.store.blocks().store(f.reader, f.project.getId(),
                SampleBlocks.block(0, 2, 1, f.method.getId(), f.library.getId())));
        assertEquals(before, f.count(COUNT_ROWS));
    }

    /** What a result says, without what the store gives it when recording it. */
    private static List<Object> values(Result r) {
        return List.of(r.getCompound(), r.getConcentration(), r.getStandardUncertainty(), r.getDetectionLimit(),
                r.getUnit(), Set.copyOf(r.getFlags()), r.getProvenance(), Optional.ofNullable(r.getConditions()));
    }

    /** The formula documented on BlockService, written out independently of the store's code. */
    private static String resultsSha256(List<Result> results) throws Exception {
        StringBuilder text = new StringBuilder();
        for (Result r : results) {
            Provenance p = r.getProvenance();
            Map<String, Object> fields = new LinkedHashMap<>();
            fields.put("id", r.getId());
            fields.put("project", r.getProjectId());
            fields.put("measurement", r.getMeasurementId());
            fields.put("compound", r.getCompound());
            fields.put("concentration", r.getConcentration());
            fields.put("uncertainty", r.getStandardUncertainty());
            fields.put("detectionLimit", r.getDetectionLimit());
            fields.put("unit", r.getUnit());
            fields.put("flags", r.getFlags().stream().sorted().map(ResultFlag::getName)
                    .collect(Collectors.joining(",")));
            fields.put("methodVersion", p.methodVersionId());
            fields.put("libraryVersion", p.libraryVersionId());
            fields.put("softwareVersion", p.softwareVersion());
            fields.put("inputHash", p.inputHash());
            ResultConditions c = r.getConditions();
            if (c != null) {
                fields.put("cellTemperature", c.cellTemperatureK());
                fields.put("cellTemperatureOrigin", c.temperatureOrigin());
                fields.put("cellPressure", c.cellPressureKPa());
                fields.put("cellPressureOrigin", c.pressureOrigin());
                fields.put("pathLength", c.pathM());
                fields.put("pathLengthOrigin", c.pathOrigin());
                fields.put("referenceTemperature", c.referenceTemperatureK());
                fields.put("referencePressure", c.referencePressureKPa());
                fields.put("fitPathLength", c.fitPathM());
                fields.put("correctionFactor", c.correctionFactor());
                fields.put("noiseFactor", c.noiseFactor());
                fields.put("noiseFactorOrigin", c.noiseFactorOrigin());
            }
            text.append(AuditValues.canonical(fields));
        }
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                .digest(text.toString().getBytes(StandardCharsets.UTF_8)));
    }

    /** The key=value lines of the audit record that created a measurement. */
    private Map<String, String> auditValues(String measurementId) throws Exception {
        try (Connection c = f.backend.raw(); PreparedStatement ps = c.prepareStatement("SELECT new_value FROM"
                + " audit_record WHERE object_type = 'measurement' AND object_id = ?")) {
            ps.setString(1, measurementId);
            try (ResultSet rs = ps.executeQuery()) {
                assertTrue(rs.next(), "audit record of measurement " + measurementId);
                Map<String, String> values = new LinkedHashMap<>();
                for (String line : rs.getString(1).split("\n")) {
                    int eq = line.indexOf('=');
                    values.put(line.substring(0, eq), line.substring(eq + 1));
                }
                assertTrue(!rs.next(), "a single audit record per measurement");
                return values;
            }
        }
    }
}
