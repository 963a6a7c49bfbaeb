package org.tracegas.library;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.library.internal.CanonicalDigest;
import org.tracegas.library.internal.ReferenceSerialization;

/**
 * Immutable named set of reference spectra, possibly several per compound (several concentrations), with a
 * content hash: SHA-256 over the library name and the sorted SHA-256 digests of the canonical serialization
 * of every reference (all metadata fields, axis and values). Equal content gives an equal hash whatever the
 * order in which the references were given; any change of a value or a metadata field changes it.
 */
public final class ReferenceLibrary {

    private final String name;
    private final List<ReferenceSpectrum> references;
    private final String contentHash;

    /**
     * @throws IllegalArgumentException if the name is blank, a reference is null, or a reference occurs twice
     */
    public ReferenceLibrary(String name, List<ReferenceSpectrum> references) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("library name must not be blank");
        }
        if (references == null) {
            throw new IllegalArgumentException("references must not be null");
        }
        Map<String, ReferenceSpectrum> byDigest = new HashMap<>();
        for (int i = 0; i < references.size(); i++) {
            ReferenceSpectrum r = references.get(i);
            if (r == null) {
                throw new IllegalArgumentException("reference " + i + " is null");
            }
            if (byDigest.putIfAbsent(ReferenceSerialization.sha256(r), r) != null) {
                throw new IllegalArgumentException("reference " + i + " occurs twice: " + r.description());
            }
        }
        List<String> digests = new ArrayList<>(byDigest.keySet());
        Collections.sort(digests);
        CanonicalDigest d = new CanonicalDigest().text("name", name).count("references", digests.size());
        List<ReferenceSpectrum> ordered = new ArrayList<>();
        for (String digest : digests) {
            d.text("reference", digest);
            ordered.add(byDigest.get(digest));
        }
        ordered.sort(Comparator.comparing((ReferenceSpectrum r) -> r.compound().name())
                .thenComparingDouble(r -> r.metadata().conditions().concentrationPathLength()));
        this.name = name;
        this.references = List.copyOf(ordered);
        this.contentHash = d.hex();
    }

    public String name() {
        return name;
    }

    /** All references, ordered by compound name and then by concentration times path length. */
    public List<ReferenceSpectrum> references() {
        return references;
    }

    /** The references of one compound (matched by CAS number), lowest concentration first. */
    public List<ReferenceSpectrum> referencesFor(String casNumber) {
        return references.stream().filter(r -> r.compound().casNumber().equals(casNumber)).toList();
    }

    /** SHA-256 of the content as 64 lower-case hexadecimal digits. */
    public String contentHash() {
        return contentHash;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ReferenceLibrary l && contentHash.equals(l.contentHash);
    }

    @Override
    public int hashCode() {
        return contentHash.hashCode();
    }

    @Override
    public String toString() {
        return "ReferenceLibrary[" + name + ", " + references.size() + " references, sha256 " + contentHash + "]";
    }
}
