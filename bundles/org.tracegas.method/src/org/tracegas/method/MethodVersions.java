package org.tracegas.method;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.FitAlgorithmRegistry;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.WavenumberWindow;
import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;

/**
 * A stored method version in the workspace model, where the workbench edits it, and the edit back into a new
 * version through the same store service and the same stored text ({@link StoredMethod}) the runner uses.
 * <p>
 * The model holds the method's path length, iteration limit, fit algorithm and path source, and each region of each analyte in the method's
 * order as one {@link org.tracegas.model.AnalysisRegion} (its compound, its span, its baseline order and the
 * analyte's interferents); regions are added and removed in the model. Everything else of the method (other
 * settings, transform, references, residual limits, the windows inside a span) is kept from the version the
 * edit started from.
 */
public final class MethodVersions {

    private MethodVersions() {
    }

    /** A METHOD version read from the store into the model: the method with this one version. */
    public static AnalysisMethod read(WorkspaceStore store, VersionInfo version) throws FileFormatException {
        return model(version, StoredMethod.parse(store.versions().content(version.id()), "method version "
                + version.id()));
    }

    /** The model of a method version whose stored method is at hand. */
    public static AnalysisMethod model(VersionInfo version, StoredMethod stored) {
        AnalysisMethod m = model(version);
        fillRegions(m.getVersions().get(0), stored);
        return m;
    }

    /** The model of a method version as the store lists it, without its regions. */
    public static AnalysisMethod model(VersionInfo version) {
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        AnalysisMethod m = f.createAnalysisMethod();
        m.setId(version.itemId());
        m.setName(version.name());
        MethodVersion mv = f.createMethodVersion();
        mv.setId(version.id());
        mv.setNumber(version.number());
        mv.setFrozen(version.frozen());
        mv.setReason(version.reason());
        mv.setCreated(version.created());
        mv.setContentHash(version.contentHash());
        m.getVersions().add(mv);
        return m;
    }

    /**
     * Sets the model's regions and settings to those of a stored method (for a draft that is thrown away, say);
     * each region remembers its place in the method ({@code openedAs}).
     */
    public static void fillRegions(MethodVersion version, StoredMethod stored) {
        QuantificationMethod method = stored.method();
        version.getRegions().clear();
        version.setPathLength(method.pathLengthMetres());
        version.setMaxIterations(method.maxIterations());
        version.setAlgorithm(method.algorithm().name());
        version.setPathSource(text(stored.pathSource()));
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
     * The method the edited model declares: the method it was opened from, with the model's path length,
     * iteration limit, fit algorithm, path source and regions. The algorithm keeps its settings while it is the
     * opened one; another is taken without settings, and one that needs them (line-list, whose line lists and cell
     * conditions the method file's block gives) is refused. Each run of regions of one compound is one analyte, in the model's order;
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
        PathOrigin pathSource = pathSource(draft.getPathSource());
        List<AnalysisRegion> openedRegions = base.analytes().stream().flatMap(a -> a.regions().stream()).toList();
        QuantificationMethod.Builder b = QuantificationMethod.builder(base.name())
                .pathLengthMetres(draft.getPathLength()).nonlinearity(base.nonlinearity())
                .tolerance(base.tolerance()).maxIterations(draft.getMaxIterations())
                .maxAbsorbance(base.maxAbsorbance()).shiftTerm(base.shiftTerm()).reportingUnit(base.reportingUnit());
        if (base.algorithm().name().equals(draft.getAlgorithm())) {
            b.algorithm(base.algorithm());
            base.algorithmSettings().forEach(b::algorithmSetting);
        } else {
            b.algorithm(algorithm(draft.getAlgorithm()));
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
                opened.libraryContentHash(), opened.recipe(), opened.resolution(), opened.referenceConditions(),
                pathSource);
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
        return java.util.Arrays.stream(PathOrigin.values()).map(MethodVersions::text).toList();
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

    private static PathOrigin pathSource(String text) {
        for (PathOrigin o : PathOrigin.values()) {
            if (text(o).equals(text)) {
                return o;
            }
        }
        throw new IllegalArgumentException("path source: '" + text + "' is none of " + pathSources());
    }

    private static String text(PathOrigin origin) {
        return origin.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
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
    public static VersionInfo save(WorkspaceStore store, Session actor, AnalysisMethod method, MethodVersion draft,
            String reason) throws FileFormatException {
        if (reason == null || reason.isBlank()) {
            throw new IllegalArgumentException("reason: a new method version needs a reason");
        }
        VersionInfo opened = store.versions().version(draft.getId());
        if (opened.kind() != VersionKind.METHOD) {
            throw new IllegalArgumentException("version " + draft.getId() + " is a " + opened.kind()
                    + " version, not a method");
        }
        StoredMethod base = StoredMethod.parse(store.versions().content(opened.id()), "method version "
                + opened.id());
        return store.versions().revise(actor, opened.id(), edited(base, method, draft).content(), reason.strip());
    }
}
