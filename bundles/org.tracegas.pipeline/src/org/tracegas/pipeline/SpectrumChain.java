package org.tracegas.pipeline;

import java.util.Queue;
import java.util.concurrent.ConcurrentLinkedQueue;

import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.preprocess.RatioResult;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.spectrum.Spectrum;

/**
 * From a recorded interferogram to the absorbance the fit works on: transform to a single beam, ratio against
 * the last background before it. Safe for any number of threads, so that a batch transforms on all cores: a
 * transform keeps its plan and work buffers, so each call borrows one that no other thread is using (the same
 * settings) and gives it back afterwards; plans are made once per thread working at the same time, not per call.
 */
public final class SpectrumChain {

    private final InterferogramTransform transform;
    /** Transforms not in use; one more is made when a thread finds none. */
    private final Queue<InterferogramTransform> idle = new ConcurrentLinkedQueue<>();
    private final BackgroundRatio ratio;
    private final BackgroundTimeline backgrounds;

    public SpectrumChain(InterferogramTransform transform, BackgroundRatio ratio, BackgroundTimeline backgrounds) {
        this.transform = transform;
        idle.add(transform);
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
        InterferogramTransform borrowed = idle.poll();
        if (borrowed == null) {
            borrowed = transform.withOwnBuffers();
        }
        try {
            return process(record, borrowed);
        } finally {
            idle.add(borrowed);
        }
    }

    private MeasuredSpectrum process(ContainerRecord record, InterferogramTransform transform) {
        AcquisitionHeader h = record.header();
        Spectrum singleBeam = transform.singleBeam(record.interferogram());
        RatioResult absorbance = ratio.absorbance(singleBeam, h.time(), backgrounds.latestBefore(h.time()));
        return new MeasuredSpectrum(h.time(), h.extra().getOrDefault(MeasurementRole.KEY, MeasurementRole.SAMPLE),
                h.cellTemperatureK(), h.cellPressureHpa() / 10.0, absorbance,
                transform.noiseVarianceFactor(record.interferogram()));
    }
}
