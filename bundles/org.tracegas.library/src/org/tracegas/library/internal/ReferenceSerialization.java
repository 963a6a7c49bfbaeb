package org.tracegas.library.internal;

import org.tracegas.library.Compound;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceMetadata;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** Canonical SHA-256 of one reference spectrum: fields in alphabetical order of their names. */
public final class ReferenceSerialization {

    private ReferenceSerialization() {
    }

    public static String sha256(ReferenceSpectrum reference) {
        ReferenceMetadata m = reference.metadata();
        Compound c = m.compound();
        ReferenceConditions k = m.conditions();
        Spectrum s = reference.spectrum();
        SpectralAxis axis = s.axis();
        CanonicalDigest d = new CanonicalDigest();
        d.text("apodization", k.apodization());
        d.text("axis.unit", axis.unit().name());
        d.numbers("axis.values", axis.toArray());
        d.text("cas", c.casNumber());
        d.text("compound", c.name());
        d.number("concentrationPathLength", k.concentrationPathLength());
        d.text("formula", c.formula());
        d.number("molarMass", c.molarMass());
        d.text("ordinate", s.ordinate().name());
        d.text("origin.description", m.origin().description());
        d.text("origin.kind", m.origin().kind().name());
        d.number("pressure", k.pressure());
        d.number("relativeUncertainty", m.relativeUncertainty());
        d.number("resolution", k.resolution());
        d.number("temperature", k.temperature());
        d.numbers("values", s.toArray());
        return d.hex();
    }
}
