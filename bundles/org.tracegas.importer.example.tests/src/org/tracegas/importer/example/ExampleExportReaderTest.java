package org.tracegas.importer.example;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.importer.StandaloneExtensions;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

class ExampleExportReaderTest {

    @TempDir
    Path dir;

    private Path sample(String name) throws Exception {
        Path f = dir.resolve(name);
        try (InputStream in = getClass().getResourceAsStream("example-export-sample.txt")) {
            Files.copy(in, f);
        }
        return f;
    }

    @Test
    void readsTheExport() throws Exception {
        ImportedData d = new ExampleExportReader().read(sample("export.txt"), ImportOptions.defaults());
        ImportedSpectrum r = (ImportedSpectrum) d.records().get(0);
        Spectrum s = r.spectrum();
        assertArrayEquals(new double[] {1000.0, 1000.5, 1001.0}, s.axis().toArray(), 0.0);
        assertArrayEquals(new double[] {0.0125, 0.0130, 0.0128}, s.toArray(), 0.0);
        assertEquals(Ordinate.ABSORBANCE, s.ordinate());
        assertEquals("EX-0042", r.metadata().get("serial"));
        assertEquals(10, r.lastLine());
    }

    @Test
    void contributedThroughTheExtensionPointAndChosenByContent() throws Exception {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        IExtensionRegistry extensions = running != null ? running
                : StandaloneExtensions.fromSourceTree(getClass().getClassLoader(), "org.tracegas.importer",
                        "org.tracegas.importer.example");
        ReaderRegistry registry = ReaderRegistry.fromExtensionRegistry(extensions);
        // named .csv on purpose: the content decides
        Path f = sample("export.csv");
        assertEquals("org.tracegas.importer.example.export", registry.choose(f).contribution().id());
        assertEquals(1, registry.read(f, ImportOptions.defaults()).records().size());
    }

    @Test
    void truncatedExportNamesFileLineAndField() throws Exception {
        Path f = sample("export.txt");
        Files.writeString(f, Files.readString(f).replace("end\n", ""));
        ImportException e = assertThrows(ImportException.class, () -> new ExampleExportReader().read(f,
                ImportOptions.defaults()));
        assertEquals("data", e.field());
        assertTrue(e.getMessage().startsWith(f + ", line 9, field data"), e.getMessage());
        Files.writeString(f, "EXAMPLE FTIR EXPORT 1\nquantity: furlongs\npoints: 1\ndata:\n1 2\nend\n");
        ImportException q = assertThrows(ImportException.class, () -> new ExampleExportReader().read(f,
                ImportOptions.defaults()));
        assertEquals(2, q.line());
        assertEquals("quantity", q.field());
    }
}
