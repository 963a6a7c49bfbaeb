package org.tracegas.ui.dialogs;

import java.nio.file.Path;

import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ReaderChoice;
import org.tracegas.importer.ReaderRegistry;

/**
 * What importing one file will do, found by reading it as the import will: the reader of the registry that
 * recognises it (and why), its records, and whether the file states the cell conditions or takes those the user
 * gives; or why it cannot be imported (file, line and label, as the reader says).
 *
 * @param reader     the name of the reader that recognises the file, or "none"
 * @param why        the reader's reason
 * @param records    the file's records, 0 when it cannot be read
 * @param conditions where the records' time and cell conditions come from, or what is wrong
 * @param error      null when the file can be imported
 */
record ImportPreview(String reader, String why, int records, String conditions, String error) {

    private static final String STATED = "stated in the file";

    /** Whether the file states its own conditions, so that the values given below cannot change this preview. */
    boolean independentOfValuesGiven() {
        return error == null && STATED.equals(conditions);
    }

    /** Says from the file itself whether it states its conditions, before looking at the values given. */
    static ImportPreview of(ReaderRegistry readers, Path file, FileMeasurements.Defaults given) {
        ReaderChoice choice;
        try {
            choice = readers.choose(file);
        } catch (ImportException e) {
            return new ImportPreview("none", "", 0, "", e.getMessage());
        }
        String name = choice.contribution().name();
        String why = choice.recognition().reason();
        try {
            int n = FileMeasurements.read(readers, file, FileMeasurements.Defaults.none()).measurements().size();
            return new ImportPreview(name, why, n, STATED, null);
        } catch (ImportException statesNone) {
            try {
                int n = FileMeasurements.read(readers, file, given).measurements().size();
                return new ImportPreview(name, why, n, "from the values given below", null);
            } catch (ImportException e) {
                return new ImportPreview(name, why, 0, "", e.getMessage());
            }
        }
    }
}
