package org.tracegas.method;

import java.util.Set;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.PhaseCorrection;
import org.tracegas.preprocess.Sidedness;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.preprocess.ZpdSearch;

/**
 * The {@code [transform]} block of a method file and of a stored method version: how interferograms become
 * single beams. Keys left out take the values of {@link TransformSettings#defaults()}.
 *
 * <pre>
 * apodization = norton-beer-medium
 * phase-correction = mertz          (mertz, magnitude)
 * sidedness = double-sided          (single-sided, double-sided)
 * zero-fill = 1                     (1, 2, 4, 8)
 * range = 700..3900                 cm-1
 * phase-points = 256
 * zpd-search = largest-magnitude    (largest-magnitude, burst-centre)
 * </pre>
 */
public final class TransformText {

    static final Set<String> KEYS = Set.of("apodization", "phase-correction", "sidedness", "zero-fill", "range",
            "phase-points", "zpd-search");

    private TransformText() {
    }

    public static TransformSettings read(KeyValueFile.Section s) throws FileFormatException {
        s.allow(KEYS);
        TransformSettings d = TransformSettings.defaults();
        double[] range = s.has("range") ? s.value("range").range()
                : new double[] { d.lowWavenumber(), d.highWavenumber() };
        try {
            return new TransformSettings(s.constant("apodization", Apodization.class, d.apodization()),
                    s.integer("zero-fill", d.zeroFillFactor()),
                    s.constant("phase-correction", PhaseCorrection.class, d.phaseCorrection()),
                    s.constant("zpd-search", ZpdSearch.class, d.zpdSearch()),
                    s.constant("sidedness", Sidedness.class, d.sidedness()), s.integer("phase-points", d.phasePoints()),
                    range[0], range[1]);
        } catch (IllegalArgumentException e) {
            throw s.error(keyOf(e.getMessage()), e.getMessage());
        }
    }

    /** Every setting, so that a stored version does not depend on the defaults of a later release. */
    public static String write(TransformSettings t) {
        return "apodization = " + KeyValueFile.word(t.apodization()) + "\nphase-correction = "
                + KeyValueFile.word(t.phaseCorrection()) + "\nsidedness = " + KeyValueFile.word(t.sidedness())
                + "\nzero-fill = " + t.zeroFillFactor() + "\nrange = "
                + t.lowWavenumber() + ".." + t.highWavenumber() + "\nphase-points = " + t.phasePoints()
                + "\nzpd-search = " + KeyValueFile.word(t.zpdSearch()) + "\n";
    }

    private static String keyOf(String message) {
        if (message.startsWith("zeroFillFactor")) {
            return "zero-fill";
        }
        if (message.startsWith("phasePoints")) {
            return "phase-points";
        }
        return message.contains("Wavenumber") ? "range" : "";
    }
}
