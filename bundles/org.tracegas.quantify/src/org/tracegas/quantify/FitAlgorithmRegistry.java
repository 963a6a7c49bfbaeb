package org.tracegas.quantify;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Pattern;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.tracegas.quantify.internal.AlgorithmExtensions;

/**
 * The fit algorithms known by name: read from the Eclipse extension registry (extension point
 * {@value #EXTENSION_POINT}) or registered directly for plain Java use. Thread safe.
 */
public final class FitAlgorithmRegistry {

    /** Extension point through which bundles contribute algorithms; elements "algorithm" with name and class. */
    public static final String EXTENSION_POINT = "org.tracegas.quantify.algorithms";

    private static final Pattern NAME = Pattern.compile("[a-z][a-z0-9]*(-[a-z0-9]+)*");

    private final Map<String, FitAlgorithm> algorithms = new TreeMap<>();

    /** An empty registry. */
    public FitAlgorithmRegistry() {
    }

    /** A registry holding this bundle's algorithms, for use without an extension registry. */
    public static FitAlgorithmRegistry withBuiltInAlgorithms() {
        return new FitAlgorithmRegistry().register(FitAlgorithm.CLASSICAL_LEAST_SQUARES)
                .register(FitAlgorithm.CURVE_OF_GROWTH);
    }

    /**
     * A registry of all algorithms contributed to {@value #EXTENSION_POINT}.
     *
     * @throws IllegalArgumentException naming the contributor and name of an element whose class cannot be
     *                                  created, is not a fit algorithm, or states another name
     */
    public static FitAlgorithmRegistry fromExtensions(IExtensionRegistry extensionRegistry) {
        if (extensionRegistry == null) {
            throw new IllegalArgumentException("extension registry must not be null");
        }
        FitAlgorithmRegistry registry = new FitAlgorithmRegistry();
        AlgorithmExtensions.read(extensionRegistry, EXTENSION_POINT).forEach(registry::register);
        return registry;
    }

    /**
     * The algorithms installed where this runs: those contributed to the running platform's extension registry,
     * or the built-in ones where no platform with this bundle's extension point runs (a plain Java class path).
     * Method texts are read with it.
     *
     * @throws IllegalArgumentException as {@link #fromExtensions(IExtensionRegistry)}
     */
    public static FitAlgorithmRegistry installed() {
        Optional<List<FitAlgorithm>> contributed;
        try {
            contributed = AlgorithmExtensions.fromPlatform(EXTENSION_POINT);
        } catch (NoClassDefFoundError e) {
            // a bare class path without the Equinox registry (batch child processes, command-line tools)
            contributed = Optional.empty();
        }
        if (contributed.isEmpty()) {
            return withBuiltInAlgorithms();
        }
        FitAlgorithmRegistry registry = new FitAlgorithmRegistry();
        contributed.get().forEach(registry::register);
        return registry;
    }

    /**
     * @return this registry
     * @throws IllegalArgumentException if the algorithm is null, its name is not lower-case words joined by '-', or
     *                                  the name is taken
     */
    public synchronized FitAlgorithmRegistry register(FitAlgorithm algorithm) {
        if (algorithm == null || algorithm.name() == null || !NAME.matcher(algorithm.name()).matches()) {
            throw new IllegalArgumentException("fit algorithm must not be null and its name must be lower-case words"
                    + " joined by '-', was " + (algorithm == null ? null : algorithm.name()));
        }
        if (algorithms.containsKey(algorithm.name())) {
            throw new IllegalArgumentException("fit algorithm '" + algorithm.name() + "' is registered twice");
        }
        algorithms.put(algorithm.name(), algorithm);
        return this;
    }

    /** Names of the registered algorithms, sorted. */
    public synchronized Set<String> names() {
        return Collections.unmodifiableSet(new TreeSet<>(algorithms.keySet()));
    }

    public synchronized Optional<FitAlgorithm> find(String name) {
        return Optional.ofNullable(algorithms.get(name));
    }

    /**
     * The algorithm of a name.
     *
     * @throws IllegalArgumentException if the name is unknown; the message lists the known names
     */
    public FitAlgorithm get(String name) {
        return find(name).orElseThrow(() -> new IllegalArgumentException("unknown fit algorithm '" + name
                + "', known: " + String.join(", ", names())));
    }
}
