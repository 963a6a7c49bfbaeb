package org.tracegas.pipeline;

import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.preprocess.RatioResult;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.spectrum.Spectrum;

/**
 * From a recorded interferogram to the absorbance the fit works on: transform to a single beam, ratio against
 * the last background before it. One chain per thread: the transform keeps work buffers.
 */
public final class SpectrumChain {

    private final InterferogramTransform transform;
    private final BackgroundRatio ratio;
    private final BackgroundTimeline backgrounds;

    public SpectrumChain(InterferogramTransform transform, BackgroundRatio ratio, BackgroundTimeline backgrounds) {
        this.transform = transform;
        this.ratio = ratio;
        this.backgrounds = backgrounds;
    }

    /** The settings of the transform, which the noise factor of each spectrum comes from. */
    public TransformSettings transformSettings() {
        return transform.settings();
    }

    public java.time.Duration backgroundAgeLimit() {
        return ratio.ageLimit();
    }

    public MeasuredSpectrum process(ContainerRecord record) {
        AcquisitionHeader h = record.header();
        Spectrum singleBeam = transform.singleBeam(record.interferogram());
        RatioResult absorbance = ratio.absorbance(singleBeam, h.time(), backgrounds.latestBefore(h.time()));
        return new MeasuredSpectrum(h.time(), h.extra().getOrDefault(MeasurementRole.KEY, MeasurementRole.SAMPLE),
                h.cellTemperatureK(), h.cellPressureHpa() / 10.0, absorbance,
                transform.noiseVarianceFactor(record.interferogram()));
    }
}
