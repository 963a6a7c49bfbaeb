package org.tracegas.ui.session;

import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tracegas.library.OriginKind;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.method.KeyValueFile;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.ReferenceOrigin;
import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.WorkspaceStore;

/**
 * The references of a stored library version, read from the manifest text the version keeps (see
 * {@link LibraryVersionText}), as the workspace model's {@link ReferenceSpectrum}s: the one place where the
 * workbench turns a library's reference into the model's. The spectra themselves stay in the library folder, so
 * their ranges are not known here, but every reference with its compound, origin, conditions and the SHA-256 of
 * its spectrum file is. A condition the manifest leaves to the spectrum file is NaN (a text: empty).
 */
public final class StoredLibrary {

    /** A version and its references; {@code note} says what is missing. */
    public record Listing(ContentVersion version, List<ReferenceSpectrum> references, String note) {

        public Listing {
            references = List.copyOf(references);
        }

        /** The references as rows of the library panel's columns. */
        public List<String[]> rows() {
            return references.stream().map(StoredLibrary::row).toList();
        }
    }

    private static final String NOT_STORED = "in the library folder";

    private StoredLibrary() {
    }

    /**
     * Reads the newest version of the library called {@code name}.
     *
     * @throws NoSuchObjectException when there is no such library
     */
    public static Listing latest(WorkspaceStore store, String name) {
        ContentVersion v = store.versions().latest(VersionKind.LIBRARY, name)
                .orElseThrow(() -> new NoSuchObjectException("reference library", name));
        return of(v, store.versions().content(v.getId()));
    }

    /** The references the text of a library version names, in manifest order. */
    public static Listing of(ContentVersion v, String text) {
        try {
            KeyValueFile manifest = KeyValueFile.parse(text, Path.of(v.getItemName() + " version " + v.getNumber()));
            List<KeyValueFile.Section> files = manifest.blocks(LibraryVersionText.FILES.substring(1,
                    LibraryVersionText.FILES.length() - 1));
            List<ReferenceSpectrum> references = new ArrayList<>();
            for (KeyValueFile.Section r : manifest.blocks("reference")) {
                references.add(reference(r, files));
            }
            return new Listing(v, references, references.isEmpty()
                    ? "its stored text lists no [reference] blocks (it was not recorded from a library manifest)"
                    : "");
        } catch (FileFormatException e) {
            return new Listing(v, List.of(), "its stored text cannot be read: " + e.getMessage());
        }
    }

    private static ReferenceSpectrum reference(KeyValueFile.Section r, List<KeyValueFile.Section> files)
            throws FileFormatException {
        ReferenceSpectrum s = WorkspaceFactory.eINSTANCE.createReferenceSpectrum();
        s.setCompound(r.text("compound", ""));
        s.setCasNumber(r.text("cas", ""));
        s.setPpmMetres(r.number("ppm-m", Double.NaN));
        s.setTemperature(r.number("temperature", Double.NaN));
        s.setPressure(r.number("pressure", Double.NaN));
        s.setResolution(r.number("resolution", Double.NaN));
        s.setApodization(r.text("apodization", ""));
        String origin = r.text("origin", "").strip();
        for (OriginKind k : OriginKind.values()) {
            if (k.name().equalsIgnoreCase(origin)) {
                s.setOrigin(ReferenceOrigin.get(k.name()));
            }
        }
        s.setOriginText(r.text("origin-text", ""));
        // the digest section's keys are the manifest's file names, read in lower case
        String file = r.text("file", "").toLowerCase(Locale.ROOT);
        for (KeyValueFile.Section f : files) {
            s.setContentSha256(f.text(file, ""));
        }
        return s;
    }

    /** One row of the library panel: the manifest's numbers as written, a synthetic origin in capitals. */
    private static String[] row(ReferenceSpectrum r) {
        String text = r.getOriginText();
        String origin = r.getOrigin().getName().toLowerCase(Locale.ROOT);
        return new String[] {r.getCompound(), r.getCasNumber(),
                r.getOrigin() == ReferenceOrigin.SYNTHETIC ? "SYNTHETIC — " + text
                        : text.isEmpty() ? origin : origin + " (" + text + ")",
                number(r.getPpmMetres()), number(r.getTemperature()), number(r.getPressure()),
                number(r.getResolution()), r.getApodization(), NOT_STORED};
    }

    private static String number(double value) {
        return Double.isNaN(value) ? "" : BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }
}
