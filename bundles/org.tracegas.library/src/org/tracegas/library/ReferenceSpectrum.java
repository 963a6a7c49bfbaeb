package org.tracegas.library;

import java.util.Locale;

import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/** Immutable reference: an absorbance spectrum and what it shows under which conditions. */
public final class ReferenceSpectrum {

    private final Spectrum spectrum;
    private final ReferenceMetadata metadata;

    /**
     * @throws IllegalArgumentException if an argument is null or the spectrum is not an absorbance spectrum
     */
    public ReferenceSpectrum(Spectrum spectrum, ReferenceMetadata metadata) {
        if (spectrum == null) {
            throw new IllegalArgumentException("spectrum must not be null");
        }
        if (metadata == null) {
            throw new IllegalArgumentException("metadata must not be null");
        }
        if (spectrum.ordinate() != Ordinate.ABSORBANCE) {
            throw new IllegalArgumentException("a reference spectrum must hold absorbance, was " + spectrum.ordinate());
        }
        this.spectrum = spectrum;
        this.metadata = metadata;
    }

    public Spectrum spectrum() {
        return spectrum;
    }

    public ReferenceMetadata metadata() {
        return metadata;
    }

    public Compound compound() {
        return metadata.compound();
    }

    public boolean isSynthetic() {
        return metadata.origin().isSynthetic();
    }

    /** One line for lists and logs, for example "CO 630-08-0, 200 ppm·m, 296 K, 101.3 kPa, 0.5 cm-1 ... synthetic". */
    public String description() {
        ReferenceConditions c = metadata.conditions();
        return String.format(Locale.ROOT, "%s %s, %s ppm·m, %s K, %s kPa, %s cm-1 %s, %s", compound().name(),
                compound().casNumber(), c.concentrationPathLength(), c.temperature(), c.pressure(), c.resolution(),
                c.apodization(), metadata.origin());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ReferenceSpectrum r && spectrum.equals(r.spectrum) && metadata.equals(r.metadata);
    }

    @Override
    public int hashCode() {
        return 31 * spectrum.hashCode() + metadata.hashCode();
    }

    @Override
    public String toString() {
        return "ReferenceSpectrum[" + description() + "]";
    }
}
