package org.tracegas.method;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
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
 * The model holds each region of each analyte in the method's order as one {@link org.tracegas.model.AnalysisRegion}
 * (its compound, its span and the analyte's interferents); everything else of the method (settings, transform,
 * references, baseline orders, the windows inside a span) is kept from the version the edit started from.
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
        fillRegions(m.getVersions().get(0), stored.method());
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

    /** Sets the model's regions to those of a method (for a draft that is thrown away, say). */
    public static void fillRegions(MethodVersion version, QuantificationMethod method) {
        version.getRegions().clear();
        for (Analyte a : method.analytes()) {
            for (AnalysisRegion r : a.regions()) {
                org.tracegas.model.AnalysisRegion region = WorkspaceFactory.eINSTANCE.createAnalysisRegion();
                region.setCompound(a.compound());
                region.setLowerWavenumber(r.low());
                region.setUpperWavenumber(r.high());
                region.getInterferents().addAll(a.interferents());
                version.getRegions().add(region);
            }
        }
    }

    /**
     * The method the edited model declares: the method it was opened from, with the model's compounds, spans
     * and interferents.
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
        int count = base.analytes().stream().mapToInt(a -> a.regions().size()).sum();
        if (regions.size() != count) {
            throw new IllegalArgumentException("regions: the draft has " + regions.size() + ", the method "
                    + count + "; regions are added and removed in the method file");
        }
        QuantificationMethod.Builder b = QuantificationMethod.builder(base.name())
                .pathLengthMetres(base.pathLengthMetres()).nonlinearity(base.nonlinearity())
                .tolerance(base.tolerance()).maxIterations(base.maxIterations()).maxAbsorbance(base.maxAbsorbance())
                .shiftTerm(base.shiftTerm()).reportingUnit(base.reportingUnit());
        int next = 0;
        for (Analyte a : base.analytes()) {
            org.tracegas.model.AnalysisRegion first = regions.get(next);
            List<AnalysisRegion> edited = new ArrayList<>();
            for (AnalysisRegion r : a.regions()) {
                org.tracegas.model.AnalysisRegion e = regions.get(next++);
                if (!e.getCompound().equals(first.getCompound())
                        || !e.getInterferents().equals(first.getInterferents())) {
                    throw new IllegalArgumentException("region " + next + ": the regions of analyte "
                            + a.compound() + " must name one compound and one list of interferents");
                }
                edited.add(span(r, e, next));
            }
            b.analyte(new Analyte(first.getCompound(), first.getInterferents(), edited));
        }
        base.references().forEach(b::reference);
        base.weights().ifPresent(b::weights);
        // the references are the opened version's, so are their conditions
        return new StoredMethod(b.build(), opened.transform(), opened.libraryVersionId(),
                opened.libraryContentHash(), opened.recipe(), opened.resolution(), opened.referenceConditions(),
                opened.pathSource());
    }

    /** A region with the model's span: a region of one window takes it; one of several keeps its windows. */
    private static AnalysisRegion span(AnalysisRegion r, org.tracegas.model.AnalysisRegion e, int number) {
        double low = e.getLowerWavenumber();
        double high = e.getUpperWavenumber();
        if (r.windows().size() == 1) {
            return new AnalysisRegion(List.of(new WavenumberWindow(low, high)), r.baselineOrder(),
                    r.residualRmsLimit());
        }
        if (low != r.low() || high != r.high()) {
            throw new IllegalArgumentException("region " + number + ": it has " + r.windows().size()
                    + " windows; change them in the method file");
        }
        return r;
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
