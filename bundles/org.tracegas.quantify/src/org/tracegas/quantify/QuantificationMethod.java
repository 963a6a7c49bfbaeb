package org.tracegas.quantify;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.tracegas.quantify.internal.Sha256;
import org.tracegas.spectrum.Spectrum;

/**
 * Immutable definition of a quantification: analytes with their interferents and regions, reference spectra,
 * fit options and limits. Build one with {@link #builder(String)}. {@link #canonicalText()} is a deterministic
 * text form for hashing and versioning.
 */
public final class QuantificationMethod {

    /** Default highest absorbance trusted in a fit window: 1.0 (common practice, no source). */
    public static final double DEFAULT_MAX_ABSORBANCE = 1.0;
    /** Default relative change of the concentrations at which the non-linear iteration stops. */
    public static final double DEFAULT_TOLERANCE = 1e-9;
    /** Default cap on iterations of each non-linear part of the fit. */
    public static final int DEFAULT_MAX_ITERATIONS = 50;

    private final String name;
    private final double pathLengthMetres;
    private final List<Analyte> analytes;
    private final List<ReferenceSpectrum> references;
    private final FitAlgorithm algorithm;
    private final List<AlgorithmSetting> algorithmSettings;
    private final boolean nonlinearity;
    private final ShiftTerm shiftTerm;
    private final ReportingUnit reportingUnit;
    private final double maxAbsorbance;
    private final double tolerance;
    private final int maxIterations;
    private final Spectrum weights;
    private final String canonicalText;
    private final String contentHash;

    private QuantificationMethod(Builder b) {
        this.name = b.name;
        this.pathLengthMetres = b.pathLengthMetres;
        this.analytes = List.copyOf(b.analytes);
        List<ReferenceSpectrum> sorted = new ArrayList<>(b.references);
        // Canonical order, so that the same references added in another order give the same method.
        sorted.sort(Comparator.comparing(ReferenceSpectrum::compound).thenComparingDouble(ReferenceSpectrum::ppmMetres));
        this.references = List.copyOf(sorted);
        this.algorithm = b.algorithm;
        List<AlgorithmSetting> settings = new ArrayList<>(b.algorithmSettings);
        // canonical order, so that the same settings given in another order give the same method
        settings.sort(Comparator.comparing(AlgorithmSetting::key).thenComparing(AlgorithmSetting::value));
        this.algorithmSettings = List.copyOf(settings);
        this.nonlinearity = b.nonlinearity;
        this.shiftTerm = b.shiftTerm;
        this.reportingUnit = b.reportingUnit;
        this.maxAbsorbance = b.maxAbsorbance;
        this.tolerance = b.tolerance;
        this.maxIterations = b.maxIterations;
        this.weights = b.weights;
        this.canonicalText = CanonicalMethodText.write(this);
        this.contentHash = Sha256.hex(canonicalText.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * The method a {@link #canonicalText()} describes, exactly: its canonical text and hash are those of the
     * method that wrote the text.
     *
     * @throws IllegalArgumentException whose message names the line and the field at fault
     */
    public static QuantificationMethod parse(String canonicalText) {
        return parse(canonicalText, FitAlgorithmRegistry.installed());
    }

    /**
     * As {@link #parse(String)}, the algorithm looked up by name in the given registry.
     *
     * @throws IllegalArgumentException whose message names the line and the field at fault; for an algorithm the
     *                                  registry does not know, the known names
     */
    public static QuantificationMethod parse(String canonicalText, FitAlgorithmRegistry algorithms) {
        return CanonicalMethodText.read(canonicalText, algorithms);
    }

    public static Builder builder(String name) {
        return new Builder(name);
    }

    public String name() {
        return name;
    }

    /** Optical path of the sample cell in m; concentrations are reported in ppm at this path. */
    public double pathLengthMetres() {
        return pathLengthMetres;
    }

    /** Analytes in reporting order. */
    public List<Analyte> analytes() {
        return analytes;
    }

    /** All references, sorted by compound name and then by ppm·m. */
    public List<ReferenceSpectrum> references() {
        return references;
    }

    /** References of one compound, ascending in ppm·m. */
    public List<ReferenceSpectrum> references(String compound) {
        return references.stream().filter(r -> r.compound().equals(compound)).toList();
    }

    /** How the method fits the sample absorbance. */
    public FitAlgorithm algorithm() {
        return algorithm;
    }

    /**
     * The inputs the algorithm reads from the method besides analytes and references, sorted by key and value;
     * empty for the built-in algorithms.
     */
    public List<AlgorithmSetting> algorithmSettings() {
        return algorithmSettings;
    }

    /** The values of the settings of a key, in their canonical order. */
    public List<String> algorithmSettings(String key) {
        return algorithmSettings.stream().filter(s -> s.key().equals(key)).map(AlgorithmSetting::value).toList();
    }

    /**
     * Whether references of several amounts are interpolated at the current estimate (non-linear response); only
     * for {@link FitAlgorithm#CLASSICAL_LEAST_SQUARES}, the curve of growth uses all references anyway.
     */
    public boolean nonlinearity() {
        return nonlinearity;
    }

    public ShiftTerm shiftTerm() {
        return shiftTerm;
    }

    public ReportingUnit reportingUnit() {
        return reportingUnit;
    }

    /** Highest sample absorbance inside the fit windows that the fit trusts. */
    public double maxAbsorbance() {
        return maxAbsorbance;
    }

    /** Relative change of all concentrations below which the non-linear iteration has converged. */
    public double tolerance() {
        return tolerance;
    }

    /** Cap on iterations, both of the reference interpolation and of the Levenberg-Marquardt shift fit. */
    public int maxIterations() {
        return maxIterations;
    }

    /** Optional weight per wavenumber (for example the inverse noise variance); empty for equal weights. */
    public Optional<Spectrum> weights() {
        return Optional.ofNullable(weights);
    }

    /** All compounds that take part in some fit, in order of first appearance. */
    public Set<String> fittedCompounds() {
        Set<String> all = new LinkedHashSet<>();
        analytes.forEach(a -> all.addAll(a.fittedCompounds()));
        return all;
    }

    /** Deterministic text form: equal for equal methods, different when anything that changes a result differs. */
    public String canonicalText() {
        return canonicalText;
    }

    /** SHA-256 of the UTF-8 canonical text, as 64 lower-case hex digits. */
    public String contentHash() {
        return contentHash;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof QuantificationMethod m && canonicalText.equals(m.canonicalText);
    }

    @Override
    public int hashCode() {
        return canonicalText.hashCode();
    }

    @Override
    public String toString() {
        return "QuantificationMethod[" + name + ", " + analytes.size() + " analytes, " + contentHash + "]";
    }

    /** Collects the parts of a method; {@link #build()} validates them together. */
    public static final class Builder {
        private final String name;
        private double pathLengthMetres = Double.NaN;
        private final List<Analyte> analytes = new ArrayList<>();
        private final List<ReferenceSpectrum> references = new ArrayList<>();
        private FitAlgorithm algorithm = FitAlgorithm.CLASSICAL_LEAST_SQUARES;
        private final List<AlgorithmSetting> algorithmSettings = new ArrayList<>();
        private boolean nonlinearity;
        private ShiftTerm shiftTerm = ShiftTerm.NONE;
        private ReportingUnit reportingUnit = ReportingUnit.PPM;
        private double maxAbsorbance = DEFAULT_MAX_ABSORBANCE;
        private double tolerance = DEFAULT_TOLERANCE;
        private int maxIterations = DEFAULT_MAX_ITERATIONS;
        private Spectrum weights;

        private Builder(String name) {
            this.name = name;
        }

        public Builder pathLengthMetres(double metres) {
            this.pathLengthMetres = metres;
            return this;
        }

        public Builder analyte(Analyte analyte) {
            analytes.add(analyte);
            return this;
        }

        public Builder reference(ReferenceSpectrum reference) {
            references.add(reference);
            return this;
        }

        public Builder algorithm(FitAlgorithm fitAlgorithm) {
            this.algorithm = fitAlgorithm;
            return this;
        }

        /** Adds an input of the algorithm; see {@link QuantificationMethod#algorithmSettings()}. */
        public Builder algorithmSetting(AlgorithmSetting setting) {
            algorithmSettings.add(setting);
            return this;
        }

        public Builder nonlinearity(boolean on) {
            this.nonlinearity = on;
            return this;
        }

        public Builder shiftTerm(ShiftTerm term) {
            this.shiftTerm = term;
            return this;
        }

        public Builder reportingUnit(ReportingUnit unit) {
            this.reportingUnit = unit;
            return this;
        }

        public Builder maxAbsorbance(double absorbance) {
            this.maxAbsorbance = absorbance;
            return this;
        }

        public Builder tolerance(double relative) {
            this.tolerance = relative;
            return this;
        }

        public Builder maxIterations(int iterations) {
            this.maxIterations = iterations;
            return this;
        }

        /** Weight per wavenumber, positive; interpolated onto the sample axis like the references. */
        public Builder weights(Spectrum perWavenumber) {
            this.weights = perWavenumber;
            return this;
        }

        /** @throws IllegalArgumentException whose message names the field that is wrong and why */
        public QuantificationMethod build() {
            if (name == null || name.isBlank()) {
                throw new IllegalArgumentException("name must not be blank");
            }
            if (name.chars().anyMatch(Character::isISOControl)) {
                throw new IllegalArgumentException("name must not contain control characters");
            }
            if (!(pathLengthMetres > 0 && Double.isFinite(pathLengthMetres))) {
                throw new IllegalArgumentException("pathLengthMetres must be positive and finite, was "
                        + pathLengthMetres);
            }
            if (analytes.isEmpty()) {
                throw new IllegalArgumentException("analytes must hold at least one analyte");
            }
            Set<String> analyteNames = new HashSet<>();
            for (Analyte a : analytes) {
                if (a == null) {
                    throw new IllegalArgumentException("analytes must not contain null");
                }
                if (!analyteNames.add(a.compound())) {
                    throw new IllegalArgumentException("analytes lists " + a.compound() + " twice");
                }
            }
            Set<String> referenced = new HashSet<>();
            Set<String> amounts = new HashSet<>();
            for (ReferenceSpectrum r : references) {
                if (r == null) {
                    throw new IllegalArgumentException("references must not contain null");
                }
                referenced.add(r.compound());
                if (!amounts.add(r.compound() + " " + r.ppmMetres())) {
                    throw new IllegalArgumentException("references holds two spectra of " + r.compound() + " at "
                            + r.ppmMetres() + " ppm·m");
                }
            }
            for (Analyte a : analytes) {
                for (String c : a.fittedCompounds()) {
                    if (algorithm != null && algorithm.fitsReferences() && !referenced.contains(c)) {
                        throw new IllegalArgumentException("references has no spectrum of " + c + ", fitted for "
                                + a.compound());
                    }
                }
            }
            if (algorithm == null) {
                throw new IllegalArgumentException("algorithm must not be null");
            }
            if (algorithmSettings.contains(null)) {
                throw new IllegalArgumentException("algorithmSettings must not contain null");
            }
            if (shiftTerm == null) {
                throw new IllegalArgumentException("shiftTerm must not be null");
            }
            if (shiftTerm != ShiftTerm.NONE && !algorithm.shiftTerms().contains(shiftTerm)) {
                throw new IllegalArgumentException("shiftTerm " + shiftTerm + " is not offered by the algorithm "
                        + algorithm.name() + " (in method texts " + CanonicalMethodText.storedName(algorithm)
                        + "), which offers " + new java.util.TreeSet<>(algorithm.shiftTerms()));
            }
            if (reportingUnit == null) {
                throw new IllegalArgumentException("reportingUnit must not be null");
            }
            if (!(maxAbsorbance > 0 && Double.isFinite(maxAbsorbance))) {
                throw new IllegalArgumentException("maxAbsorbance must be positive and finite, was " + maxAbsorbance);
            }
            if (!(tolerance > 0 && tolerance < 1)) {
                throw new IllegalArgumentException("tolerance must be in (0, 1), was " + tolerance);
            }
            if (maxIterations < 1) {
                throw new IllegalArgumentException("maxIterations must be at least 1, was " + maxIterations);
            }
            if (weights != null) {
                for (int i = 0; i < weights.size(); i++) {
                    if (!(weights.get(i) > 0 && Double.isFinite(weights.get(i)))) {
                        throw new IllegalArgumentException("weights must be positive and finite, index " + i
                                + " was " + weights.get(i));
                    }
                }
            }
            return new QuantificationMethod(this);
        }
    }
}
