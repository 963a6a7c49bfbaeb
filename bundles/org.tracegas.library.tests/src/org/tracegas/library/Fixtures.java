package org.tracegas.library;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** Small reference spectra for the tests of this package. */
final class Fixtures {

    static final Compound CO = new Compound("Carbon monoxide", "630-08-0", "CO", 28.0101);
    static final Compound CH4 = new Compound("Methane", "74-82-8", "CH4", 16.043);

    private Fixtures() {
    }

    static ReferenceSpectrum reference(Compound compound, double ppmM, double... values) {
        return reference(compound, ppmM, new Origin(OriginKind.MEASURED, "10 m cell"), values);
    }

    static ReferenceSpectrum reference(Compound compound, double ppmM, Origin origin, double... values) {
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000.0, 0.25, values.length), values,
                Ordinate.ABSORBANCE);
        return new ReferenceSpectrum(s, new ReferenceMetadata(compound,
                new ReferenceConditions(ppmM, 296.0, 101.325, 0.5, "NORTON_BEER_MEDIUM"), origin, 0.02));
    }
}
