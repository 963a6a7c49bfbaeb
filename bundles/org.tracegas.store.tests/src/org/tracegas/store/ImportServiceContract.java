package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
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

import org.junit.jupiter.api.Test;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * The lab's files kept whole by content hash with their measurements, and the analyses of those measurements
 * with the recipe that ran, on each backend.
 */
abstract class ImportServiceContract extends AnalysisFixtureContract {

    /** SHA-256 of "abc": FIPS 180-2, Appendix B.1. */
    private static final String SHA256_OF_ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";
    private static final Instant T0 = Instant.parse("2026-05-04T06:00:00Z");
    private static final String RECIPE = "recipe 1\nbaseline degree=1;regions=2000:2010\n";


    private static Measurement sample(int i, Map<String, String> labels) {
        Spectrum a = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 3),
                new double[] { 0.1 * i, 0.2, 0.3 }, Ordinate.ABSORBANCE);
        Measurement m = WorkspaceFactory.eINSTANCE.createMeasurement();
        m.setKind(MeasurementKind.SAMPLE);
        m.setTime(T0.plusSeconds(60L * i));
        m.setCellTemperature(313.15);
        m.setCellPressure(1009.0);
        m.setTitle("Kiln 5 stack " + i);
        m.getLabels().putAll(labels);
        m.setContent(SpectralContent.ABSORBANCE);
        m.setSpectrum(a);
        return m;
    }

    @Test
    void aFileIsKeptOnceByTheHashOfItsBytesAndItsAuditRecordsNameIt() throws Exception {
        Map<String, String> labels = new LinkedHashMap<>();
        labels.put("LONGDATE", "2026/05/04 06:00:00");
        labels.put("$NOTE", "two\nlines, a back\\slash and = sign");
        RawFile file = new RawFile("stack-01.jdx", "JCAMP-DX 5.01", "abc".getBytes(StandardCharsets.US_ASCII));
        assertEquals(SHA256_OF_ABC, file.sha256());

        ImportedFile first = f.store.imports().importFile(f.analyst, f.project.getId(), file,
                List.of(sample(1, labels), sample(2, Map.of())));
        assertTrue(first.added());
        assertEquals(2, first.measurementIds().size());
        long rows = f.count("SELECT COUNT(*) FROM measurement") + f.count("SELECT COUNT(*) FROM spectral_data");

        ImportedFile again = f.store.imports().importFile(f.analyst, f.project.getId(),
                new RawFile("renamed.jdx", "JCAMP-DX 5.01", "abc".getBytes(StandardCharsets.US_ASCII)),
                List.of(sample(3, Map.of())));
        assertFalse(again.added(), "the same bytes under another name are the same file");
        assertEquals("stack-01.jdx", again.fileName());
        assertEquals(first.measurementIds(), again.measurementIds());
        assertEquals(rows, f.count("SELECT COUNT(*) FROM measurement") + f.count("SELECT COUNT(*) FROM spectral_data"));

        List<Measurement> stored = f.store.imports().measurements(f.analyst, f.project.getId());
        assertEquals(first.measurementIds(), stored.stream().map(m -> m.getId()).toList());
        Measurement m = stored.get(0);
        assertEquals("Kiln 5 stack 1", m.getTitle());
        assertEquals(SHA256_OF_ABC, m.getSourceSha256());
        assertEquals(labels, m.getLabels().map(), "labels come back exactly, line breaks and backslashes too");
        assertEquals(313.15, m.getCellTemperature());
        assertArrayEquals("abc".getBytes(StandardCharsets.US_ASCII),
                f.store.imports().content(f.reader, f.project.getId(), SHA256_OF_ABC));
        assertTrue(f.store.imports().find(f.reader, f.project.getId(), SHA256_OF_ABC).isPresent());

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

        // the project's measurements are the same objects of the model, in their project and client
        Measurement read = f.store.projects().measurements(f.reader, f.project.getId()).get(0);
        assertEquals(List.of(m.getId(), "stack-01.jdx", SHA256_OF_ABC, 0, SpectralContent.ABSORBANCE, labels),
                List.of(read.getId(), read.getSourceFile(), read.getSourceSha256(), read.getSourceRecord(),
                        read.getContent(), read.getLabels().map()));
        assertEquals(f.project.getId(), read.getProject().getId());
        assertEquals(f.project.getClient().getId(), read.getProject().getClient().getId());
        assertEquals(0.1, f.store.spectra().load(f.reader, read.getSpectrumId()).getSpectrum().get(0), 0,
                "the stored values as read, bit-exact");
        assertEquals(null, read.getSpectrum(), "values stay in their block when measurements are read");
    }

    @Test
    void incompleteMeasurementsAreRefusedWhereTheyComeInNamingRecordAndField() throws Exception {
        RawFile file = new RawFile("stack-03.jdx", "JCAMP-DX 5.01", new byte[] { 4, 5, 6 });
        Measurement untitled = sample(2, Map.of());
        untitled.setTitle(" ");
        Measurement unstated = sample(2, Map.of());
        unstated.unsetContent();
        Measurement residual = sample(2, Map.of());
        residual.setContent(SpectralContent.RESIDUAL);
        // an absolute temperature is positive: common practice, no source
        Measurement frozen = sample(2, Map.of());
        frozen.setCellTemperature(0);
        Measurement bare = sample(2, Map.of());
        bare.setSpectrum(null);
        Map<Measurement, String> refused = new LinkedHashMap<>();
        refused.put(untitled, "measurements[1] of stack-03.jdx: title must not be blank");
        refused.put(unstated, "measurements[1] of stack-03.jdx: content must be interferogram, single beam,"
                + " transmittance or absorbance, was null");
        refused.put(residual, "measurements[1] of stack-03.jdx: content must be interferogram, single beam,"
                + " transmittance or absorbance, was RESIDUAL");
        refused.put(frozen, "measurements[1] of stack-03.jdx: cellTemperature must be a positive number of K,"
                + " was 0.0");
        refused.put(bare, "measurements[1] of stack-03.jdx: spectrum must not be null");
        for (Map.Entry<Measurement, String> e : refused.entrySet()) {
            IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class,
                    () -> f.store.imports().importFile(f.analyst, f.project.getId(), file,
                            List.of(sample(1, Map.of()), e.getKey())));
            assertEquals(e.getValue(), thrown.getMessage());
        }
        assertEquals(0, f.count("SELECT COUNT(*) FROM measurement") + f.count("SELECT COUNT(*) FROM raw_file"),
                "nothing of a refused file is stored");
    }

    @Test
    void analysesAreStoredWholeWithTheRecipeThatRan() throws Exception {
        ImportedFile file = f.store.imports().importFile(f.analyst, f.project.getId(),
                new RawFile("stack-02.jdx", "JCAMP-DX 5.01", new byte[] { 1, 2, 3 }),
                List.of(sample(1, Map.of()), sample(2, Map.of())));
        String one = file.measurementIds().get(0);
        String two = file.measurementIds().get(1);
        Result co = Results.of(null, "CO", 12.5, 0.8, 0.3, "ppm", Set.of(ResultFlag.HIGH_RESIDUAL),
                new Provenance(f.method.getId(), f.library.getId(), "0.1.0",
                        "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855"),
                null);
        Spectrum a = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 3),
                new double[] { 0.1, 0.2, 0.3 }, Ordinate.ABSORBANCE);
        long before = f.count("SELECT COUNT(*) FROM analysis_result") + f.count("SELECT COUNT(*) FROM audit_record");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.store.analyses().store(
                f.analyst, f.project.getId(), List.of(new MeasurementAnalysis(one, RECIPE, a, SampleEncoding.FLOAT32_LE,
                        List.of(co)), new MeasurementAnalysis("no-such-measurement", RECIPE, a,
                                SampleEncoding.FLOAT32_LE, List.of(co)))));
        assertTrue(e.getMessage().contains("analyses[1].measurementId"), e.getMessage());
        assertEquals(before, f.count("SELECT COUNT(*) FROM analysis_result")
                + f.count("SELECT COUNT(*) FROM audit_record"), "a refused block stores nothing");

        List<StoredMeasurement> stored = f.store.analyses().store(f.analyst, f.project.getId(), List.of(
                new MeasurementAnalysis(one, RECIPE, a, SampleEncoding.FLOAT32_LE, List.of(co)),
                new MeasurementAnalysis(two, RECIPE, a, SampleEncoding.FLOAT32_LE, List.of(co))));
        assertEquals(2, stored.size());
        assertEquals(Set.of(one, two), f.store.analyses().analysed(f.reader, f.project.getId(), f.method.getId()));
        List<ResultRow> rows = f.store.analyses().rows(f.reader, f.project.getId());
        assertEquals(2, rows.size());
        assertEquals(one, rows.get(0).result().getMeasurementId(), "in measurement time order");
        assertEquals("stack-02.jdx", rows.get(0).sourceFile());
        assertEquals(T0.plusSeconds(60), rows.get(0).measured());
        assertEquals(RawFile.sha256Hex(RECIPE.getBytes(StandardCharsets.UTF_8)), rows.get(0).recipeSha256());
        assertEquals(RECIPE, f.store.analyses().recipe(f.reader, rows.get(0).recipeSha256()));
        assertEquals(1, f.count("SELECT COUNT(*) FROM processing_recipe"), "a recipe's text is kept once");
        assertEquals(2, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'measurement-analysis'"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void aProcessedSpectrumIsReadWithItsEncodingHashesAndTheRecipeThatMadeIt() throws Exception {
        ImportedFile file = f.store.imports().importFile(f.analyst, f.project.getId(),
                new RawFile("stack-03.jdx", "JCAMP-DX 5.01", new byte[] { 4, 5, 6 }), List.of(sample(1, Map.of())));
        String measurement = file.measurementIds().get(0);
        Result co = Results.of(null, "CO", 12.5, 0.8, 0.3, "ppm", Set.of(),
                new Provenance(f.method.getId(), f.library.getId(), "0.1.0",
                        "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855"),
                null);
        Spectrum a = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 3),
                new double[] { 0.1, 0.2, 0.3 }, Ordinate.ABSORBANCE);
        String other = "recipe 1\nbaseline degree=0;regions=2000:2010\n";
        String first = f.store.analyses().store(f.analyst, f.project.getId(), List.of(new MeasurementAnalysis(
                measurement, RECIPE, a, SampleEncoding.FLOAT32_LE, List.of(co)))).get(0).spectrumId();
        // the same measurement processed again with another recipe: each absorbance names its own
        String second = f.store.analyses().store(f.analyst, f.project.getId(), List.of(new MeasurementAnalysis(
                measurement, other, a, SampleEncoding.FLOAT32_LE, List.of(co)))).get(0).spectrumId();

        // IEEE 754-2019 binary32, little-endian, one value after the other: the bytes the hash is of
        ByteBuffer floats = ByteBuffer.allocate(12).order(ByteOrder.LITTLE_ENDIAN);
        floats.putFloat(0.1f).putFloat(0.2f).putFloat(0.3f);
        Map<String, org.tracegas.model.ProcessedSpectrum> read = new LinkedHashMap<>();
        try (var all = f.store.spectra().stream(f.reader, f.project.getId())) {
            all.forEach(s -> read.put(s.getId(), s));
        }
        assertEquals(List.of(f.store.imports().measurements(f.reader, f.project.getId()).get(0).getSpectrumId(),
                first, second), List.copyOf(read.keySet()), "the file's values, then the two absorbances");
        org.tracegas.model.ProcessedSpectrum imported = read.values().iterator().next();
        assertEquals(SpectralContent.ABSORBANCE, imported.getContent());
        assertEquals("FLOAT64_LE", imported.getSampleEncoding());
        assertEquals(null, imported.getRecipeSha256(), "values read from a file were made by no recipe");
        for (String id : List.of(first, second)) {
            org.tracegas.model.ProcessedSpectrum p = read.get(id);
            assertEquals(measurement, p.getMeasurementId());
            assertEquals(SpectralContent.ABSORBANCE, p.getContent());
            assertEquals("FLOAT32_LE", p.getSampleEncoding());
            assertEquals(sha256(floats.array()), p.getSha256());
            assertEquals(0.2f, p.getSpectrum().get(1), 0.0);
        }
        assertEquals(sha256(RECIPE.getBytes(StandardCharsets.UTF_8)), read.get(first).getRecipeSha256());
        assertEquals(sha256(other.getBytes(StandardCharsets.UTF_8)), read.get(second).getRecipeSha256());
        assertEquals(other, f.store.analyses().recipe(f.reader, read.get(second).getRecipeSha256()));
        // one array read alone is the same as streamed
        org.tracegas.model.ProcessedSpectrum loaded = f.store.spectra().load(f.reader, second);
        assertEquals(List.of(second, measurement, read.get(second).getSha256(), read.get(second).getRecipeSha256()),
                List.of(loaded.getId(), loaded.getMeasurementId(), loaded.getSha256(), loaded.getRecipeSha256()));
    }

    /** SHA-256, lower-case hex, by the JDK's provider (FIPS 180-4), not the store's code. */
    private static String sha256(byte[] bytes) throws Exception {
        return java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256").digest(bytes));
    }
}
