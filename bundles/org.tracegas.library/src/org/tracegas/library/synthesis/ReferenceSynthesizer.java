package org.tracegas.library.synthesis;

import java.util.Locale;

import org.tracegas.library.Compound;
import org.tracegas.library.Origin;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceMetadata;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Synthetic reference spectra: the high-resolution transmittance of a {@link LineByLineModel} on a fine grid,
 * convolved with the instrument line shape of the requested resolution and apodization, sampled on the output
 * axis and turned into decadic absorbance. The result is marked {@link OriginKind#SYNTHETIC}.
 * <p>
 * The fine grid divides the output step evenly, so that output points are fine-grid points, and is fine enough
 * for both the narrowest line in range (a third of its Voigt half width) and the line shape (an eighth of the
 * resolution). It reaches {@value #MARGIN_RESOLUTIONS} resolution elements beyond each end of the output axis so
 * that lines just outside still show through the line shape's wings.
 */
public final class ReferenceSynthesizer {

    static final int MARGIN_RESOLUTIONS = 10;

    private final LineByLineModel model;
    private final Compound compound;

    public ReferenceSynthesizer(LineByLineModel model, Compound compound) {
        if (model == null || compound == null) {
            throw new IllegalArgumentException("model and compound must not be null");
        }
        this.model = model;
        this.compound = compound;
    }

    /**
     * @throws IllegalArgumentException if the band is so saturated that the line shape leaves a transmittance at
     *                                  or below zero, where no absorbance exists (the message names the wavenumber)
     */
    public ReferenceSpectrum synthesize(SynthesisRequest request) {
        SpectralAxis out = request.axis();
        AbsorptionPath path = request.path();
        double target = Math.min(request.resolution() / 8.0,
                model.narrowestHalfWidth(out.first(), out.last(), path) / 3.0);
        int factor = (int) Math.ceil(out.step() / target);
        double step = out.step() / factor;
        int margin = (int) Math.ceil(MARGIN_RESOLUTIONS * request.resolution() / step);
        SpectralAxis fine = SpectralAxis.uniform(AxisUnit.WAVENUMBER, out.first() - margin * step, step,
                (out.size() - 1) * factor + 1 + 2 * margin);
        Spectrum observed = InstrumentLineShape.forResolution(request.apodization(), request.resolution())
                .apply(model.transmittance(fine, path));
        double[] absorbance = new double[out.size()];
        for (int i = 0; i < absorbance.length; i++) {
            double t = observed.get(margin + i * factor);
            if (!(t > 0)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "transmittance %.3g at %.4f cm-1 after "
                        + "the instrument line shape: %s ppm·m saturate the band at %s cm-1 resolution", t, out.get(i),
                        path.concentrationPathLength(), request.resolution()));
            }
            absorbance[i] = -Math.log10(t);
        }
        ReferenceConditions conditions = new ReferenceConditions(path.concentrationPathLength(), path.temperature(),
                path.pressure(), request.resolution(), request.apodization().name());
        Origin origin = new Origin(OriginKind.SYNTHETIC, String.format(Locale.ROOT,
                "line by line from %s (%d lines), Voigt profile, cut-off %s, Q(T) %s, %s ppm over %s m",
                model.lines().name(), model.lines().size(), model.cutoff(), model.partitionFunction().description(),
                path.concentration(), path.pathLength()));
        return new ReferenceSpectrum(new Spectrum(out, absorbance, Ordinate.ABSORBANCE),
                new ReferenceMetadata(compound, conditions, origin, request.relativeUncertainty()));
    }
}
