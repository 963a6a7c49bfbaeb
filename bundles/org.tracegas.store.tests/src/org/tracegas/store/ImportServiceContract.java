package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.SpectralContent;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * The lab's files kept whole by content hash with their measurements, and the analyses of those measurements
 * with the recipe that ran, on each backend.
 */
abstract class ImportServiceContract {

    /** SHA-256 of "abc": FIPS 180-2, Appendix B.1. */
    private static final String SHA256_OF_ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";
    private static final Instant T0 = Instant.parse("2026-05-04T06:00:00Z");
    private static final String RECIPE = "recipe 1\nbaseline degree=1;regions=2000:2010\n";

    private AnalysisFixture f;

    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void setUp() throws Exception {
        f = new AnalysisFixture(newBackend());
    }

    @AfterEach
    void tearDown() throws Exception {
        f.close();
    }

    private static NewMeasurement sample(int i, Map<String, String> labels) {
        Spectrum a = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 3),
                new double[] { 0.1 * i, 0.2, 0.3 }, Ordinate.ABSORBANCE);
        return new NewMeasurement(MeasurementKind.SAMPLE, T0.plusSeconds(60L * i), 313.15, 1009.0,
                "Kiln 5 stack " + i, labels, SpectralContent.ABSORBANCE, a);
    }

    @Test
    void aFileIsKeptOnceByTheHashOfItsBytesAndItsAuditRecordsNameIt() throws Exception {
        Map<String, String> labels = new LinkedHashMap<>();
        labels.put("LONGDATE", "2026/05/04 06:00:00");
        labels.put("$NOTE", "two\nlines, a back\\slash and = sign");
        RawFile file = new RawFile("stack-01.jdx", "JCAMP-DX 5.01", "abc".getBytes(StandardCharsets.US_ASCII));
        assertEquals(SHA256_OF_ABC, file.sha256());

        ImportedFile first = f.store.imports().importFile(f.analyst, f.project.id(), file,
                List.of(sample(1, labels), sample(2, Map.of())));
        assertTrue(first.added());
        assertEquals(2, first.measurementIds().size());
        long rows = f.count("SELECT COUNT(*) FROM measurement") + f.count("SELECT COUNT(*) FROM spectral_data");

        ImportedFile again = f.store.imports().importFile(f.analyst, f.project.id(),
                new RawFile("renamed.jdx", "JCAMP-DX 5.01", "abc".getBytes(StandardCharsets.US_ASCII)),
                List.of(sample(3, Map.of())));
        assertFalse(again.added(), "the same bytes under another name are the same file");
        assertEquals("stack-01.jdx", again.fileName());
        assertEquals(first.measurementIds(), again.measurementIds());
        assertEquals(rows, f.count("SELECT COUNT(*) FROM measurement") + f.count("SELECT COUNT(*) FROM spectral_data"));

        List<SourcedMeasurement> stored = f.store.imports().measurements(f.analyst, f.project.id());
        assertEquals(first.measurementIds(), stored.stream().map(m -> m.measurement().id()).toList());
        SourcedMeasurement m = stored.get(0);
        assertEquals("Kiln 5 stack 1", m.title());
        assertEquals(SHA256_OF_ABC, m.fileSha256());
        assertEquals(labels, m.labels(), "labels come back exactly, line breaks and backslashes too");
        assertEquals(313.15, m.measurement().cellTemperature());
        assertArrayEquals("abc".getBytes(StandardCharsets.US_ASCII),
                f.store.imports().content(f.reader, f.project.id(), SHA256_OF_ABC));
        assertTrue(f.store.imports().find(f.reader, f.project.id(), SHA256_OF_ABC).isPresent());

        List<String> audit = new ArrayList<>();
        try (Connection c = f.backend.raw(); PreparedStatement ps = c.prepareStatement(
                "SELECT new_value FROM audit_record WHERE object_type = 'measurement' ORDER BY seq");
                ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                audit.add(rs.getString(1));
            }
        }
        assertEquals(2, audit.size());
        for (String values : audit) {
            assertTrue(values.contains("sourceFile=stack-01.jdx\n") && values.contains("sourceSha256="
                    + SHA256_OF_ABC + "\n"), values);
        }
        assertEquals(1, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'raw-file'"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void analysesAreStoredWholeWithTheRecipeThatRan() throws Exception {
        ImportedFile file = f.store.imports().importFile(f.analyst, f.project.id(),
                new RawFile("stack-02.jdx", "JCAMP-DX 5.01", new byte[] { 1, 2, 3 }),
                List.of(sample(1, Map.of()), sample(2, Map.of())));
        String one = file.measurementIds().get(0);
        String two = file.measurementIds().get(1);
        NewResult co = new NewResult(null, "CO", 12.5, 0.8, 0.3, "ppm", Set.of(ResultFlag.HIGH_RESIDUAL),
                f.method.id(), f.library.id(), "0.1.0",
                "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
        Spectrum a = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 3),
                new double[] { 0.1, 0.2, 0.3 }, Ordinate.ABSORBANCE);
        long before = f.count("SELECT COUNT(*) FROM analysis_result") + f.count("SELECT COUNT(*) FROM audit_record");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.store.analyses().store(
                f.analyst, f.project.id(), List.of(new MeasurementAnalysis(one, RECIPE, a, SampleEncoding.FLOAT32_LE,
                        List.of(co)), new MeasurementAnalysis("no-such-measurement", RECIPE, a,
                                SampleEncoding.FLOAT32_LE, List.of(co)))));
        assertTrue(e.getMessage().contains("analyses[1].measurementId"), e.getMessage());
        assertEquals(before, f.count("SELECT COUNT(*) FROM analysis_result")
                + f.count("SELECT COUNT(*) FROM audit_record"), "a refused block stores nothing");

        List<StoredMeasurement> stored = f.store.analyses().store(f.analyst, f.project.id(), List.of(
                new MeasurementAnalysis(one, RECIPE, a, SampleEncoding.FLOAT32_LE, List.of(co)),
                new MeasurementAnalysis(two, RECIPE, a, SampleEncoding.FLOAT32_LE, List.of(co))));
        assertEquals(2, stored.size());
        assertEquals(Set.of(one, two), f.store.analyses().analysed(f.reader, f.project.id(), f.method.id()));
        List<ResultRow> rows = f.store.analyses().rows(f.reader, f.project.id());
        assertEquals(2, rows.size());
        assertEquals(one, rows.get(0).result().values().measurementId(), "in measurement time order");
        assertEquals("stack-02.jdx", rows.get(0).sourceFile());
        assertEquals(T0.plusSeconds(60), rows.get(0).measured());
        assertEquals(RawFile.sha256Hex(RECIPE.getBytes(StandardCharsets.UTF_8)), rows.get(0).recipeSha256());
        assertEquals(RECIPE, f.store.analyses().recipe(f.reader, rows.get(0).recipeSha256()));
        assertEquals(1, f.count("SELECT COUNT(*) FROM processing_recipe"), "a recipe's text is kept once");
        assertEquals(2, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'measurement-analysis'"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }
}
