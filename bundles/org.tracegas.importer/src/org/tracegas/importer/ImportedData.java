package org.tracegas.importer;

import java.util.List;

/**
 * Everything read from one file. A reader returns this only when the whole file was read; otherwise it throws
 * {@link ImportException}, so nothing is ever half imported.
 *
 * @param source  the file name as given to the reader
 * @param format  short name of the format, for example "JCAMP-DX 5.01"
 * @param records the spectra and interferograms in file order, at least one
 */
public record ImportedData(String source, String format, List<ImportedRecord> records) {

    public ImportedData {
        if (source == null || format == null) {
            throw new IllegalArgumentException("source and format must not be null");
        }
        if (records == null || records.isEmpty()) {
            throw new IllegalArgumentException("records must hold at least one record");
        }
        records = List.copyOf(records);
    }
}
