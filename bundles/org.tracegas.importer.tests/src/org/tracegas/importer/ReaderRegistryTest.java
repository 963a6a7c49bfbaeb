package org.tracegas.importer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.importer.delimited.DelimitedReader;
import org.tracegas.importer.jcamp.JcampReader;
import org.tracegas.spectrum.Interferogram;

class ReaderRegistryTest {

    /** The running platform's registry in an OSGi test runtime, otherwise one read from the source tree. */
    static IExtensionRegistry extensions() throws Exception {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        return running != null ? running
                : StandaloneExtensions.fromSourceTree(ReaderRegistryTest.class.getClassLoader(), "org.tracegas.importer");
    }

    @TempDir
    Path dir;

    private Path copy(String resource, String name) throws Exception {
        Path f = dir.resolve(name);
        try (InputStream in = getClass().getResourceAsStream(resource)) {
            Files.copy(in, f);
        }
        return f;
    }

    @Test
    void builtInReadersComeFromPluginXml() throws Exception {
        ReaderRegistry registry = ReaderRegistry.fromExtensionRegistry(extensions());
        List<String> ids = registry.contributions().stream().map(ReaderContribution::id).toList();
        assertTrue(ids.containsAll(List.of("org.tracegas.importer.jcamp", "org.tracegas.importer.delimited",
                "org.tracegas.importer.container")), ids.toString());
        assertTrue(registry.find("org.tracegas.importer.jcamp").reader() instanceof JcampReader);
    }

    @Test
    void choosesByContentNotByName() throws Exception {
        ReaderRegistry registry = ReaderRegistry.fromExtensionRegistry(extensions());
        // a JCAMP-DX file with a misleading name
        Path jcamp = copy("jcamp/dif.jdx", "looks-like.csv");
        assertEquals("org.tracegas.importer.jcamp", registry.choose(jcamp).contribution().id());
        assertEquals(1, registry.read(jcamp, ImportOptions.defaults()).records().size());
        Path csv = copy("delimited/absorbance.csv", "spectrum.jdx");
        assertEquals("org.tracegas.importer.delimited", registry.choose(csv).contribution().id());
        Path container = dir.resolve("run.csv");
        try (ContainerWriter w = ContainerWriter.create(container)) {
            w.append(new AcquisitionHeader(0, SampleKind.SAMPLE, Instant.EPOCH, 300, 1000, 1, Map.of()),
                    new Interferogram(new double[] {1, 2}, 15798, 1));
            w.commit();
        }
        assertEquals("org.tracegas.importer.container", registry.choose(container).contribution().id());
    }

    @Test
    void unknownAndEmptyFilesAreRefusedWithTheirName() throws Exception {
        ReaderRegistry registry = new ReaderRegistry().register("jcamp", "JCAMP-DX", new JcampReader());
        Path binary = Files.write(dir.resolve("blob.bin"), new byte[] {0, 1, 2, 3});
        ImportException e = assertThrows(ImportException.class, () -> registry.choose(binary));
        assertEquals(binary.toString(), e.source());
        assertEquals("format", e.field());
        Path empty = Files.createFile(dir.resolve("empty.jdx"));
        assertEquals("file", assertThrows(ImportException.class, () -> registry.read(empty,
                ImportOptions.defaults())).field());
    }

    @Test
    void missingPluginXmlIsNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StandaloneExtensions.fromSourceTree(getClass().getClassLoader(), "org.tracegas.nonexistent"));
        assertTrue(e.getMessage().contains("org.tracegas.nonexistent"), e.getMessage());
    }

    @Test
    void plainRegistrationPicksTheHighestConfidenceAndRejectsDuplicates() throws Exception {
        ImportReader always = new ImportReader() {
            @Override
            public Recognition recognise(byte[] head, String fileName) {
                return new Recognition(0.55, "accepts anything a little more than delimited text");
            }

            @Override
            public ImportedData read(Path file, ImportOptions options) throws ImportException {
                throw new ImportException(file.toString(), 0, "file", "not meant to read");
            }
        };
        ReaderRegistry registry = new ReaderRegistry().register("delimited", "Delimited", new DelimitedReader())
                .register("vague", "Vague", always);
        Path csv = copy("delimited/absorbance.csv", "spectrum.csv");
        // delimited text recognises a .csv with numeric rows at 0.6, above the 0.55 of the vague reader
        assertEquals("delimited", registry.choose(csv).contribution().id());
        Path dat = copy("delimited/absorbance.csv", "spectrum.dat");
        assertEquals("vague", registry.choose(dat).contribution().id());
        assertThrows(IllegalArgumentException.class, () -> registry.register("vague", "Again", always));
    }
}
