package org.tracegas.qa.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;

/**
 * The QA checks known by the names QA plans use: read from the Eclipse extension registry (extension point
 * {@value #EXTENSION_POINT}) or registered directly for plain Java use. Thread safe.
 */
public final class QaCheckRegistry {

    /** Extension point through which bundles contribute checks; elements "check" with attributes name and class. */
    public static final String EXTENSION_POINT = "org.tracegas.qa.checks";

    private final Map<String, QaCheck> checks = new LinkedHashMap<>();

    /** An empty registry. */
    public QaCheckRegistry() {
    }

    /**
     * A registry of all checks contributed to {@value #EXTENSION_POINT}, in contribution order.
     *
     * @throws IllegalArgumentException naming the contributor and name of an element whose class cannot be
     *                                  created, is not a check, or states another name
     */
    public static QaCheckRegistry fromExtensions(IExtensionRegistry extensionRegistry) {
        if (extensionRegistry == null) {
            throw new IllegalArgumentException("extension registry must not be null");
        }
        QaCheckRegistry registry = new QaCheckRegistry();
        for (IConfigurationElement element : extensionRegistry.getConfigurationElementsFor(EXTENSION_POINT)) {
            String name = element.getAttribute("name");
            String where = "QA check '" + name + "' of " + element.getContributor().getName();
            Object created;
            try {
                created = element.createExecutableExtension("class");
            } catch (CoreException e) {
                throw new IllegalArgumentException(where + ": class " + element.getAttribute("class")
                        + " cannot be created: " + e.getMessage(), e);
            }
            if (!(created instanceof QaCheck check)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName()
                        + " is not a " + QaCheck.class.getSimpleName());
            }
            if (!check.name().equals(name)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName()
                        + " is named '" + check.name() + "'");
            }
            registry.register(check);
        }
        return registry;
    }

    /**
     * @return this registry
     * @throws IllegalArgumentException if the check or its name is null or blank, or the name is taken
     */
    public synchronized QaCheckRegistry register(QaCheck check) {
        if (check == null || check.name() == null || check.name().isBlank()) {
            throw new IllegalArgumentException("QA check and its name must not be null or blank");
        }
        if (checks.containsKey(check.name())) {
            throw new IllegalArgumentException("QA check '" + check.name() + "' is registered twice");
        }
        checks.put(check.name(), check);
        return this;
    }

    /** The names of the registered checks, in registration order. */
    public synchronized List<String> names() {
        return List.copyOf(new ArrayList<>(checks.keySet()));
    }

    /** The check a plan names, if one is registered under that name. */
    public synchronized Optional<QaCheck> find(String name) {
        return Optional.ofNullable(checks.get(name));
    }
}
