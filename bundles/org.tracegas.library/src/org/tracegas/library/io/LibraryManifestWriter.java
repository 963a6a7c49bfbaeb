package org.tracegas.library.io;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Stream;

import org.tracegas.library.Compound;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.spectrum.Spectrum;

/**
 * Writes a reference library as a folder: the manifest that {@link LibraryManifestReader} reads, named
 * {@value #MANIFEST}, and one two-column text file per reference. Numbers are written in the shortest decimal
 * form that reads back to the same double, so the library read back holds the same values. The folder appears
 * whole or not at all: it is written under a temporary sibling name and renamed when complete.
 */
public final class LibraryManifestWriter {

    /** File name of the manifest in a library folder. */
    public static final String MANIFEST = "library.manifest";

    /**
     * @param folder the library folder to make; it must not exist yet
     * @return the manifest written
     * @throws IOException if the folder exists or a file cannot be written (nothing is left behind)
     */
    public Path write(ReferenceLibrary library, Path folder) throws IOException {
        if (Files.exists(folder)) {
            throw new IOException(folder + ": the library folder exists already; choose a new folder");
        }
        Path partial = folder.resolveSibling(folder.getFileName() + ".part");
        deleteTree(partial);
        Files.createDirectories(partial);
        try {
            StringBuilder manifest = new StringBuilder();
            manifest.append("library = ").append(oneLine(library.name(), "library name")).append("\n");
            Set<String> names = new HashSet<>();
            for (ReferenceSpectrum r : library.references()) {
                String file = fileName(r, names);
                writeSpectrum(r.spectrum(), partial.resolve(file));
                block(manifest, r, file);
            }
            Files.writeString(partial.resolve(MANIFEST), manifest, StandardCharsets.UTF_8);
            Files.move(partial, folder, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException | RuntimeException e) {
            deleteTree(partial);
            throw e;
        }
        return folder.resolve(MANIFEST);
    }

    private static void block(StringBuilder m, ReferenceSpectrum r, String file) {
        Compound c = r.compound();
        ReferenceConditions k = r.metadata().conditions();
        m.append("\n[reference]\n");
        m.append("file = ").append(file).append('\n');
        m.append("compound = ").append(oneLine(c.name(), "compound")).append('\n');
        m.append("cas = ").append(c.casNumber()).append('\n');
        m.append("formula = ").append(oneLine(c.formula(), "formula")).append('\n');
        m.append("molar-mass = ").append(c.molarMass()).append('\n');
        m.append("ppm-m = ").append(k.concentrationPathLength()).append('\n');
        m.append("temperature = ").append(k.temperature()).append('\n');
        m.append("pressure = ").append(k.pressure()).append('\n');
        m.append("resolution = ").append(k.resolution()).append('\n');
        m.append("apodization = ").append(oneLine(k.apodization(), "apodization")).append('\n');
        m.append("origin = ").append(r.metadata().origin().kind().name().toLowerCase(Locale.ROOT)).append('\n');
        if (!r.metadata().origin().description().isEmpty()) {
            m.append("origin-text = ").append(oneLine(r.metadata().origin().description(), "origin text"))
                    .append('\n');
        }
        m.append("uncertainty = ").append(r.metadata().relativeUncertainty()).append('\n');
    }

    /**
     * A file name from the compound and its amount as a person writes it (six significant digits, so an amount
     * computed as 29.099999999999998 is named 29.1), made unique within the folder; the manifest keeps the exact
     * amount.
     */
    static String fileName(ReferenceSpectrum r, Set<String> taken) {
        String amount = new BigDecimal(r.metadata().conditions().concentrationPathLength())
                .round(new MathContext(6)).stripTrailingZeros().toPlainString();
        String base = (r.compound().formula() + "-" + amount).toLowerCase(Locale.ROOT)
                .replaceAll("[^a-z0-9.+-]", "_");
        String name = base + ".txt";
        for (int i = 2; !taken.add(name); i++) {
            name = base + "-" + i + ".txt";
        }
        return name;
    }

    private static void writeSpectrum(Spectrum s, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("# wavenumber (cm-1), decadic absorbance\n");
            for (int i = 0; i < s.size(); i++) {
                w.write(Double.toString(s.axis().get(i)));
                w.write(' ');
                w.write(Double.toString(s.get(i)));
                w.write('\n');
            }
        }
    }

    /** A manifest value is one line; a line break would start a new key. */
    private static String oneLine(String text, String field) {
        if (text.contains("\n") || text.contains("\r")) {
            throw new IllegalArgumentException(field + " '" + text + "' holds a line break");
        }
        return text.strip();
    }

    /** Removes a library folder this writer made, with its files. */
    public static void delete(Path folder) throws IOException {
        deleteTree(folder);
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> all = Files.walk(root)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
