package org.tracegas.pipeline;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.tracegas.importer.ImportException;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.preprocess.Recipe;
import org.tracegas.preprocess.SpectrumStep;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.qa.basis.ConditionOrigin;
import org.tracegas.qa.basis.ConditionValue;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.BackgroundAge;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.quantify.WavenumberWindow;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.MeasurementAnalysis;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Quantifies the measurements a project holds from the lab's files with a stored method version: each sample
 * not yet analysed with that version becomes absorbance (see {@link MeasurementAbsorbance}), goes through the
 * method's recipe and is fitted; its absorbance, its results and the recipe that ran are stored, a few
 * measurements per transaction. A run that stops part-way (cancelled, killed) is finished by running again: the
 * measurements analysed already are skipped. Every sample is checked before anything is stored, so bad input
 * (an axis that does not cover a method region, absorbance that is not finite inside a fit window) stops the run
 * naming the file and field, with nothing stored.
 */
public final class MeasurementQuantification {

    /** Measurements stored per transaction: a killed run loses at most this many fits. */
    public static final int BLOCK = 8;

    /** What a run will do: the samples not yet analysed with the version, and how many were. */
    public record Plan(List<Measurement> samples, int skipped, Map<String, Spectrum> pendingValues) {

        public Plan {
            samples = List.copyOf(samples);
            pendingValues = Map.copyOf(pendingValues);
        }

        /** Whether a sample of the plan is of a file not yet stored (the plan can be checked, not run). */
        public boolean pending() {
            return !pendingValues.isEmpty();
        }
    }

    /** What a run did. */
    public record Outcome(int stored, int skipped, boolean cancelled) {
    }

    private final WorkspaceStore store;
    private final Session actor;
    private final String projectId;
    private final StoredMethod method;
    private final AnalysisVersions versions;
    private ResultCorrection correction;
    private final List<SpectrumStep> steps;
    private final InterferogramTransform transform;
    private final String software;
    private final Map<SpectralAxis, Quantifier> quantifiers = new HashMap<>();
    private final String versionId;
    private MeasurementAbsorbance absorbance;
    private List<Measurement> qa = List.of();
    private List<Background> backgrounds = List.of();
    private Map<String, Spectrum> pendingSpectra = Map.of();

    /**
     * A method whose path source is CTS-derived runs only once given the path ({@link #correctToCtsPath}).
     *
     * @param registry creates the steps of the method's recipe
     * @throws IllegalArgumentException naming the recipe step the registry does not know or whose parameters it
     *                                  rejects
     */
    public MeasurementQuantification(WorkspaceStore store, Session actor, String projectId, ContentVersion version,
            StoredMethod method, StepRegistry registry, String software) {
        this.store = store;
        this.actor = actor;
        this.projectId = projectId;
        this.method = method;
        this.versionId = version.getId();
        this.versions = new AnalysisVersions(version.getId(), method.libraryVersionId());
        this.correction = ResultCorrection.of(method);
        this.steps = new ArrayList<>();
        for (Recipe.Entry e : method.recipe().entries()) {
            try {
                steps.add(registry.create(e.stepId(), e.parameters()));
            } catch (IllegalArgumentException ex) {
                throw new IllegalArgumentException("method version " + version.getNumber() + ", [recipe] step '"
                        + e.stepId() + "': " + ex.getMessage(), ex);
            }
        }
        this.transform = new InterferogramTransform(method.transform());
        this.software = software;
    }

    /**
     * The project's samples (every kind but background, without the QA measurements: those whose labels state a
     * QA role) not yet analysed with the version, in time order, and the backgrounds read.
     *
     * @throws ImportException naming a background measurement that cannot serve as one
     */
    public Plan plan() throws ImportException {
        return plan(List.of());
    }

    /**
     * As {@link #plan()}, with the measurements of files read but not yet stored taken as if they were: so that
     * {@link #check} finds bad input before the files are imported. Files the project holds already are left out.
     *
     * @throws ImportException naming a background measurement that cannot serve as one
     */
    public Plan plan(List<FileMeasurements.Read> pending) throws ImportException {
        Set<String> analysed = store.analyses().analysed(actor, projectId, versionId);
        List<Measurement> all = new ArrayList<>(store.imports().measurements(actor, projectId));
        Map<String, Spectrum> pendingValues = new HashMap<>();
        for (FileMeasurements.Read r : pending) {
            if (store.imports().find(actor, projectId, r.file().sha256()).isPresent()) {
                continue;
            }
            for (int i = 0; i < r.measurements().size(); i++) {
                // a copy, as the store would read it back: the file's measurement stays as read
                Measurement n = EcoreUtil.copy(r.measurements().get(i));
                n.setId("pending:" + r.file().sha256() + ":" + i);
                n.setOperatorId(actor.userId());
                n.setSourceFile(r.file().fileName());
                n.setSourceSha256(r.file().sha256());
                n.setSourceRecord(i);
                pendingValues.put(n.getId(), n.getSpectrum());
                all.add(n);
            }
        }
        all.sort(Comparator.comparing((Measurement m) -> m.getTime()));
        List<Measurement> samples = new ArrayList<>();
        List<Background> backgrounds = new ArrayList<>();
        List<Measurement> qa = new ArrayList<>();
        int skipped = 0;
        for (Measurement m : all) {
            if (m.getKind() == MeasurementKind.BACKGROUND) {
                backgrounds.add(MeasurementAbsorbance.background(m, values(m, pendingValues), transform));
            } else if (!FileMeasurements.role(m.getLabels().map()).equals(MeasurementRole.SAMPLE)) {
                qa.add(m);
            } else if (analysed.contains(m.getId())) {
                skipped++;
            } else {
                samples.add(m);
            }
        }
        absorbance = new MeasurementAbsorbance(transform,
                backgrounds.isEmpty() ? null : new BackgroundTimeline(backgrounds));
        this.qa = List.copyOf(qa);
        this.backgrounds = List.copyOf(backgrounds);
        this.pendingSpectra = Map.copyOf(pendingValues);
        return new Plan(samples, skipped, pendingValues);
    }

    /**
     * The project's QA measurements found by the last plan (those of its files not yet stored among them), made
     * absorbance, put through the method's recipe and fitted as its samples are, and nothing stored; each with the
     * role its label states.
     *
     * @throws ImportException naming the file, record and field of a QA measurement that cannot be fitted
     */
    public QaMeasurements qaMeasurements() throws ImportException {
        List<QaMeasurements.Fitted> fitted = new ArrayList<>();
        for (Measurement m : qa) {
            Prepared p = prepare(m, values(m, pendingSpectra));
            fitted.add(new QaMeasurements.Fitted(m.getTime(), FileMeasurements.role(m.getLabels().map()),
                    temperature(m).value(), pressure(m).value(), p.absorbance(),
                    quantifier(p.absorbance().axis()).quantify(p.sample())));
        }
        return QaMeasurements.of(fitted);
    }

    /**
     * Corrects the results of the runs to come to the effective path the campaign's CTS readings measured, as a
     * method whose path source is CTS-derived requires (see {@link CtsPath}).
     *
     * @throws IllegalArgumentException if the method corrects to its nominal path, the path is not positive and
     *                                  finite, or the method's references came without their conditions
     */
    public void correctToCtsPath(double pathM) {
        if (method.pathSource() != PathOrigin.CTS_DERIVED) {
            throw new IllegalArgumentException("method " + method.method().name() + " corrects to its nominal "
                    + "path: a CTS-derived path is not used (path-source = cts-derived in the method would use it)");
        }
        correction = ResultCorrection.of(method).withCtsPath(pathM);
    }

    /** The project's backgrounds found by the last plan, as single beams, in time order. */
    public List<Background> backgrounds() {
        return backgrounds;
    }

    /**
     * Processes every sample of the plan as the run will, without storing anything.
     *
     * @throws ImportException naming the file, record and field of the first sample that cannot be quantified
     */
    public void check(Plan plan) throws ImportException {
        for (Measurement m : plan.samples()) {
            prepare(m, values(m, plan.pendingValues()));
        }
    }

    /**
     * Processes and stores the plan's samples, {@link #BLOCK} per transaction, stopping between samples when
     * cancelled (what was stored stays; running again finishes the rest).
     *
     * @param progress told after each stored block, with the samples stored so far
     * @throws ImportException as {@link #check}; the blocks stored before stay
     */
    public Outcome run(Plan plan, ProgressListener progress, CancellationFlag cancel) throws ImportException {
        if (plan.pending()) {
            throw new IllegalArgumentException("the plan holds measurements of files not yet imported; import them"
                    + " and plan again");
        }
        if (method.pathSource() == PathOrigin.CTS_DERIVED && correction.pathOrigin() != PathOrigin.CTS_DERIVED) {
            throw new IllegalStateException("method " + method.method().name() + " takes its path from the "
                    + "campaign's CTS readings: derive it first (CtsPath) and give it to correctToCtsPath");
        }
        List<MeasurementAnalysis> block = new ArrayList<>(BLOCK);
        int stored = 0;
        for (Measurement m : plan.samples()) {
            if (cancel.isCancelled()) {
                break;
            }
            Prepared p = prepare(m, values(m, Map.of()));
            SpectrumResult result = quantifier(p.absorbance().axis()).quantify(p.sample());
            block.add(new MeasurementAnalysis(m.getId(), p.recipe().toCanonicalString(), p.absorbance(),
                    SampleEncoding.FLOAT32_LE, correction.results(result, versions, temperature(m), pressure(m),
                            p.noiseFactor(), p.noiseOrigin())));
            if (block.size() == BLOCK) {
                stored += store(block);
                progress.progress(stored, plan.samples().size());
            }
        }
        if (!block.isEmpty()) {
            stored += store(block);
            progress.progress(stored, plan.samples().size());
        }
        return new Outcome(stored, plan.skipped(), stored < plan.samples().size());
    }

    private int store(List<MeasurementAnalysis> block) {
        store.analyses().store(actor, projectId, List.copyOf(block));
        int n = block.size();
        block.clear();
        return n;
    }

    /** An absorbance ready to fit, the recipe that made it and the noise factor F of its transform. */
    private record Prepared(Spectrum absorbance, Sample sample, Recipe recipe, double noiseFactor,
            String noiseOrigin) {
    }

    /** The cell temperature the measurement was stored with: from its file's labels, or given at import. */
    private static ConditionValue temperature(Measurement m) {
        return new ConditionValue(m.getCellTemperature(), FileMeasurements.statesTemperature(m.getLabels().map())
                ? ConditionOrigin.FILE_LABEL : ConditionOrigin.IMPORT_STATED);
    }

    /** The cell pressure in kPa (stored in hPa), from the file's labels or given at import. */
    private static ConditionValue pressure(Measurement m) {
        return new ConditionValue(m.getCellPressure() / 10.0, FileMeasurements.statesPressure(m.getLabels().map())
                ? ConditionOrigin.FILE_LABEL : ConditionOrigin.IMPORT_STATED);
    }

    /** {@code sample} in the cell {@code m} was stored with (temperature in K, pressure in kPa). */
    public static Sample inCellOf(Sample sample, Measurement m) {
        return sample.inCell(temperature(m).value(), pressure(m).value());
    }

    private Prepared prepare(Measurement m, Spectrum values) throws ImportException {
        MeasurementAbsorbance.Converted c = absorbance.convert(m, values);
        Spectrum a;
        try {
            a = Recipe.process(c.absorbance(), steps).spectrum();
        } catch (IllegalArgumentException e) {
            throw MeasurementAbsorbance.error(m, "recipe", e.getMessage());
        }
        requireFitWindows(m, a);
        try {
            quantifier(a.axis());
        } catch (IllegalArgumentException e) {
            throw MeasurementAbsorbance.error(m, "axis", e.getMessage());
        }
        List<Recipe.Entry> entries = new ArrayList<>(c.entries());
        entries.addAll(method.recipe().entries());
        BackgroundAge age = c.ratio() == null ? null
                : new BackgroundAge(c.ratio().backgroundAge(), absorbance.ageLimit());
        Sample sample = inCellOf(new Sample(a, age, ResultCorrection.noiseCorrelation(c.noiseFactor())), m);
        return new Prepared(a, sample, Recipe.of(entries), c.noiseFactor(), c.noiseOrigin());
    }

    /** The axis covers every window of every region, and the absorbance is finite at each point inside one. */
    private void requireFitWindows(Measurement m, Spectrum a) throws ImportException {
        SpectralAxis axis = a.axis();
        if (axis.unit() != AxisUnit.WAVENUMBER) {
            throw MeasurementAbsorbance.error(m, "axis", "the axis is in " + axis.unit() + ", not wavenumbers");
        }
        double[] x = axis.toArray();
        double low = Math.min(x[0], x[x.length - 1]);
        double high = Math.max(x[0], x[x.length - 1]);
        for (Analyte analyte : method.method().analytes()) {
            for (AnalysisRegion region : analyte.regions()) {
                for (WavenumberWindow w : region.windows()) {
                    if (w.low() < low || w.high() > high) {
                        throw MeasurementAbsorbance.error(m, "axis", "the axis " + low + ".." + high
                                + " cm-1 does not cover the region " + w + " of analyte " + analyte.compound());
                    }
                    for (int i = 0; i < x.length; i++) {
                        if (w.contains(x[i]) && !Double.isFinite(a.get(i))) {
                            throw MeasurementAbsorbance.error(m, "absorbance", "not finite (" + a.get(i) + ") at "
                                    + x[i] + " cm-1, inside the fit window " + w + " of analyte "
                                    + analyte.compound());
                        }
                    }
                }
            }
        }
    }

    private Quantifier quantifier(SpectralAxis axis) {
        return quantifiers.computeIfAbsent(axis, ax -> method.quantifier(ax, software, false));
    }

    private Spectrum values(Measurement m, Map<String, Spectrum> pending) {
        Spectrum values = pending.get(m.getId());
        return values != null ? values : store.spectra().load(actor, m.getSpectrumId()).getSpectrum();
    }
}
