package org.tracegas.campaign;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.model.MeasurementKind;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.store.NewResult;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.SampleEncoding;

/** A measured spectrum and its fit as the store takes them: measurement, absorbance (float32) and results. */
public final class ProcessedSpectra {

    private ProcessedSpectra() {
    }

    /** The cell pressure is stored in hPa; concentrations in ppm, pointing at the run's versions. */
    public static ProcessedSpectrum of(MeasuredSpectrum measured, SpectrumResult result, AnalysisVersions versions) {
        return new ProcessedSpectrum(MeasurementKind.SAMPLE, measured.time(), measured.cellTemperatureK(),
                measured.cellPressureKPa() * 10.0, measured.ratio().spectrum(), SampleEncoding.FLOAT32_LE,
                results(result, versions));
    }

    /** The results of a fit as the store takes them: concentrations in ppm, pointing at the run's versions. */
    public static List<NewResult> results(SpectrumResult result, AnalysisVersions versions) {
        List<NewResult> rows = new ArrayList<>(result.compounds().size());
        for (CompoundResult c : result.compounds()) {
            rows.add(new NewResult(null, c.compound(), c.concentration(), c.standardUncertainty(),
                    c.detectionLimit(), "ppm", FlagMapping.toStored(c.flags()), versions.methodVersionId(),
                    versions.libraryVersionId(), result.record().softwareVersion(), result.record().inputHash()));
        }
        return rows;
    }
}
