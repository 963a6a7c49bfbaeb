package org.tracegas.quantify.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.tracegas.quantify.FitAlgorithm;

/**
 * Reads the fit algorithms contributed to an extension registry. Kept apart from the registry of algorithms, which
 * catches the failure to load this class on a plain Java class path without the Equinox registry and serves the
 * built-in algorithms there.
 */
public final class AlgorithmExtensions {

    private AlgorithmExtensions() {
    }

    /**
     * The algorithms contributed to an extension point, in contribution order.
     *
     * @throws IllegalArgumentException naming the contributor and name of an element whose class cannot be
     *                                  created, is not a fit algorithm, or states another name
     */
    public static List<FitAlgorithm> read(IExtensionRegistry registry, String extensionPoint) {
        List<FitAlgorithm> out = new ArrayList<>();
        for (IConfigurationElement element : registry.getConfigurationElementsFor(extensionPoint)) {
            String name = element.getAttribute("name");
            String where = "fit algorithm '" + name + "' of " + element.getContributor().getName();
            Object created;
            try {
                created = element.createExecutableExtension("class");
            } catch (CoreException e) {
                throw new IllegalArgumentException(where + ": class " + element.getAttribute("class")
                        + " cannot be created: " + e.getMessage(), e);
            }
            if (!(created instanceof FitAlgorithm algorithm)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName() + " is not a "
                        + FitAlgorithm.class.getSimpleName());
            }
            if (!algorithm.name().equals(name)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName()
                        + " is named '" + algorithm.name() + "'");
            }
            out.add(algorithm);
        }
        return out;
    }

    /**
     * The algorithms contributed to the running platform's extension registry, empty when no platform runs or its
     * registry lacks the extension point.
     *
     * @throws IllegalArgumentException as {@link #read(IExtensionRegistry, String)}
     * @throws NoClassDefFoundError     on a class path without the Equinox registry
     */
    public static Optional<List<FitAlgorithm>> fromPlatform(String extensionPoint) {
        IExtensionRegistry registry = RegistryFactory.getRegistry();
        return registry != null && registry.getExtensionPoint(extensionPoint) != null
                ? Optional.of(read(registry, extensionPoint))
                : Optional.empty();
    }
}
