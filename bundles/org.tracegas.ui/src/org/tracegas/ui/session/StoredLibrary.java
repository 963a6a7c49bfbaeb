package org.tracegas.ui.session;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.method.KeyValueFile;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.WorkspaceStore;

/**
 * The references of a stored library version, read from the manifest text the version keeps (see
 * {@link LibraryVersionText}): the spectra themselves stay in the library folder, so their ranges are not known
 * here, but every reference with its compound, origin and conditions is.
 */
public final class StoredLibrary {

    /** A version and its references as rows of the library panel's columns; {@code note} says what is missing. */
    public record Listing(ContentVersion version, List<String[]> references, String note) {
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
        String text = store.versions().content(v.getId());
        try {
            KeyValueFile manifest = KeyValueFile.parse(text, Path.of(name + " version " + v.getNumber()));
            List<String[]> rows = new ArrayList<>();
            for (KeyValueFile.Section r : manifest.blocks("reference")) {
                String origin = r.text("origin", "");
                String originText = r.text("origin-text", "");
                rows.add(new String[] {r.text("compound", ""), r.text("cas", ""),
                        "synthetic".equalsIgnoreCase(origin) ? "SYNTHETIC — " + originText
                                : originText.isEmpty() ? origin : origin + " (" + originText + ")",
                        r.text("ppm-m", ""), r.text("temperature", ""), r.text("pressure", ""),
                        r.text("resolution", ""), r.text("apodization", ""), NOT_STORED});
            }
            return new Listing(v, List.copyOf(rows), rows.isEmpty()
                    ? "its stored text lists no [reference] blocks (it was not recorded from a library manifest)"
                    : "");
        } catch (FileFormatException e) {
            return new Listing(v, List.of(), "its stored text cannot be read: " + e.getMessage());
        }
    }
}
