package org.tracegas.pipeline;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.tracegas.library.ReferenceConditions;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.model.Results;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.qa.basis.CellConditions;
import org.tracegas.qa.basis.ConditionOrigin;
import org.tracegas.qa.basis.ConditionValue;
import org.tracegas.qa.basis.ConditionsCorrection;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.SpectrumResult;

/**
 * The results of one fitted spectrum as a workspace stores them, each corrected from its references' cell
 * conditions to the sample cell's ({@link ConditionsCorrection}) and with the noise factor of the transform that
 * made the spectrum. The correction scales concentration, uncertainty and detection limit alike: it is a known
 * factor, whose own uncertainty (of the cell's thermometer and gauge) is not propagated here. The sample path
 * is the method's nominal path, so L_r/L_s = 1, unless the method takes it from the campaign's CTS readings
 * ({@link #withCtsPath}), whose effective path then gives L_s and is stored as the path's origin.
 * <p>
 * A method whose references came without their conditions gives results without a correction, as before.
 */
public final class ResultCorrection {

    /** Where F comes from for absorbance imported as such. */
    static final String NO_TRANSFORM = "absorbance imported as such: its transform is unknown; F = 1 taken";

    private static final ResultCorrection NONE = new ResultCorrection(Map.of(), 1.0, 1.0, PathOrigin.NOMINAL);

    private final Map<String, ConditionsCorrection> byCompound;
    private final double fitPathM;
    private final double samplePathM;
    private final PathOrigin pathOrigin;

    private ResultCorrection(Map<String, ConditionsCorrection> byCompound, double fitPathM, double samplePathM,
            PathOrigin pathOrigin) {
        this.byCompound = Map.copyOf(byCompound);
        this.fitPathM = fitPathM;
        this.samplePathM = samplePathM;
        this.pathOrigin = pathOrigin;
    }

    /**
     * The same correction to a sample cell of the effective path a CTS measured.
     *
     * @throws IllegalArgumentException if the path is not positive and finite, or there is no correction (a method
     *                                  whose references came without their conditions)
     */
    public ResultCorrection withCtsPath(double pathM) {
        if (!(pathM > 0 && Double.isFinite(pathM))) {
            throw new IllegalArgumentException("the CTS-derived path must be positive and finite, was " + pathM);
        }
        if (byCompound.isEmpty()) {
            throw new IllegalArgumentException("the method's references came without their conditions: its results "
                    + "are not corrected, so a CTS-derived path cannot be applied");
        }
        return new ResultCorrection(byCompound, fitPathM, pathM, PathOrigin.CTS_DERIVED);
    }

    /** Where the sample path L_s comes from. */
    PathOrigin pathOrigin() {
        return pathOrigin;
    }

    /** No correction: results as fitted. */
    public static ResultCorrection none() {
        return NONE;
    }

    /**
     * The correction of a method's results: from the cell conditions of each compound's references.
     *
     * @throws IllegalArgumentException when the references of one compound were recorded at different temperatures
     *                                  or pressures (a result is corrected from one reference state)
     */
    public static ResultCorrection of(StoredMethod method) {
        if (method.referenceConditions().isEmpty()) {
            return NONE;
        }
        List<ReferenceSpectrum> references = method.method().references();
        Map<String, ReferenceConditions> first = new HashMap<>();
        Map<String, ConditionsCorrection> corrections = new HashMap<>();
        for (int i = 0; i < references.size(); i++) {
            String compound = references.get(i).compound();
            ReferenceConditions c = method.referenceConditions().get(i);
            ReferenceConditions seen = first.putIfAbsent(compound, c);
            if (seen != null && (seen.temperature() != c.temperature() || seen.pressure() != c.pressure())) {
                throw new IllegalArgumentException("the references of " + compound + " were recorded at "
                        + seen.temperature() + " K, " + seen.pressure() + " kPa and at " + c.temperature() + " K, "
                        + c.pressure() + " kPa: a result is corrected from one reference temperature and pressure");
            }
            corrections.put(compound, new ConditionsCorrection(c.temperature(), c.pressure(),
                    method.method().pathLengthMetres()));
        }
        return new ResultCorrection(corrections, method.method().pathLengthMetres(),
                method.method().pathLengthMetres(), PathOrigin.NOMINAL);
    }

    /**
     * C_corr / C_calc, by which {@link #results} scales a compound's result fitted in a cell at a temperature and
     * pressure; 1 for a compound without a correction. Where the temperature and pressure came from is recorded
     * with a stored result only: it does not enter the factor, so it is not asked for here.
     */
    public double factor(String compound, double cellTemperatureK, double cellPressureKPa) {
        ConditionsCorrection correction = byCompound.get(compound);
        return correction == null ? 1.0
                : correction.factor(new CellConditions(new ConditionValue(cellTemperatureK,
                        ConditionOrigin.INSTRUMENT_CHANNEL), new ConditionValue(cellPressureKPa,
                                ConditionOrigin.INSTRUMENT_CHANNEL), samplePathM, pathOrigin));
    }

    /**
     * The factor by which a fit's standard uncertainties are enlarged for a transform's noise variance factor F:
     * sqrt(F), never below 1, so that no fit claims less than its white-noise uncertainty (a transform that
     * samples the spectrum more coarsely than its resolution gives F below 1).
     */
    static double noiseCorrelation(double noiseVarianceFactor) {
        return Math.max(1.0, Math.sqrt(noiseVarianceFactor));
    }

    /** Where F comes from for a spectrum the method's transform made from an interferogram. */
    static String transformOrigin(TransformSettings t) {
        return "transform of the method: " + name(t.apodization()) + "; zero filling " + t.zeroFillFactor() + "; "
                + name(t.sidedness());
    }

    /**
     * @param temperature the sample cell's temperature in K, with where it came from
     * @param pressure    the sample cell's pressure in kPa, with where it came from
     * @param noiseFactor F of the spectrum's transform
     * @param noiseOrigin where F came from
     */
    List<Result> results(SpectrumResult result, AnalysisVersions versions, ConditionValue temperature,
            ConditionValue pressure, double noiseFactor, String noiseOrigin) {
        Provenance provenance = versions.provenance(result.record());
        List<Result> rows = new ArrayList<>(result.compounds().size());
        for (CompoundResult c : result.compounds()) {
            ConditionsCorrection correction = byCompound.get(c.compound());
            double factor = 1.0;
            ResultConditions conditions = null;
            if (correction != null) {
                CellConditions cell = new CellConditions(temperature, pressure, samplePathM, pathOrigin);
                ConditionsCorrection.CorrectedConcentration corrected = correction.correct(c.concentration(), cell);
                factor = corrected.factor();
                conditions = new ResultConditions(temperature.value(), name(temperature.origin()), pressure.value(),
                        name(pressure.origin()), cell.pathM(), name(cell.pathOrigin()),
                        corrected.referenceTemperatureK(), corrected.referencePressureKPa(), corrected.fitPathM(),
                        factor, noiseFactor, noiseOrigin);
            }
            rows.add(Results.of(null, c.compound(), c.concentration() * factor, c.standardUncertainty() * factor,
                    c.detectionLimit() * factor, "ppm", FlagMapping.toStored(c.flags()), provenance, conditions));
        }
        return rows;
    }

    private static String name(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
