package org.tracegas.importer.jcamp;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportReader;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedRecord;
import org.tracegas.importer.Recognition;
import org.tracegas.importer.internal.WholeFile;
import org.tracegas.importer.jcamp.internal.Block;
import org.tracegas.importer.jcamp.internal.BlockAssembler;
import org.tracegas.importer.jcamp.internal.BlockConverter;
import org.tracegas.importer.jcamp.internal.LdrScanner;

/**
 * Reads JCAMP-DX 4.24 and 5.01 files (IUPAC): infrared spectra and interferograms in ##XYDATA (AFFN, PAC, SQZ,
 * DIF, DUP and mixtures), ##XYPOINTS and ##PEAK TABLE, single or linked blocks. Every block of the file
 * becomes one record.
 */
public final class JcampReader implements ImportReader {

    /**
     * Most points of one block: 2^23, eight times the largest FTIR spectra in use (common practice, no
     * source). Repeat counts (DUP) could otherwise expand a few bytes into more points than memory holds.
     */
    public static final int MAX_POINTS = 1 << 23;

    @Override
    public Recognition recognise(byte[] head, String fileName) {
        String text = WholeFile.headText(head).replace("\uFEFF", "").replace("\u00EF\u00BB\u00BF", "").stripLeading();
        if (!text.startsWith("##")) {
            return Recognition.no("does not start with a JCAMP-DX label");
        }
        String upper = text.toUpperCase(java.util.Locale.ROOT);
        if (upper.startsWith("##TITLE") && upper.contains("##JCAMP")) {
            return new Recognition(0.95, "starts with ##TITLE= and names a JCAMP-DX version");
        }
        return new Recognition(0.5, "starts with a JCAMP-DX label");
    }

    @Override
    public ImportedData read(Path file, ImportOptions options) throws ImportException {
        return read(WholeFile.readText(file, options), file.toString());
    }

    /**
     * Reads JCAMP-DX text already in memory.
     *
     * @param source file name used in error messages
     */
    public ImportedData read(String text, String source) throws ImportException {
        if (text.isBlank()) {
            throw new ImportException(source, 0, "file", "is empty");
        }
        List<Block> blocks = BlockAssembler.assemble(LdrScanner.scan(text, source), source);
        BlockConverter converter = new BlockConverter(source, MAX_POINTS);
        List<ImportedRecord> records = new ArrayList<>();
        for (Block block : blocks) {
            converter.convert(block, records);
        }
        String version = blocks.get(0).find("JCAMPDX").fullValue().trim();
        return new ImportedData(source, "JCAMP-DX " + version, records);
    }
}
