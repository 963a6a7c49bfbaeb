package org.tracegas.ui.session;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.OperationCanceledException;

import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.model.Result;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.parts.FitDisplay;

/**
 * The spectrum stored for one measurement, as the spectrum view shows it, headed by the measurement and the
 * results stored for it (with uncertainty and flags), so that a number is never shown without its spectrum's
 * provenance.
 */
public final class MeasurementSpectrum {

    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    private MeasurementSpectrum() {
    }

    /**
     * Reads the spectrum of a measurement. Meant for a background job.
     *
     * @param label what the measurement is, e.g. "sample 2026-05-04 06:02 of RIV-2026-05"
     * @return the display, or empty when no spectrum is stored for the measurement
     * @throws OperationCanceledException when the monitor was cancelled
     */
    public static Optional<FitDisplay> read(WorkspaceStore store, Session actor, String measurementId, String label,
            IProgressMonitor monitor) {
        if (monitor.isCanceled()) {
            throw new OperationCanceledException();
        }
        ProcessedSpectrum found = store.spectra().ofMeasurement(actor, measurementId).stream().findFirst()
                .orElse(null);
        if (found == null) {
            return Optional.empty();
        }
        String results = store.results().ofMeasurement(actor, measurementId).stream()
                .map(MeasurementSpectrum::result).collect(Collectors.joining("; "));
        String title = label + " — stored " + found.getContent().getLiteral().toLowerCase(Locale.ROOT).replace('_', ' ')
                + ", fit not kept" + (results.isEmpty() ? "; no results stored" : "; " + results)
                + "; values SHA-256 " + leading(found.getSha256())
                + (found.getRecipeSha256() == null ? "" : ", recipe SHA-256 " + leading(found.getRecipeSha256()));
        return Optional.of(FitDisplay.unfitted(title, found.getSpectrum()));
    }

    /**
     * The first 16 hex digits of a SHA-256, enough to match the spectrum with its audit record (which states the
     * whole digest) in a title that stays readable.
     */
    private static String leading(String sha256) {
        return sha256.substring(0, 16) + "…";
    }

    /** What the tree and the spectrum view call a measurement: "sample 2026-05-04 06:02:00 UTC". */
    public static String label(String kind, Instant time) {
        return kind.toLowerCase(Locale.ROOT).replace('_', ' ') + " " + (time == null ? "(time unknown)"
                : SHOWN.format(time));
    }

    private static String result(Result r) {
        return String.format(Locale.ROOT, "%s %.4g ± %.2g %s%s", r.getCompound(), r.getConcentration(),
                r.getStandardUncertainty(), r.getUnit(),
                r.getFlags().isEmpty() ? "" : " " + r.getFlags());
    }
}
