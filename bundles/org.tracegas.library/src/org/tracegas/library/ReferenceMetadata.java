package org.tracegas.library;

/**
 * Immutable description of one reference spectrum.
 *
 * @param compound            what the spectrum shows
 * @param conditions          amount, cell state and instrument settings
 * @param origin              measured, synthetic or imported, with a free text
 * @param relativeUncertainty relative standard uncertainty of the absorbance scale (0.02 for 2 %), in [0, 1)
 */
public record ReferenceMetadata(Compound compound, ReferenceConditions conditions, Origin origin,
        double relativeUncertainty) {

    public ReferenceMetadata {
        if (compound == null) {
            throw new IllegalArgumentException("compound must not be null");
        }
        if (conditions == null) {
            throw new IllegalArgumentException("conditions must not be null");
        }
        if (origin == null) {
            throw new IllegalArgumentException("origin must not be null");
        }
        if (!(relativeUncertainty >= 0 && relativeUncertainty < 1)) {
            throw new IllegalArgumentException("relativeUncertainty must lie in [0, 1), was " + relativeUncertainty);
        }
    }
}
