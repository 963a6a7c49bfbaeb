package org.tracegas.quantify.linelist;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.PreparedFit;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.quantify.internal.SystemsFit;
import org.tracegas.quantify.linelist.internal.AtMeasuredConditions;
import org.tracegas.quantify.linelist.internal.ConditionCell;
import org.tracegas.quantify.linelist.internal.LineListSystem;
import org.tracegas.quantify.linelist.internal.MixtureModel;
import org.tracegas.quantify.linelist.internal.SetupSettings;
import org.tracegas.spectrum.SpectralAxis;

/**
 * Fits the sample with spectra computed from line lists at the cell's conditions, after Griffith, Appl. Spectrosc.
 * 50, 59 (1996): the monochromatic transmittance of the whole mixture, the product of every compound's
 * exp(-tau), computed line by line on a fine grid at the cell's temperature, pressure and path, then seen through
 * the instrument (line shape of the apodization and maximum path difference, field-of-view broadening) and turned
 * into absorbance. All amounts, the baselines and (with {@link ShiftTerm#SCALE}) a relative wavenumber scale are
 * fitted together by Levenberg-Marquardt; the uncertainty comes from the final Jacobian. Needs no reference
 * spectra, so no amount is outside a calibrated range.
 * <p>
 * Installed through the extension point, the algorithm takes its setup from the method's {@link
 * QuantificationMethod#algorithmSettings() settings} (a method file's {@code [line-list]} block with the
 * method's apodization and resolution), so the method's text and hash bind the line lists (by SHA-256), the cell's
 * conditions and the instrument; each line list is read and checked when the method is prepared. Created with a
 * setup, it uses that setup and ignores the method's settings.
 * <p>
 * With {@link LineListSetup#measuredConditions()} the spectra are computed at each sample's own measured cell
 * temperature and pressure ({@link AtMeasuredConditions}, interpolated between conditions computed once per
 * {@link ConditionCell}); the method is still prepared, and so checked, at the stated ones.
 */
public final class LineListAlgorithm implements FitAlgorithm {

    /** The name in method files and stored method versions. */
    public static final String NAME = "line-list";

    /** Null when the setup comes from each method's settings. */
    private final LineListSetup setup;

    /** The algorithm that builds its setup from each method's settings; the one the extension point installs. */
    public LineListAlgorithm() {
        this.setup = null;
    }

    public LineListAlgorithm(LineListSetup setup) {
        if (setup == null) {
            throw new IllegalArgumentException("setup must not be null");
        }
        this.setup = setup;
    }

    /** The setup given at creation; empty when each method's settings give it. */
    public java.util.Optional<LineListSetup> setup() {
        return java.util.Optional.ofNullable(setup);
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Set<ShiftTerm> shiftTerms() {
        return Set.of(ShiftTerm.SCALE);
    }

    @Override
    public boolean fitsReferences() {
        return false;
    }

    /**
     * @throws IllegalArgumentException also if the setup has no line list of a compound the method fits, or (setup
     *                                  from the method) a setting is missing or malformed or a line list cannot be
     *                                  read or has another SHA-256 than the method states
     */
    @Override
    public PreparedFit prepare(QuantificationMethod method, SpectralAxis axis) {
        LineListSetup setup = this.setup != null ? this.setup : SetupSettings.read(method);
        for (String compound : method.fittedCompounds()) {
            if (!setup.models().containsKey(compound)) {
                throw new IllegalArgumentException("method " + method.name() + " fits " + compound
                        + ", of which the line-list setup has no line list; it has "
                        + new java.util.TreeSet<>(setup.models().keySet()));
            }
        }
        SystemsFit stated = systems(method, axis, setup, (label, models, low, high) -> new MixtureModel(models,
                setup.temperature(), setup.pressure(), method.pathLengthMetres(), setup.lineShape(),
                setup.fieldOfView(), low, high));
        return setup.measuredConditions() ? new AtMeasuredConditions(method.name(), stated, (t0, p0) -> {
            // one cell per fit, made when its first sample comes
            Map<String, ConditionCell> cells = new ConcurrentHashMap<>();
            return (t, p) -> systems(method, axis, setup, (label, models, low, high) -> cells.computeIfAbsent(label,
                    l -> new ConditionCell(models, t0, p0, method.pathLengthMetres(), setup.lineShape(),
                            setup.fieldOfView(), low, high)).at(t, p));
        }) : stated;
    }

    /** Gives the mixture's model of one fit, named by its label: its compounds' models, read within [low, high]. */
    @FunctionalInterface
    private interface Mixtures {
        MixtureModel of(String label, List<LineByLineModel> models, double low, double high);
    }

    private static SystemsFit systems(QuantificationMethod method, SpectralAxis axis, LineListSetup setup,
            Mixtures mixtures) {
        return new SystemsFit(method, axis, (label, compounds, points, wavenumbers) -> {
            List<LineByLineModel> models = new ArrayList<>();
            compounds.forEach(c -> models.add(setup.models().get(c)));
            double low = Double.POSITIVE_INFINITY;
            double high = Double.NEGATIVE_INFINITY;
            for (int j = 0; j < points.size(); j++) {
                low = Math.min(low, wavenumbers[points.row(j)]);
                high = Math.max(high, wavenumbers[points.row(j)]);
            }
            return new LineListSystem(label, compounds, mixtures.of(label, models, low, high), points, wavenumbers,
                    method.shiftTerm() == ShiftTerm.SCALE, method.tolerance(), method.maxIterations());
        });
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LineListAlgorithm a && java.util.Objects.equals(a.setup, setup);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hashCode(setup);
    }

    @Override
    public String toString() {
        return NAME;
    }
}
