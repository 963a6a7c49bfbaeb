package org.tracegas.preprocess;

import java.util.Collections;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.tracegas.preprocess.internal.BaselineStep;
import org.tracegas.preprocess.internal.DeresolveStep;
import org.tracegas.preprocess.internal.ResampleStep;
import org.tracegas.preprocess.internal.ShiftStep;

/**
 * The step factories known by id: read from the Eclipse extension registry (extension point
 * {@value #EXTENSION_POINT}) or registered directly for plain Java use. Thread safe.
 */
public final class StepRegistry {

    /** Extension point through which bundles contribute steps; elements "step" with attributes id and class. */
    public static final String EXTENSION_POINT = "org.tracegas.preprocess.steps";

    private final Map<String, SpectrumStepFactory> factories = new TreeMap<>();

    /** An empty registry. */
    public StepRegistry() {
    }

    /** A registry holding the steps of this bundle, for use without an extension registry. */
    public static StepRegistry withBuiltInSteps() {
        return new StepRegistry().register(new BaselineStep.Factory()).register(new ResampleStep.Factory())
                .register(new DeresolveStep.Factory()).register(new ShiftStep.Factory());
    }

    /**
     * A registry of all steps contributed to {@value #EXTENSION_POINT}.
     *
     * @throws IllegalArgumentException naming the contributor and id of an element whose class cannot be created,
     *                                  is not a step factory, or states another id
     */
    public static StepRegistry fromExtensions(IExtensionRegistry extensionRegistry) {
        if (extensionRegistry == null) {
            throw new IllegalArgumentException("extension registry must not be null");
        }
        StepRegistry registry = new StepRegistry();
        for (IConfigurationElement element : extensionRegistry.getConfigurationElementsFor(EXTENSION_POINT)) {
            String id = element.getAttribute("id");
            String where = "step '" + id + "' of " + element.getContributor().getName();
            Object created;
            try {
                created = element.createExecutableExtension("class");
            } catch (CoreException e) {
                throw new IllegalArgumentException(where + ": class " + element.getAttribute("class")
                        + " cannot be created: " + e.getMessage(), e);
            }
            if (!(created instanceof SpectrumStepFactory factory)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName()
                        + " is not a " + SpectrumStepFactory.class.getSimpleName());
            }
            if (!factory.id().equals(id)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName()
                        + " creates steps '" + factory.id() + "'");
            }
            registry.register(factory);
        }
        return registry;
    }

    /**
     * @return this registry
     * @throws IllegalArgumentException if the factory is null or its id is taken
     */
    public synchronized StepRegistry register(SpectrumStepFactory factory) {
        if (factory == null || factory.id() == null || factory.id().isBlank()) {
            throw new IllegalArgumentException("step factory and its id must not be null or blank");
        }
        if (factories.containsKey(factory.id())) {
            throw new IllegalArgumentException("step id '" + factory.id() + "' is registered twice");
        }
        factories.put(factory.id(), factory);
        return this;
    }

    public synchronized Set<String> ids() {
        return Collections.unmodifiableSet(new java.util.TreeSet<>(factories.keySet()));
    }

    /**
     * A step of a registered kind.
     *
     * @throws IllegalArgumentException if the id is unknown (the message lists the known ids) or the factory
     *                                  rejects the parameters
     */
    public SpectrumStep create(String id, Map<String, String> parameters) {
        SpectrumStepFactory factory;
        synchronized (this) {
            factory = factories.get(id);
        }
        if (factory == null) {
            throw new IllegalArgumentException("unknown step id '" + id + "', known: " + ids());
        }
        return factory.create(parameters);
    }
}
