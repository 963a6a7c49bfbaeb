package org.tracegas.library.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.tracegas.library.Compound;
import org.tracegas.library.Origin;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceMetadata;
import org.tracegas.library.ReferenceSpectrum;

/**
 * Reads a reference library from a manifest, a UTF-8 text file of {@code key = value} lines:
 *
 * <pre>
 * # lines starting with '#' and empty lines are skipped
 * library = Stack gas references        (once, before the first block)
 *
 * [reference]                           (one block per reference spectrum)
 * file = co-200.txt                     spectrum file, relative to the manifest's folder
 * compound = Carbon monoxide
 * cas = 630-08-0
 * formula = CO
 * molar-mass = 28.010                   g/mol
 * ppm-m = 200                           concentration times path length, ppm·m
 * temperature = 296                     K
 * pressure = 101.325                    kPa
 * resolution = 0.5                      cm-1
 * apodization = Norton-Beer medium
 * origin = measured                     measured, synthetic or imported
 * origin-text = 10 m cell, 2024 calibration   (optional, free text)
 * uncertainty = 0.02                    relative standard uncertainty
 * </pre>
 *
 * Every key of a block is required except {@code origin-text}, unless the spectrum file states it (see
 * {@link ReferenceSpectrumSource#conditions}; the block's value wins); unknown and repeated keys are errors. The
 * spectrum files are read by the given {@link ReferenceSpectrumSource}. Errors name the manifest, the line
 * and the field; nothing is returned unless the whole manifest and all its files are good.
 */
public final class LibraryManifestReader {

    private static final String BLOCK = "[reference]";
    private static final Set<String> KEYS = Set.of("file", "compound", "cas", "formula", "molar-mass", "ppm-m",
            "temperature", "pressure", "resolution", "apodization", "origin", "origin-text", "uncertainty");

    /** Manifest key of each metadata component, to name the field of a rejected value. */
    private static final Map<String, String> KEY_OF_COMPONENT = Map.of("name", "compound", "casNumber", "cas",
            "formula", "formula", "molarMass", "molar-mass", "concentrationPathLength", "ppm-m", "temperature",
            "temperature", "pressure", "pressure", "resolution", "resolution", "apodization", "apodization",
            "relativeUncertainty", "uncertainty");

    private final ReferenceSpectrumSource source;

    public LibraryManifestReader(ReferenceSpectrumSource source) {
        if (source == null) {
            throw new IllegalArgumentException("source must not be null");
        }
        this.source = source;
    }

    /** A reader of two-column text spectra. */
    public static LibraryManifestReader forTwoColumnText() {
        return new LibraryManifestReader(new TwoColumnTextSource());
    }

    public ReferenceLibrary read(Path manifest) throws IOException {
        List<String> lines = Files.readAllLines(manifest, StandardCharsets.UTF_8);
        String name = null;
        int nameLine = 0;
        List<Block> blocks = new ArrayList<>();
        Block current = null;
        for (int i = 0; i < lines.size(); i++) {
            int lineNumber = i + 1;
            String t = lines.get(i).strip();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            if (t.equals(BLOCK)) {
                current = new Block(lineNumber);
                blocks.add(current);
                continue;
            }
            int eq = t.indexOf('=');
            if (eq < 1) {
                throw new FileFormatException(manifest, lineNumber, "", "expected 'key = value' or " + BLOCK
                        + ", found '" + t + "'");
            }
            String key = t.substring(0, eq).strip().toLowerCase(Locale.ROOT);
            String value = t.substring(eq + 1).strip();
            if (current == null) {
                if (!key.equals("library")) {
                    throw new FileFormatException(manifest, lineNumber, key,
                            "only 'library' may stand before the first " + BLOCK);
                }
                if (name != null) {
                    throw new FileFormatException(manifest, lineNumber, key, "repeats line " + nameLine);
                }
                name = requireValue(manifest, lineNumber, key, value);
                nameLine = lineNumber;
            } else {
                current.put(manifest, lineNumber, key, value);
            }
        }
        if (name == null) {
            throw new FileFormatException(manifest, 0, "library", "the library name is missing");
        }
        List<ReferenceSpectrum> references = new ArrayList<>();
        for (Block b : blocks) {
            references.add(b.toReference(manifest, source));
        }
        try {
            return new ReferenceLibrary(name, references);
        } catch (IllegalArgumentException e) {
            throw new FileFormatException(manifest, 0, "", e.getMessage());
        }
    }

    private static String keyOf(String message) {
        String component = message.split(" ", 2)[0];
        return KEY_OF_COMPONENT.getOrDefault(component, "");
    }

    private static String requireValue(Path manifest, int line, String key, String value) throws FileFormatException {
        if (value.isEmpty()) {
            throw new FileFormatException(manifest, line, key, "value is empty");
        }
        return value;
    }

    /** The key = value lines of one [reference] block, with their line numbers. */
    private static final class Block {
        private final int line;
        private final Map<String, String> values = new LinkedHashMap<>();
        private final Map<String, Integer> lineOf = new LinkedHashMap<>();
        /** What the spectrum file states, under manifest keys. */
        private Map<String, String> fromFile = Map.of();

        Block(int line) {
            this.line = line;
        }

        void put(Path manifest, int lineNumber, String key, String value) throws FileFormatException {
            if (!KEYS.contains(key)) {
                throw new FileFormatException(manifest, lineNumber, key, "unknown key; known keys are "
                        + new java.util.TreeSet<>(KEYS));
            }
            if (lineOf.containsKey(key)) {
                throw new FileFormatException(manifest, lineNumber, key, "repeats line " + lineOf.get(key));
            }
            if (!key.equals("origin-text")) {
                requireValue(manifest, lineNumber, key, value);
            }
            values.put(key, value);
            lineOf.put(key, lineNumber);
        }

        private String text(Path manifest, String key) throws FileFormatException {
            String v = values.containsKey(key) ? values.get(key) : fromFile.get(key);
            if (v == null) {
                throw new FileFormatException(manifest, line, key, "missing in the " + BLOCK + " block");
            }
            return v;
        }

        private double number(Path manifest, String key) throws FileFormatException {
            String v = text(manifest, key);
            try {
                return Double.parseDouble(v);
            } catch (NumberFormatException e) {
                throw new FileFormatException(manifest, lineOf.getOrDefault(key, line), key, "'" + v
                        + "' is not a number" + (values.containsKey(key) ? "" : " (as the spectrum file states it)"));
            }
        }

        ReferenceSpectrum toReference(Path manifest, ReferenceSpectrumSource source) throws IOException {
            Path file = manifest.toAbsolutePath().getParent().resolve(text(manifest, "file"));
            try {
                fromFile = source.conditions(file);
            } catch (NoSuchFileException e) {
                throw new FileFormatException(manifest, lineOf.get("file"), "file", "no such file: " + file);
            }
            ReferenceMetadata metadata;
            try {
                Compound compound = new Compound(text(manifest, "compound"), text(manifest, "cas"),
                        text(manifest, "formula"), number(manifest, "molar-mass"));
                ReferenceConditions conditions = new ReferenceConditions(number(manifest, "ppm-m"),
                        number(manifest, "temperature"), number(manifest, "pressure"), number(manifest, "resolution"),
                        text(manifest, "apodization"));
                Origin origin = new Origin(originKind(manifest), values.getOrDefault("origin-text", ""));
                metadata = new ReferenceMetadata(compound, conditions, origin, number(manifest, "uncertainty"));
            } catch (IllegalArgumentException e) {
                String key = keyOf(e.getMessage());
                throw new FileFormatException(manifest, lineOf.getOrDefault(key, line), key, e.getMessage());
            }
            try {
                return new ReferenceSpectrum(source.read(file), metadata);
            } catch (NoSuchFileException e) {
                throw new FileFormatException(manifest, lineOf.get("file"), "file", "no such file: " + file);
            } catch (IllegalArgumentException e) {
                throw new FileFormatException(manifest, lineOf.get("file"), "file", e.getMessage());
            }
        }

        private OriginKind originKind(Path manifest) throws FileFormatException {
            String v = text(manifest, "origin");
            for (OriginKind k : OriginKind.values()) {
                if (k.name().equalsIgnoreCase(v)) {
                    return k;
                }
            }
            throw new FileFormatException(manifest, lineOf.getOrDefault("origin", line), "origin",
                    "'" + v + "' is none of measured, synthetic, imported");
        }
    }
}
