package org.tracegas.pipeline;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

import org.tracegas.importer.ImportException;
import org.tracegas.method.TransformText;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.preprocess.RatioResult;
import org.tracegas.preprocess.Recipe;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.SourcedMeasurement;

/**
 * From a stored measurement of any kind to absorbance: an absorbance as it is, a transmittance as
 * A = -log10(T), a single beam ratioed against the last background before it, an interferogram transformed as the
 * method says and then ratioed. What was done is written as the first entries of the recipe recorded with the
 * results. One per thread: the transform keeps work buffers.
 */
final class MeasurementAbsorbance {

    /** Recipe entry of the conversion from transmittance. */
    static final String FROM_TRANSMITTANCE = "absorbance-from-transmittance";
    /** Recipe entry of the ratio against a background measurement. */
    static final String RATIO = "ratio";
    /** Recipe entry of the transform of an interferogram. */
    static final String TRANSFORM = "transform";

    /** An absorbance, the entries saying how it was made, and the background's age when one was used. */
    /**
     * @param noiseFactor F of the transform that made the absorbance, 1 when it is not known
     * @param noiseOrigin where F came from
     */
    record Converted(Spectrum absorbance, List<Recipe.Entry> entries, RatioResult ratio, double noiseFactor,
            String noiseOrigin) {
    }

    private final InterferogramTransform transform;
    private final String transformText;
    private final BackgroundRatio ratio = new BackgroundRatio();
    private final BackgroundTimeline backgrounds;

    /** @param backgrounds null when the project holds no background */
    MeasurementAbsorbance(InterferogramTransform transform, BackgroundTimeline backgrounds) {
        this.transform = transform;
        this.transformText = TransformText.write(transform.settings());
        this.backgrounds = backgrounds;
    }

    java.time.Duration ageLimit() {
        return ratio.ageLimit();
    }

    /** A background measurement as the single beam the samples are ratioed against. */
    static Background background(SourcedMeasurement m, Spectrum values, InterferogramTransform transform)
            throws ImportException {
        Spectrum singleBeam = switch (m.content()) {
            case SINGLE_BEAM -> values;
            case INTERFEROGRAM -> transform.singleBeam(interferogram(m, values));
            default -> throw error(m, "kind", "a background must be a single beam or an interferogram, this is "
                    + m.content().getName().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        };
        return new Background(m.measurement().id(), m.measurement().time(), singleBeam);
    }

    /** @throws ImportException naming the measurement's file and record when it cannot become absorbance */
    Converted convert(SourcedMeasurement m, Spectrum values) throws ImportException {
        return switch (m.content()) {
            case ABSORBANCE -> new Converted(values, List.of(), null, 1.0, ResultCorrection.NO_TRANSFORM);
            case TRANSMITTANCE -> {
                double[] a = new double[values.size()];
                for (int i = 0; i < a.length; i++) {
                    double t = values.get(i);
                    a[i] = t > 0 ? -Math.log10(t) : Double.NaN;
                }
                yield new Converted(values.withValues(a, Ordinate.ABSORBANCE),
                        List.of(new Recipe.Entry(FROM_TRANSMITTANCE, new TreeMap<>())), null, 1.0,
                        "transmittance imported as such: its transform is unknown; F = 1 taken");
            }
            case SINGLE_BEAM -> ratioed(m, values, List.of(), 1.0,
                    "single beam imported as such: its transform is unknown; F = 1 taken");
            case INTERFEROGRAM -> {
                Interferogram igm = interferogram(m, values);
                Spectrum singleBeam = transform.singleBeam(igm);
                yield ratioed(m, singleBeam,
                        List.of(new Recipe.Entry(TRANSFORM, new TreeMap<>(Map.of("settings", transformText)))),
                        transform.noiseVarianceFactor(igm), ResultCorrection.transformOrigin(transform.settings()));
            }
            default -> throw error(m, "content", "cannot be quantified: " + m.content());
        };
    }

    private Converted ratioed(SourcedMeasurement m, Spectrum singleBeam, List<Recipe.Entry> before,
            double noiseFactor, String noiseOrigin) throws ImportException {
        if (backgrounds == null) {
            throw error(m, "background", "a " + m.content().getName().toLowerCase(java.util.Locale.ROOT)
                    .replace('_', ' ') + " needs a background measurement before it; the project holds none");
        }
        Background background;
        try {
            background = backgrounds.latestBefore(m.measurement().time());
        } catch (IllegalArgumentException e) {
            throw error(m, "background", e.getMessage());
        }
        RatioResult r;
        try {
            r = ratio.absorbance(singleBeam, m.measurement().time(), background);
        } catch (IllegalArgumentException e) {
            throw error(m, "axis", e.getMessage());
        }
        List<Recipe.Entry> entries = new ArrayList<>(before);
        SortedMap<String, String> p = new TreeMap<>(Map.of("background", background.id()));
        entries.add(new Recipe.Entry(RATIO, p));
        return new Converted(r.spectrum(), entries, r, noiseFactor, noiseOrigin);
    }

    private static Interferogram interferogram(SourcedMeasurement m, Spectrum values) throws ImportException {
        String laser = m.labels().get(FileMeasurements.LASER);
        String sampling = m.labels().get(FileMeasurements.SAMPLING);
        if (laser == null || sampling == null) {
            throw error(m, FileMeasurements.LASER, "the interferogram was imported without its laser wavenumber"
                    + " and sampling interval");
        }
        return new Interferogram(values.toArray(), Double.parseDouble(laser), Integer.parseInt(sampling));
    }

    static ImportException error(SourcedMeasurement m, String field, String reason) {
        return new ImportException(m.fileName(), m.recordIndex() + 1L, field, "(measurement " + m.title() + ") "
                + reason);
    }
}
