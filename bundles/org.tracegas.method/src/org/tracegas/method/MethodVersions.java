package org.tracegas.method;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EAttribute;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.WorkspacePackage;
import org.tracegas.preprocess.Recipe;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.AlgorithmSetting;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.FitAlgorithmRegistry;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReportingUnit;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.quantify.WavenumberWindow;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * A stored method version in the workspace model, where the workbench edits it, and the edit back into a new
 * version through the same store service and the same stored text ({@link StoredMethod}) the runner uses.
 * <p>
 * The model holds the settings of the method text's head (path length, path source, nonlinearity, tolerance,
 * iteration limit, maximum absorbance, shift term, reporting unit, fit algorithm), the steps of its
 * {@code [recipe]}, the cell conditions of its {@code [line-list]} block, and each region of each analyte in the
 * method's order as one {@link org.tracegas.model.AnalysisRegion} (its compound, its span, its baseline order and
 * the analyte's interferents); regions are added and removed in the model. Everything else of the method
 * (resolution, transform, references, the rest of the line-list block, residual limits, the windows inside a
 * span) is kept from the version the edit started from.
 */
public final class MethodVersions {

    private MethodVersions() {
    }

    /** A METHOD version read from the store into the model: the method with this one version. */
    public static AnalysisMethod read(WorkspaceStore store, ContentVersion version) throws FileFormatException {
        return model(version, StoredMethod.parse(store.versions().content(version.getId()), "method version "
                + version.getId()));
    }

    /** The model of a method version whose stored method is at hand. */
    public static AnalysisMethod model(ContentVersion version, StoredMethod stored) {
        AnalysisMethod m = model(version);
        fillRegions(m.getVersions().get(0), stored);
        return m;
    }

    /**
     * The model of a method version as the store lists it, without its regions: a method version carrying every
     * stored field of the version (kind, item, number, parent, author, reason, hash, frozen, row version).
     */
    public static AnalysisMethod model(ContentVersion version) {
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        AnalysisMethod m = f.createAnalysisMethod();
        m.setId(version.getItemId());
        m.setName(version.getItemName());
        MethodVersion mv = f.createMethodVersion();
        for (EAttribute a : WorkspacePackage.Literals.CONTENT_VERSION.getEAllAttributes()) {
            mv.eSet(a, version.eGet(a));
        }
        m.getVersions().add(mv);
        return m;
    }

    /**
     * Sets the model's regions, settings, recipe steps and cell conditions to those of a stored method (for a draft
     * that is thrown away, say); each region remembers its place in the method ({@code openedAs}).
     */
    public static void fillRegions(MethodVersion version, StoredMethod stored) {
        QuantificationMethod method = stored.method();
        version.getRegions().clear();
        version.setPathLength(method.pathLengthMetres());
        version.setMaxIterations(method.maxIterations());
        version.setAlgorithm(method.algorithm().name());
        version.setPathSource(KeyValueFile.word(stored.pathSource()));
        version.setNonlinearity(method.nonlinearity());
        version.setTolerance(method.tolerance());
        version.setMaxAbsorbance(method.maxAbsorbance());
        version.setShiftTerm(KeyValueFile.word(method.shiftTerm()));
        version.setReportingUnit(KeyValueFile.word(method.reportingUnit()));
        version.getRecipeSteps().clear();
        version.getRecipeSteps().addAll(MethodRecipe.steps(stored.recipe()));
        version.setCellConditions(cellConditions(method));
        int place = 0;
        for (Analyte a : method.analytes()) {
            for (AnalysisRegion r : a.regions()) {
                org.tracegas.model.AnalysisRegion region = WorkspaceFactory.eINSTANCE.createAnalysisRegion();
                region.setCompound(a.compound());
                region.setLowerWavenumber(r.low());
                region.setUpperWavenumber(r.high());
                region.setBaselineOrder(r.baselineOrder());
                region.setOpenedAs(++place);
                region.getInterferents().addAll(a.interferents());
                version.getRegions().add(region);
            }
        }
    }

    /**
     * The method the edited model declares: the method it was opened from, with the model's settings, recipe steps
     * and regions. The algorithm keeps its settings while it is the opened one (a line-list method's with the
     * model's cell conditions, which other algorithms do not read); another is taken without settings, and one
     * that needs them (line-list, whose line lists the method file's block gives) is refused. Each run of regions
     * of one compound is one analyte, in the model's order;
     * a region the method was opened with keeps its residual limit, and its windows while its span is unchanged;
     * a region added in the model is one window without a residual limit.
     *
     * @throws IllegalArgumentException naming the region or the field the method cannot take
     */
    public static StoredMethod edited(StoredMethod opened, AnalysisMethod method, MethodVersion draft) {
        QuantificationMethod base = opened.method();
        if (!base.name().equals(method.getName())) {
            throw new IllegalArgumentException("method name: a version keeps the name of its method ('"
                    + base.name() + "'); a new name makes a new method");
        }
        List<org.tracegas.model.AnalysisRegion> regions = draft.getRegions();
        if (regions.isEmpty()) {
            throw new IllegalArgumentException("regions: a method needs at least one region");
        }
        if (!(draft.getPathLength() > 0 && Double.isFinite(draft.getPathLength()))) {
            throw new IllegalArgumentException("path length: must be a positive number of metres, was "
                    + draft.getPathLength());
        }
        if (draft.getMaxIterations() < 1) {
            throw new IllegalArgumentException("max iterations: must be at least 1, was "
                    + draft.getMaxIterations());
        }
        if (!(draft.getTolerance() > 0 && draft.getTolerance() < 1)) {
            throw new IllegalArgumentException("tolerance: must lie between 0 and 1 (the relative change of the"
                    + " concentrations at which the fit stops), was " + draft.getTolerance());
        }
        if (!(draft.getMaxAbsorbance() > 0 && Double.isFinite(draft.getMaxAbsorbance()))) {
            throw new IllegalArgumentException("max absorbance: must be a positive number, was "
                    + draft.getMaxAbsorbance());
        }
        PathOrigin pathSource = constant(PathOrigin.class, draft.getPathSource(), "path source");
        ShiftTerm shift = constant(ShiftTerm.class, draft.getShiftTerm(), "shift");
        ReportingUnit unit = constant(ReportingUnit.class, draft.getReportingUnit(), "reporting unit");
        Recipe recipe = MethodRecipe.of(draft.getRecipeSteps());
        boolean sameAlgorithm = base.algorithm().name().equals(draft.getAlgorithm());
        FitAlgorithm algorithm = sameAlgorithm ? base.algorithm() : algorithm(draft.getAlgorithm());
        if (shift != ShiftTerm.NONE && !algorithm.shiftTerms().contains(shift)) {
            throw new IllegalArgumentException("shift: " + KeyValueFile.word(shift)
                    + " is not offered by the fit algorithm " + algorithm.name() + ", which offers "
                    + algorithm.shiftTerms().stream().map(KeyValueFile::word).sorted().toList());
        }
        List<AnalysisRegion> openedRegions = base.analytes().stream().flatMap(a -> a.regions().stream()).toList();
        QuantificationMethod.Builder b = QuantificationMethod.builder(base.name())
                .pathLengthMetres(draft.getPathLength()).nonlinearity(draft.isNonlinearity())
                .tolerance(draft.getTolerance()).maxIterations(draft.getMaxIterations())
                .maxAbsorbance(draft.getMaxAbsorbance()).shiftTerm(shift).reportingUnit(unit).algorithm(algorithm);
        if (sameAlgorithm) {
            settings(base, draft.getCellConditions()).forEach(b::algorithmSetting);
        }
        java.util.Set<String> compounds = new java.util.HashSet<>();
        int next = 0;
        while (next < regions.size()) {
            org.tracegas.model.AnalysisRegion first = regions.get(next);
            if (!compounds.add(first.getCompound())) {
                throw new IllegalArgumentException("region " + (next + 1) + ": the regions of "
                        + first.getCompound() + " must follow one another");
            }
            List<AnalysisRegion> edited = new ArrayList<>();
            while (next < regions.size() && regions.get(next).getCompound().equals(first.getCompound())) {
                org.tracegas.model.AnalysisRegion e = regions.get(next++);
                if (!e.getInterferents().equals(first.getInterferents())) {
                    throw new IllegalArgumentException("region " + next + ": the regions of analyte "
                            + first.getCompound() + " must name one list of interferents");
                }
                edited.add(region(e, e.getOpenedAs() > 0 && e.getOpenedAs() <= openedRegions.size()
                        ? openedRegions.get(e.getOpenedAs() - 1) : null, next));
            }
            try {
                b.analyte(new Analyte(first.getCompound(), first.getInterferents(), edited));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("regions of " + first.getCompound() + ": " + e.getMessage(), e);
            }
        }
        base.references().forEach(b::reference);
        base.weights().ifPresent(b::weights);
        QuantificationMethod built;
        try {
            built = b.build();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("the edited method: " + e.getMessage(), e);
        }
        // the references are the opened version's, so are their conditions
        return new StoredMethod(built, opened.transform(), opened.libraryVersionId(),
                opened.libraryContentHash(), recipe, opened.resolution(), opened.referenceConditions(),
                pathSource);
    }

    /**
     * The cell conditions a line-list method computes its spectra at, as its block names them (stated when the
     * block names none); empty for a method of another algorithm.
     */
    private static String cellConditions(QuantificationMethod method) {
        if (!method.algorithm().name().equals(LineListBlock.NAME)) {
            return "";
        }
        return method.algorithmSettings().stream().filter(s -> s.key().equals(LineListBlock.CELL_CONDITIONS_KEY))
                .map(AlgorithmSetting::value).findFirst().orElse(LineListBlock.CELL_CONDITIONS.get(0));
    }

    /**
     * The opened method's algorithm settings with the draft's cell conditions: unchanged while they are the opened
     * ones (so that a block written without them keeps its text), else set in the place the block's reader gives
     * them, before the gases.
     */
    private static List<AlgorithmSetting> settings(QuantificationMethod base, String cellConditions) {
        if (!base.algorithm().name().equals(LineListBlock.NAME) || cellConditions(base).equals(cellConditions)) {
            return base.algorithmSettings();
        }
        if (!LineListBlock.CELL_CONDITIONS.contains(cellConditions)) {
            throw new IllegalArgumentException("cell conditions: '" + cellConditions + "' is none of "
                    + LineListBlock.CELL_CONDITIONS);
        }
        AlgorithmSetting set = new AlgorithmSetting(LineListBlock.CELL_CONDITIONS_KEY, cellConditions);
        List<AlgorithmSetting> settings = new ArrayList<>();
        boolean placed = false;
        for (AlgorithmSetting s : base.algorithmSettings()) {
            if (s.key().equals(LineListBlock.CELL_CONDITIONS_KEY)) {
                settings.add(set);
                placed = true;
                continue;
            }
            if (!placed && s.key().equals("gas")) {
                settings.add(set);
                placed = true;
            }
            settings.add(s);
        }
        return settings;
    }

    /**
     * The fit algorithms the model of a version opened from the method may name: those installed that need no
     * settings of their own, and the opened one.
     */
    public static List<String> algorithms(StoredMethod opened) {
        java.util.Set<String> names = new java.util.TreeSet<>(FitAlgorithmRegistry.installed().names());
        names.remove(LineListBlock.NAME);
        names.add(opened.method().algorithm().name());
        return List.copyOf(names);
    }

    /** The path sources a method text names, in its words. */
    public static List<String> pathSources() {
        return names(PathOrigin.class);
    }

    /** The shift terms a method text names, in its words; the fit algorithm offers some of them. */
    public static List<String> shiftTerms() {
        return names(ShiftTerm.class);
    }

    /** The reporting units a method text names, in its words. */
    public static List<String> reportingUnits() {
        return names(ReportingUnit.class);
    }

    /** The cell conditions of a line-list method's block, in its words. */
    public static List<String> cellConditions() {
        return LineListBlock.CELL_CONDITIONS;
    }

    private static FitAlgorithm algorithm(String name) {
        if (LineListBlock.NAME.equals(name)) {
            throw new IllegalArgumentException("algorithm: " + name + " computes its spectra from the line lists"
                    + " and cell conditions of a [" + LineListBlock.NAME + "] block; choose it in the method file");
        }
        FitAlgorithmRegistry installed = FitAlgorithmRegistry.installed();
        return installed.find(name == null ? "" : name).orElseThrow(() -> new IllegalArgumentException(
                "algorithm: '" + name + "' is none of the installed fit algorithms " + installed.names()));
    }

    private static <E extends Enum<E>> List<String> names(Class<E> type) {
        return java.util.Arrays.stream(type.getEnumConstants()).map(KeyValueFile::word).toList();
    }

    /** The constant a method text names by its word; the field is named when the word is none of them. */
    private static <E extends Enum<E>> E constant(Class<E> type, String text, String field) {
        for (E e : type.getEnumConstants()) {
            if (KeyValueFile.word(e).equals(text)) {
                return e;
            }
        }
        throw new IllegalArgumentException(field + ": '" + text + "' is none of " + names(type));
    }


    /**
     * The method's region of a model region: its span and baseline order, the residual limit of the region it was
     * opened as (none for a new one), and the windows of that region while the span is unchanged.
     */
    private static AnalysisRegion region(org.tracegas.model.AnalysisRegion e, AnalysisRegion r, int number) {
        double low = e.getLowerWavenumber();
        double high = e.getUpperWavenumber();
        try {
            if (r == null) {
                return AnalysisRegion.of(low, high, e.getBaselineOrder());
            }
            if (r.windows().size() == 1) {
                return new AnalysisRegion(List.of(new WavenumberWindow(low, high)), e.getBaselineOrder(),
                        r.residualRmsLimit());
            }
            if (low != r.low() || high != r.high()) {
                throw new IllegalArgumentException("it has " + r.windows().size()
                        + " windows; change them in the method file");
            }
            return new AnalysisRegion(r.windows(), e.getBaselineOrder(), r.residualRmsLimit());
        } catch (IllegalArgumentException x) {
            throw new IllegalArgumentException("region " + number + ": " + x.getMessage(), x);
        }
    }

    /**
     * Records the edited model as a new version of its method, revised from the version it was opened from,
     * with the actor as author and the reason given.
     *
     * @throws FileFormatException      when the opened version's stored text cannot be read
     * @throws IllegalArgumentException naming the field of the draft the method cannot take, or a blank reason
     */
    public static ContentVersion save(WorkspaceStore store, Session actor, AnalysisMethod method, MethodVersion draft,
            String reason) throws FileFormatException {
        if (reason == null || reason.isBlank()) {
            throw new IllegalArgumentException("reason: a new method version needs a reason");
        }
        ContentVersion opened = store.versions().version(draft.getId());
        if (opened.getKind() != VersionKind.METHOD) {
            throw new IllegalArgumentException("version " + draft.getId() + " is a " + opened.getKind()
                    + " version, not a method");
        }
        StoredMethod base = StoredMethod.parse(store.versions().content(opened.getId()), "method version "
                + opened.getId());
        return store.versions().revise(actor, opened.getId(), edited(base, method, draft).content(), reason.strip());
    }
}
