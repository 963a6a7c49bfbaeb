package org.tracegas.quantify.linelist;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.synthesis.HitranLineListReader;
import org.tracegas.library.synthesis.HitranLineListWriter;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.method.MethodDefinition;
import org.tracegas.method.MethodVersions;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.Role;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.QualityFlag;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * A method file with {@code algorithm = line-list}: the line lists (HITRAN 2004 format, HITRAN documentation of
 * the 160-character record), the cell conditions and the field of view in its {@code [line-list]} block, the
 * instrument line shape from its apodization and resolution. Defined and recorded as a method version in an H2
 * workspace, read back from the version's text, and used on mixtures of {@link InstrumentMixture} made from the very files the method names, through the
 * algorithm the linelist bundle contributes to the extension point.
 */
class LineListMethodFileTest {

    /** Transmittance noise: 0.1 % (common practice for a minute's co-adding, no source). */
    private static final double NOISE = 1e-3;

    @TempDir
    Path folder;

    @Test
    void quantifiesThroughARecordedVersionWithinItsUncertainty() throws IOException {
        Path method = writeMethod();
        MethodDefinition definition = MethodDefinition.read(method);
        assertInstanceOf(LineListAlgorithm.class, definition.algorithm(), "contributed through the extension point");
        Version version = record(definition);
        QuantificationMethod built = version.method();
        String content = version.content();
        assertTrue(content.contains("\n[line-list]\n") && content.contains("setting gas \"TX1 molar-mass 28.0"),
                content.substring(0, Math.min(content.length(), 3000)));
        StoredMethod reread = StoredMethod.parse(content, "method version 1");
        assertEquals(built.contentHash(), reread.method().contentHash());
        assertEquals(content, reread.content());

        InstrumentMixture generator = new InstrumentMixture(readBack());
        Quantifier quantifier = reread.quantifier(InstrumentMixture.AXIS, "test", false);
        Random random = new Random(1996);
        StringBuilder figures = new StringBuilder();
        for (double[] amounts : new double[][] {{300, 2500}, {900, 700}, {1150, 2900}}) {
            Spectrum spectrum = generator.absorbance(amounts, 0.02 * random.nextGaussian(),
                    1e-4 * random.nextGaussian(), 0, NOISE, random);
            List<CompoundResult> results = quantifier.fit(Sample.of(spectrum));
            for (int g = 0; g < 2; g++) {
                CompoundResult r = results.get(g);
                double truth = amounts[g] / InstrumentMixture.PATH;
                figures.append(String.format(Locale.ROOT, "%s truth %.4f found %.4f u %.4f; ", r.compound(), truth,
                        r.concentration(), r.standardUncertainty()));
                assertFalse(r.flagged(QualityFlag.NOT_CONVERGED), figures.toString());
                // coverage factor 2 (GUM, JCGM 100:2008, 6.3); at the time of writing the errors were 0.6 u to 1.7 u
                assertTrue(Math.abs(r.concentration() - truth) <= 2 * r.standardUncertainty(), figures.toString());
            }
        }
        System.out.println("line-list method file: " + figures);
    }

    /**
     * cell-conditions = measured: the setting is bound into the version's text and hash, and the version read back
     * from its text quantifies a sample made at 470 K and 97 kPa within 1 % when the sample carries those
     * conditions (truth: the generator's amounts, its own line-by-line model and instrument).
     */
    @Test
    void bindsMeasuredCellConditionsIntoTheVersion() throws IOException {
        Path stated = writeMethod("");
        String statedHash = MethodDefinition.read(stated).build(new ReferenceLibrary("no references", List.of()))
                .contentHash();
        Path method = writeMethod("cell-conditions = measured\n");
        String content = record(MethodDefinition.read(method)).content();
        assertTrue(content.contains("setting cell-conditions \"measured\""),
                content.substring(0, Math.min(content.length(), 3000)));
        StoredMethod reread = StoredMethod.parse(content, "method version 1");
        assertFalse(reread.method().contentHash().equals(statedHash), "the setting must change the hash");
        quantifiesTheHotSampleWithinOnePercent(reread);
    }

    /**
     * The cell conditions changed in the workbench's model of a version that computes at the stated ones
     * ({@link MethodVersions}): the edit is the very method a file stating {@code cell-conditions = measured}
     * defines, its stored text reads back, and it quantifies the sample made at 470 K and 97 kPa within 1 % (truth:
     * the generator's amounts).
     */
    @Test
    void cellConditionsEditedInTheModelGiveTheMethodOfAFileStatingThem() throws IOException {
        String measuredHash = MethodDefinition.read(writeMethod("cell-conditions = measured\n")).build(
                new ReferenceLibrary("no references", List.of())).contentHash();
        StoredMethod opened = StoredMethod.parse(record(MethodDefinition.read(writeMethod(""))).content(),
                "method version 1");
        AnalysisMethod model = WorkspaceFactory.eINSTANCE.createAnalysisMethod();
        model.setName(opened.method().name());
        MethodVersion draft = WorkspaceFactory.eINSTANCE.createMethodVersion();
        model.getVersions().add(draft);
        MethodVersions.fillRegions(draft, opened);
        assertEquals("stated", draft.getCellConditions(), "the block names none: the stated ones");
        assertEquals(opened.content(), MethodVersions.edited(opened, model, draft).content());

        draft.setCellConditions("warm");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MethodVersions.edited(opened, model, draft));
        assertEquals("cell conditions: 'warm' is none of [stated, measured]", e.getMessage());
        draft.setCellConditions("measured");
        StoredMethod edited = MethodVersions.edited(opened, model, draft);
        assertEquals(measuredHash, edited.method().contentHash());
        StoredMethod reread = StoredMethod.parse(edited.content(), "method version 2");
        assertEquals(edited.content(), reread.content());
        quantifiesTheHotSampleWithinOnePercent(reread);
    }

    /** A sample made at 470 K and 97 kPa, carrying those conditions, quantified within 1 % of its amounts. */
    private void quantifiesTheHotSampleWithinOnePercent(StoredMethod method) throws IOException {
        double[] amounts = {700, 1800};
        Spectrum hot = InstrumentMixture.withNoise(new InstrumentMixture(readBack()).transmittance(amounts, 0.01, 0,
                0, 470, 97), NOISE, new Random(97));
        List<CompoundResult> results = method.quantifier(InstrumentMixture.AXIS, "test", false)
                .fit(Sample.of(hot).inCell(470, 97));
        for (int g = 0; g < 2; g++) {
            double truth = amounts[g] / InstrumentMixture.PATH;
            assertEquals(truth, results.get(g).concentration(), 0.01 * truth, results.get(g).toString());
        }
    }

    @Test
    void refusesUnknownCellConditions() throws IOException {
        Path method = writeMethod("cell-conditions = warm\n");
        FileFormatException e = assertThrows(FileFormatException.class, () -> MethodDefinition.read(method));
        assertTrue(e.getMessage().contains("field 'cell-conditions'") && e.getMessage().contains("warm"),
                e.getMessage());
    }

    @Test
    void refusesAChangedLineList() throws IOException {
        Path method = writeMethod();
        StoredMethod version = new StoredMethod(MethodDefinition.read(method).build(
                new ReferenceLibrary("no references", List.of())), MethodDefinition.read(method).transform(), "v",
                "h", MethodDefinition.read(method).recipe(), 0.5, List.of());
        Path tx1 = folder.resolve("lists/tx1.par");
        String text = Files.readString(tx1, StandardCharsets.US_ASCII);
        Files.writeString(tx1, text.replaceFirst("2", "3"), StandardCharsets.US_ASCII);

        FileFormatException defining = assertThrows(FileFormatException.class, () -> MethodDefinition.read(method));
        assertTrue(defining.getMessage().contains("kiln.method, line 16, field 'gas'")
                && defining.getMessage().contains(tx1.toString()) && defining.getMessage().contains("SHA-256"),
                defining.getMessage());
        IllegalArgumentException fitting = assertThrows(IllegalArgumentException.class,
                () -> version.quantifier(InstrumentMixture.AXIS, "test", false));
        assertTrue(fitting.getMessage().contains("'gas'") && fitting.getMessage().contains(tx1.toString())
                && fitting.getMessage().contains("SHA-256"), fitting.getMessage());
    }

    @Test
    void refusesALineListBlockWithoutResolution() throws IOException {
        Path method = writeMethod();
        Files.writeString(method, Files.readString(method).replace("resolution = 0.5\n", ""));
        FileFormatException e = assertThrows(FileFormatException.class, () -> MethodDefinition.read(method));
        assertTrue(e.getMessage().contains("field 'resolution'"), e.getMessage());
    }

    /** A recorded method version: the method as recorded and the version's stored text. */
    private record Version(QuantificationMethod method, String content) {
    }

    /** Records the method as a version in a new H2 workspace, by an analyst. */
    private Version record(MethodDefinition definition) throws IOException {
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("db"))) {
            Session admin = store.users().createFirstAdministrator("admin", "Administrator",
                    "admin-pw-12".toCharArray());
            store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "ana-pw-1234".toCharArray());
            Session analyst = store.users().logIn("ana", "ana-pw-1234".toCharArray());
            MethodDefinition.Recorded recorded = definition.record(store, analyst);
            return new Version(recorded.method().method(), store.versions().content(recorded.methodVersion().getId()));
        }
    }

    /** The method file of the Vellmar kiln analyser over the invented TX1 and TX2 line lists; line 16 is TX1's. */
    private Path writeMethod() throws IOException {
        return writeMethod("");
    }

    /** The same with more lines at the end of the [line-list] block, after TX2's gas line. */
    private Path writeMethod(String lineListLines) throws IOException {
        Files.createDirectories(folder.resolve("lists"));
        List<String> hashes = new ArrayList<>();
        List<LineList> bands = InstrumentMixture.bands();
        for (int g = 0; g < 2; g++) {
            StringBuilder records = new StringBuilder();
            bands.get(g).lines().forEach(l -> records.append(HitranLineListWriter.record(l)).append('\n'));
            byte[] bytes = records.toString().getBytes(StandardCharsets.US_ASCII);
            Files.write(folder.resolve("lists/tx" + (g + 1) + ".par"), bytes);
            hashes.add(sha256(bytes));
        }
        // the method needs no reference spectra: its library holds none
        Files.writeString(folder.resolve("library.manifest"), "library = Vellmar kiln, no references\n");
        Path method = folder.resolve("kiln.method");
        Files.writeString(method, """
                method = Vellmar kiln, line lists
                library = library.manifest
                path-length = 6.2
                resolution = 0.5
                max-absorbance = 3
                shift = scale
                algorithm = line-list

                [transform]
                apodization = norton-beer-medium

                [line-list]
                temperature = 308.15
                pressure = 99.8
                field-of-view = 0.008
                gas = TX1 molar-mass 28.0 partition linear sha256 %s file lists/tx1.par
                gas = TX2 molar-mass 44.0 partition linear sha256 %s file lists/tx2.par
                %s
                [analyte]
                compound = TX1
                interferents = TX2
                region = 2100..2200 baseline 1

                [analyte]
                compound = TX2
                interferents = TX1
                region = 2100..2200 baseline 1
                """.formatted(hashes.get(0), hashes.get(1), lineListLines));
        return method;
    }

    private List<LineList> readBack() throws IOException {
        HitranLineListReader reader = new HitranLineListReader();
        return List.of(reader.read(folder.resolve("lists/tx1.par")), reader.read(folder.resolve("lists/tx2.par")));
    }

    /** SHA-256 by the Java platform's own digest (FIPS 180-4), not the product's. */
    private static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
