package org.tracegas.importer;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.core.runtime.ContributorFactorySimple;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.RegistryFactory;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.spi.RegistryContributor;
import org.eclipse.core.runtime.spi.RegistryStrategy;

/**
 * An extension registry outside OSGi, filled from plugin.xml files, for command-line tools and tests that run on
 * a plain class path. Contributed classes are loaded with the given class loader.
 */
public final class StandaloneExtensions {

    private StandaloneExtensions() {
    }

    /**
     * @param pluginXmls plugin.xml file per contributing bundle id, in contribution order
     * @throws IOException              if a plugin.xml cannot be read
     * @throws IllegalArgumentException naming the bundle whose plugin.xml the registry does not accept
     */
    public static IExtensionRegistry create(ClassLoader loader, Map<String, Path> pluginXmls) throws IOException {
        Object masterToken = new Object();
        IExtensionRegistry registry = RegistryFactory.createRegistry(new ClassLoaderStrategy(loader), masterToken,
                null);
        for (Map.Entry<String, Path> e : pluginXmls.entrySet()) {
            try (InputStream in = Files.newInputStream(e.getValue())) {
                if (!registry.addContribution(in, ContributorFactorySimple.createContributor(e.getKey()), false,
                        e.getKey(), null, masterToken)) {
                    throw new IllegalArgumentException("plugin.xml of " + e.getKey() + " (" + e.getValue()
                            + ") was not accepted by the extension registry");
                }
            }
        }
        return registry;
    }

    /**
     * A registry from the plugin.xml files of bundles in a source tree: each bundle is looked up as
     * {@code <id>/plugin.xml} or {@code bundles/<id>/plugin.xml} in the working directory and its parents.
     *
     * @throws IllegalArgumentException naming the bundle whose plugin.xml is not found
     */
    public static IExtensionRegistry fromSourceTree(ClassLoader loader, String... bundleIds) throws IOException {
        Map<String, Path> files = new LinkedHashMap<>();
        for (String id : bundleIds) {
            files.put(id, find(id));
        }
        return create(loader, files);
    }

    private static Path find(String bundleId) {
        Path start = Paths.get("").toAbsolutePath();
        for (Path dir = start; dir != null; dir = dir.getParent()) {
            for (Path candidate : new Path[] {dir.resolve(bundleId).resolve("plugin.xml"),
                    dir.resolve("bundles").resolve(bundleId).resolve("plugin.xml")}) {
                if (Files.isRegularFile(candidate)) {
                    return candidate;
                }
            }
        }
        throw new IllegalArgumentException("plugin.xml of bundle " + bundleId + " not found in " + start
                + " or its parents");
    }

    /** Creates contributed classes through one class loader instead of the registry's own. */
    private static final class ClassLoaderStrategy extends RegistryStrategy {
        private final ClassLoader loader;

        ClassLoaderStrategy(ClassLoader loader) {
            super(null, null);
            this.loader = loader;
        }

        @Override
        public Object createExecutableExtension(RegistryContributor contributor, String className,
                String overriddenContributorName) throws CoreException {
            try {
                return Class.forName(className, true, loader).getDeclaredConstructor().newInstance();
            } catch (ReflectiveOperationException | LinkageError e) {
                throw new CoreException(new Status(IStatus.ERROR, contributor.getActualName(),
                        "class " + className + " cannot be created: " + e, e));
            }
        }
    }
}
