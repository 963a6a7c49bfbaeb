package org.tracegas.method;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.preprocess.Recipe;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.AlgorithmSetting;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.FitAlgorithmRegistry;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.ReportingUnit;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.quantify.WavenumberWindow;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * A quantification method as a lab writes it, read from a method file; with the references of its library it
 * becomes a {@link QuantificationMethod}. A stored method version is written in the same text, with the library
 * pinned by its version instead of named by its folder (see {@link StoredMethod}).
 *
 * <pre>
 * method = Stack gas, 8 analytes
 * library = references/library.manifest     the library folder's manifest, relative to this file
 * path-length = 6.4                          m
 * path-source = nominal                      (optional) nominal, or cts-derived: results are corrected to the
 *                                            effective path the campaign's CTS readings measure (see
 *                                            {@code CtsPath}) instead of the nominal path-length
 * resolution = 0.5                           (optional) the instrument's nominal resolution, cm-1: every
 *                                            reference must have been recorded at it
 * nonlinearity = yes                         interpolate between references of several amounts
 * tolerance = 1e-6                           (optional) relative change at which the iteration stops
 * max-iterations = 50                        (optional)
 * max-absorbance = 1.0                       (optional)
 * shift = none                               (optional) none, shift, shift-and-width
 * reporting-unit = ppm                       (optional) ppm, ppb, percent
 * algorithm = curve-of-growth                (optional) classical-least-squares (the default),
 *                                            curve-of-growth or an algorithm another bundle installs, see
 *                                            {@link FitAlgorithmRegistry}; shift = scale goes with
 *                                            curve-of-growth only
 *
 * [transform]                                see {@link TransformText}
 * apodization = norton-beer-medium
 *
 * [recipe]                                   (optional) processing before the fit, see {@link MethodRecipe}
 * step = resample first=2000.0;size=801;step=0.5
 *
 * [line-list]                                (with algorithm = line-list only, and then required with
 * temperature = 308.15                       resolution) the line lists and cell conditions the spectra are
 * ...                                        computed from, see {@link LineListBlock}
 *
 * [analyte]                                  one block per analyte, in reporting order
 * compound = CO                              as the library names the compound
 * interferents = CO2, N2O                    (optional)
 * region = 2040..2140 baseline 1             windows low..high (several share one baseline), the
 * region = 2150..2160, 2170..2180 baseline 0 residual-limit 0.004     baseline order and an optional
 *                                                                     residual RMS limit; one line per region
 * </pre>
 *
 * The references must have been recorded with the apodization of the {@code [transform]} block and, when the
 * method states one, at its resolution; a library with another reference is refused, naming it.
 *
 * @param libraryManifest the library folder's manifest; null in the definition read from a stored version
 * @param resolution      the instrument's nominal resolution in cm-1, NaN when the method states none
 * @param pathSource      where the sample cell's path that results are corrected to comes from
 */
public record MethodDefinition(Path file, String name, Path libraryManifest, double pathLengthM, double resolution,
        boolean nonlinearity,
        double tolerance, int maxIterations, double maxAbsorbance, ShiftTerm shift, ReportingUnit unit,
        FitAlgorithm algorithm, List<AlgorithmSetting> algorithmSettings, TransformSettings transform, Recipe recipe, List<Analyte> analytes,
        PathOrigin pathSource) {

    /** The versions a method file gave: its library's, its own, and the method as its version holds it. */
    public record Recorded(ContentVersion libraryVersion, ContentVersion methodVersion, StoredMethod method) {
    }

    private static final Set<String> SETTINGS = Set.of("method", "path-length", "path-source", "resolution",
            "nonlinearity",
            "tolerance", "max-iterations", "max-absorbance", "shift", "reporting-unit", "algorithm");
    /** The algorithm settings a method derives from its transform and resolution, not from its [line-list]. */
    private static final java.util.Map<String, java.util.function.Function<MethodDefinition, String>> INSTRUMENT =
            java.util.Map.of("apodization", d -> KeyValueFile.word(d.transform().apodization()),
                    "resolution", d -> Double.toString(d.resolution()));
    private static final Set<String> ANALYTE = Set.of("compound", "interferents", "region");

    public MethodDefinition {
        analytes = List.copyOf(analytes);
        algorithmSettings = List.copyOf(algorithmSettings);
    }

    /** @throws FileFormatException naming the file, line and key of the first error */
    public static MethodDefinition read(Path file) throws IOException {
        return parse(KeyValueFile.read(file), Set.of("library"));
    }

    /**
     * A method written as text, its library named relative to where the file would be.
     *
     * @param file names the text in errors and resolves the library
     * @throws FileFormatException naming the file, line and key of the first error
     */
    public static MethodDefinition parse(String text, Path file) throws FileFormatException {
        return parse(KeyValueFile.parse(text, file), Set.of("library"));
    }

    /**
     * @param libraryKeys the head's keys that name the library: {@code library} in a method file, the pinned
     *                    version's keys in a stored version (whose definition then names no manifest)
     */
    static MethodDefinition parse(KeyValueFile f, Set<String> libraryKeys) throws FileFormatException {
        Path file = f.file();
        f.allowBlocks(libraryKeys.contains("library") ? Set.of("transform", "recipe", "analyte", LineListBlock.NAME)
                : Set.of("transform", "recipe", "analyte", LineListBlock.NAME, "references"));
        Set<String> head = new java.util.HashSet<>(SETTINGS);
        head.addAll(libraryKeys);
        KeyValueFile.Section h = f.head().allow(head);
        List<KeyValueFile.Section> transforms = f.blocks("transform");
        if (transforms.size() != 1) {
            throw new FileFormatException(file, transforms.isEmpty() ? 0 : transforms.get(1).line(), "[transform]",
                    "a method file needs exactly one [transform] block, found " + transforms.size());
        }
        TransformSettings transform = TransformText.read(transforms.get(0));
        List<KeyValueFile.Section> recipes = f.blocks("recipe");
        if (recipes.size() > 1) {
            throw new FileFormatException(file, recipes.get(1).line(), "[recipe]",
                    "a method file has at most one [recipe] block, found " + recipes.size());
        }
        Recipe recipe = recipes.isEmpty() ? MethodRecipe.none() : MethodRecipe.read(recipes.get(0));
        List<Analyte> analytes = new ArrayList<>();
        for (KeyValueFile.Section b : f.blocks("analyte")) {
            b.allow(ANALYTE);
            List<String> interferents = b.has("interferents") ? b.value("interferents").words() : List.of();
            List<AnalysisRegion> regions = new ArrayList<>();
            for (KeyValueFile.Value v : b.all("region")) {
                regions.add(region(v));
            }
            try {
                analytes.add(new Analyte(b.text("compound"), interferents, regions));
            } catch (IllegalArgumentException e) {
                String m = e.getMessage();
                throw b.error(m.startsWith("compound") ? "compound" : m.contains("interferent") ? "interferents"
                        : "region", m);
            }
        }
        if (analytes.isEmpty()) {
            throw new FileFormatException(file, 0, "[analyte]", "the method names no analyte");
        }
        Path manifest = libraryKeys.contains("library") ? f.resolve(h.text("library")) : null;
        double resolution = h.number("resolution", Double.NaN);
        if (!Double.isNaN(resolution) && !(resolution > 0 && Double.isFinite(resolution))) {
            throw h.error("resolution", "must be positive, was " + resolution);
        }
        FitAlgorithm algorithm = algorithm(h);
        List<KeyValueFile.Section> lineLists = f.blocks(LineListBlock.NAME);
        List<AlgorithmSetting> settings = List.of();
        if (algorithm.name().equals(LineListBlock.NAME)) {
            if (lineLists.size() != 1) {
                throw new FileFormatException(file, lineLists.isEmpty() ? h.line() : lineLists.get(1).line(),
                        "[line-list]", "a method with algorithm = line-list needs exactly one [line-list] block, found "
                                + lineLists.size());
            }
            if (Double.isNaN(resolution)) {
                throw h.error("resolution", "is needed by algorithm = line-list: with the [transform] block's"
                        + " apodization it gives the instrument line shape of the computed spectra");
            }
            settings = LineListBlock.read(f, lineLists.get(0), libraryKeys.contains("library"));
        } else if (!lineLists.isEmpty()) {
            throw new FileFormatException(file, lineLists.get(0).line(), "[line-list]",
                    "only a method with algorithm = line-list has a [line-list] block");
        }
        return new MethodDefinition(file, h.text("method"), manifest, h.number("path-length"), resolution,
                h.flag("nonlinearity", false), h.number("tolerance", QuantificationMethod.DEFAULT_TOLERANCE),
                h.integer("max-iterations", QuantificationMethod.DEFAULT_MAX_ITERATIONS),
                h.number("max-absorbance", QuantificationMethod.DEFAULT_MAX_ABSORBANCE),
                h.constant("shift", ShiftTerm.class, ShiftTerm.NONE),
                h.constant("reporting-unit", ReportingUnit.class, ReportingUnit.PPM),
                algorithm, settings, transform, recipe, analytes,
                h.constant("path-source", PathOrigin.class, PathOrigin.NOMINAL));
    }

    /** The algorithm the head names, by its name among those installed; the default when it names none. */
    private static FitAlgorithm algorithm(KeyValueFile.Section h) throws FileFormatException {
        if (!h.has("algorithm")) {
            return FitAlgorithm.CLASSICAL_LEAST_SQUARES;
        }
        String name = h.text("algorithm");
        FitAlgorithmRegistry installed = FitAlgorithmRegistry.installed();
        return installed.find(name).orElseThrow(() -> h.error("algorithm", "'" + name + "' is none of the installed"
                + " fit algorithms " + installed.names()));
    }

    /** "low..high[, low..high] baseline n [residual-limit x]". */
    private static AnalysisRegion region(KeyValueFile.Value v) throws FileFormatException {
        String[] words = v.text().replace(",", " ").strip().split("\\s+");
        List<WavenumberWindow> windows = new ArrayList<>();
        Integer baseline = null;
        double limit = Double.POSITIVE_INFINITY;
        for (int i = 0; i < words.length; i++) {
            if (words[i].equals("baseline") && i + 1 < words.length) {
                baseline = new KeyValueFile.Value(v.section(), v.key(), words[++i], v.line()).integer();
            } else if (words[i].equals("residual-limit") && i + 1 < words.length) {
                limit = new KeyValueFile.Value(v.section(), v.key(), words[++i], v.line()).number();
            } else {
                double[] r = v.range(words[i]);
                windows.add(new WavenumberWindow(r[0], r[1]));
            }
        }
        if (baseline == null) {
            throw v.error("states no 'baseline <order>'");
        }
        try {
            return new AnalysisRegion(windows, baseline, limit);
        } catch (IllegalArgumentException e) {
            throw v.error(e.getMessage());
        }
    }

    /**
     * The method over a library's references (by compound name).
     *
     * @throws FileFormatException naming the method file when the library lacks a compound the method fits, or
     *                             has a reference of another apodization or resolution than the instrument's
     */
    public QuantificationMethod build(ReferenceLibrary library) throws FileFormatException {
        return stored(library, "", "").method();
    }

    /**
     * The method over a library's references with the conditions of each, as a version stores it.
     *
     * @throws FileFormatException as {@link #build(ReferenceLibrary)}
     */
    private StoredMethod stored(ReferenceLibrary library, String libraryVersionId, String libraryContentHash)
            throws FileFormatException {
        List<ReferenceSpectrum> references = new ArrayList<>();
        for (org.tracegas.library.ReferenceSpectrum r : library.references()) {
            references.add(new ReferenceSpectrum(r.compound().name(), r.spectrum(),
                    r.metadata().conditions().concentrationPathLength()));
        }
        try {
            QuantificationMethod method = build(references, Optional.empty());
            return new StoredMethod(method, transform, libraryVersionId, libraryContentHash, recipe, resolution,
                    MethodReferences.of(library, method.references(), transform, resolution), pathSource);
        } catch (IllegalArgumentException e) {
            throw new FileFormatException(file, 0, "", e.getMessage() + " (library " + libraryManifest + ")");
        }
    }

    /**
     * The method over given references and fit weights.
     *
     * @throws IllegalArgumentException when the references do not suit the analytes
     */
    QuantificationMethod build(List<ReferenceSpectrum> references, Optional<Spectrum> weights) {
        QuantificationMethod.Builder b = QuantificationMethod.builder(name).pathLengthMetres(pathLengthM)
                .nonlinearity(nonlinearity).tolerance(tolerance).maxIterations(maxIterations)
                .maxAbsorbance(maxAbsorbance).shiftTerm(shift).reportingUnit(unit).algorithm(algorithm);
        analytes.forEach(b::analyte);
        algorithmSettings.forEach(b::algorithmSetting);
        if (!algorithmSettings.isEmpty()) {
            // the instrument the computed spectra are seen through: the method's own apodization and resolution,
            // bound with the block's settings but written once, in their usual places
            INSTRUMENT.forEach((key, value) -> b.algorithmSetting(new AlgorithmSetting(key, value.apply(this))));
        }
        references.forEach(b::reference);
        weights.ifPresent(b::weights);
        return b.build();
    }

    /**
     * A method in this file's text: its settings, the given lines naming the library, its transform, its recipe
     * (when it has steps) and its analytes; a stored version adds the conditions of its references. Numbers are written in Java's shortest exact decimal form, so the text reads back to the very
     * same method.
     */
    static String write(QuantificationMethod m, String libraryLines, double resolution, TransformSettings transform,
            Recipe recipe, PathOrigin pathSource) {
        StringBuilder s = new StringBuilder();
        s.append("method = ").append(m.name()).append('\n').append(libraryLines);
        s.append("path-length = ").append(m.pathLengthMetres()).append('\n');
        if (pathSource != PathOrigin.NOMINAL) {
            // only when not the default, so that the stored versions of earlier methods read as they were written
            s.append("path-source = ").append(KeyValueFile.word(pathSource)).append('\n');
        }
        if (!Double.isNaN(resolution)) {
            s.append("resolution = ").append(resolution).append('\n');
        }
        s.append("nonlinearity = ").append(m.nonlinearity() ? "yes" : "no").append('\n');
        s.append("tolerance = ").append(m.tolerance()).append('\n');
        s.append("max-iterations = ").append(m.maxIterations()).append('\n');
        s.append("max-absorbance = ").append(m.maxAbsorbance()).append('\n');
        s.append("shift = ").append(KeyValueFile.word(m.shiftTerm())).append('\n');
        s.append("reporting-unit = ").append(KeyValueFile.word(m.reportingUnit())).append('\n');
        if (!m.algorithm().equals(FitAlgorithm.CLASSICAL_LEAST_SQUARES)) {
            // only when not the default, so that the stored versions of earlier methods read as they were written
            s.append("algorithm = ").append(m.algorithm().name()).append('\n');
        }
        s.append("\n[transform]\n").append(TransformText.write(transform));
        if (!recipe.entries().isEmpty()) {
            s.append("\n[recipe]\n").append(MethodRecipe.write(recipe));
        }
        List<AlgorithmSetting> declared = m.algorithmSettings().stream()
                .filter(a -> !INSTRUMENT.containsKey(a.key())).toList();
        if (!declared.isEmpty()) {
            s.append("\n[").append(m.algorithm().name()).append("]\n");
            declared.forEach(a -> s.append(a.key()).append(" = ").append(a.value()).append('\n'));
        }
        for (Analyte a : m.analytes()) {
            s.append("\n[analyte]\ncompound = ").append(a.compound()).append('\n');
            if (!a.interferents().isEmpty()) {
                s.append("interferents = ").append(String.join(", ", a.interferents())).append('\n');
            }
            for (AnalysisRegion r : a.regions()) {
                s.append("region = ");
                for (int i = 0; i < r.windows().size(); i++) {
                    WavenumberWindow w = r.windows().get(i);
                    s.append(i == 0 ? "" : ", ").append(w.low()).append("..").append(w.high());
                }
                s.append(" baseline ").append(r.baselineOrder());
                if (Double.isFinite(r.residualRmsLimit())) {
                    s.append(" residual-limit ").append(r.residualRmsLimit());
                }
                s.append('\n');
            }
        }
        return s.toString();
    }

    /**
     * Reads the library folder, builds the method over it, and records the library (unless the newest version of
     * its name holds the same folder) and the method with its transform; the same files again give no new
     * versions. Everything is read and built before anything is recorded.
     *
     * @throws FileFormatException naming the manifest, spectrum or method file at fault; nothing recorded
     */
    public Recorded record(WorkspaceStore store, Session actor) throws IOException {
        if (libraryManifest == null) {
            throw new IllegalStateException("the method of " + file + " is recorded already; it names no library folder");
        }
        ReferenceLibrary library = LabReferenceSource.manifestReader().read(libraryManifest);
        String libraryContent = LibraryVersionText.of(libraryManifest);
        StoredMethod built = stored(library, "", "");
        QuantificationMethod method = built.method();
        ContentVersion libraryVersion = VersionRecorder.ensure(store, actor, VersionKind.LIBRARY, library.name(),
                libraryContent, "library of method " + method.name());
        StoredMethod stored = new StoredMethod(method, transform, libraryVersion.getId(), library.contentHash(), recipe,
                resolution, built.referenceConditions(), pathSource);
        ContentVersion methodVersion = VersionRecorder.ensure(store, actor, VersionKind.METHOD, method.name(),
                stored.content(), "defined from " + file.getFileName());
        return new Recorded(libraryVersion, methodVersion, stored);
    }
}
