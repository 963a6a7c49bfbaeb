package org.tracegas.importer.container;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportReader;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedInterferogram;
import org.tracegas.importer.ImportedRecord;
import org.tracegas.importer.Recognition;

/**
 * Imports a whole container file at once (all records in memory); files above the configured whole-file size
 * are refused, and {@link ContainerReader} streams them instead. Line numbers of the records are record numbers.
 */
public final class ContainerImportReader implements ImportReader {

    @Override
    public Recognition recognise(byte[] head, String fileName) {
        if (head.length >= 8 && Arrays.equals(Arrays.copyOf(head, 8), ContainerFormat.MAGIC)) {
            return new Recognition(1.0, "container magic bytes");
        }
        return Recognition.no("no container magic bytes");
    }

    @Override
    public ImportedData read(Path file, ImportOptions options) throws ImportException {
        try {
            long size = Files.size(file);
            if (size > options.maxWholeFileBytes()) {
                throw new ImportException(file.toString(), 0, "file size", size + " bytes exceed the limit of "
                        + options.maxWholeFileBytes() + " bytes for a whole-file import; stream the records with"
                        + " ContainerReader");
            }
        } catch (IOException e) {
            throw new ImportException(file.toString(), 0, "file", "cannot be read: " + e.getMessage(), e);
        }
        List<ImportedRecord> records = new ArrayList<>();
        try (ContainerReader reader = ContainerReader.open(file)) {
            for (ContainerRecord r = reader.readNext(); r != null; r = reader.readNext()) {
                records.add(new ImportedInterferogram(r.interferogram(), metadata(r.header()), r.number(),
                        r.number()));
            }
        } catch (IOException e) {
            throw new ImportException(file.toString(), 0, "file", "cannot be closed: " + e.getMessage(), e);
        }
        if (records.isEmpty()) {
            throw new ImportException(file.toString(), 0, "records", "the container holds no record");
        }
        return new ImportedData(file.toString(), "interferogram container " + ContainerFormat.VERSION, records);
    }

    /** The header as metadata, under the keys of the file. */
    public static Map<String, String> metadata(AcquisitionHeader h) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put(ContainerFormat.ZPD, Integer.toString(h.zpdIndex()));
        m.put(ContainerFormat.KIND, h.kind().name().toLowerCase(java.util.Locale.ROOT));
        m.put(ContainerFormat.TIME, h.time().toString());
        m.put(ContainerFormat.TEMPERATURE, Double.toString(h.cellTemperatureK()));
        m.put(ContainerFormat.PRESSURE, Double.toString(h.cellPressureHpa()));
        m.put(ContainerFormat.PATH, Double.toString(h.pathLengthM()));
        m.putAll(h.extra());
        return m;
    }
}
