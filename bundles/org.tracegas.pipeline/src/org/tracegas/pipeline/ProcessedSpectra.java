package org.tracegas.pipeline;

import java.util.List;

import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Result;
import org.tracegas.qa.basis.ConditionOrigin;
import org.tracegas.qa.basis.ConditionValue;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.SampleEncoding;

/** A measured spectrum and its fit as the store takes them: measurement, absorbance (float32) and results. */
public final class ProcessedSpectra {

    private ProcessedSpectra() {
    }

    /** The cell pressure is stored in hPa; concentrations in ppm, pointing at the run's versions, as fitted. */
    public static ProcessedSpectrum of(MeasuredSpectrum measured, SpectrumResult result, AnalysisVersions versions) {
        return of(measured, result, versions, ResultCorrection.none(), "", null);
    }

    /**
     * As {@link #of(MeasuredSpectrum, SpectrumResult, AnalysisVersions)}, the results corrected to the cell
     * conditions the instrument logged with the interferogram.
     *
     * @param noiseOrigin  where the spectrum's noise factor came from
     * @param instrumentId the stored instrument that recorded the interferogram, or null when not known
     */
    static ProcessedSpectrum of(MeasuredSpectrum measured, SpectrumResult result, AnalysisVersions versions,
            ResultCorrection correction, String noiseOrigin, String instrumentId) {
        List<Result> results = correction.results(result, versions,
                new ConditionValue(measured.cellTemperatureK(), ConditionOrigin.INSTRUMENT_CHANNEL),
                new ConditionValue(measured.cellPressureKPa(), ConditionOrigin.INSTRUMENT_CHANNEL),
                measured.noiseFactor(), noiseOrigin);
        return new ProcessedSpectrum(MeasurementKind.SAMPLE, measured.time(), measured.cellTemperatureK(),
                measured.cellPressureKPa() * 10.0, measured.ratio().spectrum(), SampleEncoding.FLOAT32_LE, results,
                instrumentId);
    }

    /**
     * The results of one fitted spectrum as they are stored, with their flags, of no measurement yet (the store
     * records them for one), as fitted: not corrected to the sample cell.
     */
    public static List<Result> results(SpectrumResult result, AnalysisVersions versions) {
        return ResultCorrection.none().results(result, versions, null, null, 1.0, null);
    }
}
