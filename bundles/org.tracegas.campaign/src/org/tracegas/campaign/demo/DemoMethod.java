package org.tracegas.campaign.demo;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.PhaseCorrection;
import org.tracegas.preprocess.Sidedness;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReportingUnit;
import org.tracegas.spectrum.SpectralAxis;

/**
 * The demo's analysis: how its interferograms are transformed, which synthetic references its library holds,
 * and the method that fits each analyte with its interferents in its own regions.
 */
public final class DemoMethod {

    public static final String METHOD_NAME = "Tarnbeck hot-wet stack gas, 8 analytes";
    public static final String LIBRARY_NAME = "Demo synthetic references 191 degC 0.5 cm-1 NB medium";
    public static final Apodization APODIZATION = Apodization.NORTON_BEER_MEDIUM;

    /**
     * Reference amounts relative to the nominal level: at least two per gas, so the fit can correct
     * nonlinearity; CO reaches higher because its upsets do, NH3 because its slip rises in the afternoon.
     */
    private static double[] referenceFactors(Gas gas) {
        if (gas == DemoScenario.CO) {
            return new double[] { 0.5, 1.5, 8.0 };
        }
        return gas == DemoScenario.NH3 ? new double[] { 0.5, 2.0 } : new double[] { 0.5, 1.5 };
    }

    private DemoMethod() {
    }

    /** The transform of the demo instrument's double-sided interferograms. */
    public static TransformSettings transform() {
        return TransformSettings.defaults().withApodization(APODIZATION).withSidedness(Sidedness.DOUBLE_SIDED)
                .withPhaseCorrection(PhaseCorrection.MERTZ).withZeroFillFactor(1)
                .withRange(DemoScenario.RANGE_LOW, DemoScenario.RANGE_HIGH);
    }

    /** Synthetic references of every demo gas on the axis of the processed spectra. */
    public static ReferenceLibrary library(DemoPhysics physics, SpectralAxis axis) {
        List<ReferenceSpectrum> references = new ArrayList<>();
        for (Gas gas : DemoScenario.GASES) {
            double nominal = gas == DemoScenario.SF6 ? 0.2 : gas.nominalPpm();
            for (double factor : referenceFactors(gas)) {
                references.add(physics.reference(gas, nominal * factor, axis, APODIZATION));
            }
        }
        return new ReferenceLibrary(LIBRARY_NAME, references);
    }

    /** The quantification method over a library made by {@link #library}. */
    public static QuantificationMethod method(ReferenceLibrary library) {
        QuantificationMethod.Builder b = QuantificationMethod.builder(METHOD_NAME)
                .pathLengthMetres(DemoScenario.PATH_LENGTH).nonlinearity(true).reportingUnit(ReportingUnit.PPM)
                // a part in a million of the amount is far below the noise; a tighter tolerance only costs iterations
                .tolerance(1e-6);
        b.analyte(new Analyte("CO", List.of("CO2", "N2O"), List.of(AnalysisRegion.of(2040, 2140, 1))));
        b.analyte(new Analyte("CO2", List.of("H2O"), List.of(AnalysisRegion.of(3560, 3660, 1))));
        b.analyte(new Analyte("NO", List.of("H2O"), List.of(AnalysisRegion.of(1840, 1940, 1))));
        b.analyte(new Analyte("N2O", List.of("CO", "CO2"), List.of(AnalysisRegion.of(2190, 2260, 1))));
        b.analyte(new Analyte("NH3", List.of("H2O", "SF6"), List.of(AnalysisRegion.of(900, 1020, 1))));
        b.analyte(new Analyte("HCl", List.of("CH4", "H2O"), List.of(AnalysisRegion.of(2700, 2960, 1))));
        b.analyte(new Analyte("CH4", List.of("HCl", "H2O"), List.of(AnalysisRegion.of(2960, 3100, 1))));
        b.analyte(new Analyte("H2O", List.of("NO"), List.of(AnalysisRegion.of(1700, 1800, 1))));
        b.analyte(new Analyte("SF6", List.of("NH3", "H2O"), List.of(AnalysisRegion.of(935, 960, 1))));
        for (ReferenceSpectrum r : library.references()) {
            b.reference(new org.tracegas.quantify.ReferenceSpectrum(r.compound().name(), r.spectrum(),
                    r.metadata().conditions().concentrationPathLength()));
        }
        return b.build();
    }
}
