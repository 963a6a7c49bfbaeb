package org.tracegas.method;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportReader;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.importer.jcamp.JcampReader;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryManifestReader;
import org.tracegas.library.io.ReferenceSpectrumSource;
import org.tracegas.library.io.TwoColumnTextSource;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * Reference spectra as a lab keeps them: JCAMP-DX absorbance files, whose labels may state the reference's
 * compound and conditions, or two-column text. The JCAMP-DX labels read, whatever their case, spacing and
 * punctuation: {@code ##$COMPOUND}, {@code ##CAS REGISTRY NO}, {@code ##MOLFORM} (formula), {@code ##MW}
 * (g/mol), {@code ##$PPM-M}, {@code ##$CELL TEMPERATURE} (K) or {@code ##TEMPERATURE} (°C),
 * {@code ##$CELL PRESSURE} (hPa), {@code ##RESOLUTION} (cm-1), {@code ##$APODIZATION}, {@code ##$REFERENCE
 * ORIGIN} (measured, synthetic, imported) and {@code ##$UNCERTAINTY} (relative). (The standard labels CAS
 * REGISTRY NO, MOLFORM, MW, TEMPERATURE and RESOLUTION: JCAMP-DX 4.24, from memory.)
 */
public final class LabReferenceSource implements ReferenceSpectrumSource {

    private final JcampReader jcamp = new JcampReader();
    private final TwoColumnTextSource text = new TwoColumnTextSource();

    /** A manifest reader whose references may be JCAMP-DX or two-column text files. */
    public static LibraryManifestReader manifestReader() {
        return new LibraryManifestReader(new LabReferenceSource());
    }

    @Override
    public Spectrum read(Path file) throws IOException {
        if (!isJcamp(file)) {
            return text.read(file);
        }
        Spectrum s = first(file).spectrum();
        if (s.ordinate() != Ordinate.ABSORBANCE) {
            throw new FileFormatException(file, 0, "##YUNITS", "a reference must be absorbance, this is "
                    + s.ordinate());
        }
        return s;
    }

    @Override
    public Map<String, String> conditions(Path file) throws IOException {
        if (!isJcamp(file)) {
            return Map.of();
        }
        Map<String, String> found = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : first(file).metadata().entrySet()) {
            String v = e.getValue().strip();
            switch (e.getKey().toUpperCase(Locale.ROOT).replaceAll("[^A-Z0-9]", "")) {
                case "COMPOUND" -> found.putIfAbsent("compound", v);
                case "CASREGISTRYNO", "CAS" -> found.putIfAbsent("cas", v);
                case "MOLFORM", "FORMULA" -> found.putIfAbsent("formula", v.replace(" ", ""));
                case "MW", "MOLARMASS" -> found.putIfAbsent("molar-mass", v);
                case "PPMM" -> found.putIfAbsent("ppm-m", v);
                case "CELLTEMPERATURE" -> found.put("temperature", v);
                case "TEMPERATURE" -> found.putIfAbsent("temperature", kelvinOf(file, v));
                case "CELLPRESSURE" -> found.putIfAbsent("pressure", kiloPascalOf(file, v));
                case "RESOLUTION" -> found.putIfAbsent("resolution", v);
                case "APODIZATION" -> found.putIfAbsent("apodization", v);
                case "REFERENCEORIGIN" -> found.putIfAbsent("origin", v);
                case "UNCERTAINTY" -> found.putIfAbsent("uncertainty", v);
                default -> {
                    // other labels say nothing a manifest asks
                }
            }
        }
        return found;
    }

    private static String kelvinOf(Path file, String celsius) throws FileFormatException {
        return Double.toString(number(file, "##TEMPERATURE", celsius) + 273.15);
    }

    private static String kiloPascalOf(Path file, String hectoPascal) throws FileFormatException {
        return Double.toString(number(file, "##$CELL PRESSURE", hectoPascal) / 10.0);
    }

    private static double number(Path file, String label, String value) throws FileFormatException {
        try {
            return Double.parseDouble(value);
        } catch (NumberFormatException e) {
            throw new FileFormatException(file, 0, label, "'" + value + "' is not a number");
        }
    }

    private boolean isJcamp(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return jcamp.recognise(in.readNBytes(ImportReader.HEAD_BYTES), file.getFileName().toString())
                    .recognised();
        }
    }

    private ImportedSpectrum first(Path file) throws IOException {
        ImportedData data;
        try {
            data = jcamp.read(file, ImportOptions.defaults());
        } catch (ImportException e) {
            throw new FileFormatException(file, (int) e.line(), e.field(), e.reason());
        }
        if (data.records().size() != 1 || !(data.records().get(0) instanceof ImportedSpectrum s)) {
            throw new FileFormatException(file, 0, "##XYDATA", "a reference file holds exactly one spectrum, this"
                    + " holds " + data.records().size() + " record(s)");
        }
        return s;
    }
}
