package org.tracegas.quantify;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * Absorbance reference spectrum of one compound at a known amount.
 *
 * @param compound   compound name
 * @param absorbance decadic absorbance spectrum on a wavenumber axis
 * @param ppmMetres  concentration times optical path of the reference, in ppm·m, positive
 */
public record ReferenceSpectrum(String compound, Spectrum absorbance, double ppmMetres) {

    /** @throws IllegalArgumentException naming the field that is wrong */
    public ReferenceSpectrum {
        CompoundNames.require(compound, "compound");
        if (absorbance == null) {
            throw new IllegalArgumentException("absorbance of reference " + compound + " must not be null");
        }
        if (absorbance.ordinate() != Ordinate.ABSORBANCE) {
            throw new IllegalArgumentException("absorbance of reference " + compound
                    + " must have ordinate ABSORBANCE, was " + absorbance.ordinate());
        }
        if (absorbance.axis().unit() != AxisUnit.WAVENUMBER) {
            throw new IllegalArgumentException("absorbance of reference " + compound
                    + " must be on a WAVENUMBER axis, was " + absorbance.axis().unit());
        }
        for (int i = 0; i < absorbance.size(); i++) {
            if (!Double.isFinite(absorbance.get(i))) {
                throw new IllegalArgumentException("absorbance of reference " + compound + " is not finite at index "
                        + i);
            }
        }
        if (!(ppmMetres > 0 && Double.isFinite(ppmMetres))) {
            throw new IllegalArgumentException("ppmMetres of reference " + compound
                    + " must be positive and finite, was " + ppmMetres);
        }
    }
}
