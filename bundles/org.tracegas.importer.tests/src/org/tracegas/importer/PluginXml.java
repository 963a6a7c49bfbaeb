package org.tracegas.importer;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;

/**
 * The extension registry a test should use: the running platform's one inside an OSGi test runtime, otherwise a
 * fresh registry filled with the plugin.xml files of the given bundles, found beside the working directory.
 */
public final class PluginXml {

    private PluginXml() {
    }

    public static IExtensionRegistry registry(String... bundles) throws IOException {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        if (running != null) {
            return running;
        }
        Map<String, Path> files = new LinkedHashMap<>();
        for (String bundle : bundles) {
            files.put(bundle, find(bundle));
        }
        return StandaloneExtensions.create(PluginXml.class.getClassLoader(), files);
    }

    private static Path find(String bundle) {
        for (Path dir = Paths.get("").toAbsolutePath(); dir != null; dir = dir.getParent()) {
            for (Path candidate : new Path[] {dir.resolve(bundle).resolve("plugin.xml"),
                    dir.resolve("bundles").resolve(bundle).resolve("plugin.xml")}) {
                if (Files.isRegularFile(candidate)) {
                    return candidate;
                }
            }
        }
        throw new IllegalStateException("plugin.xml of " + bundle + " not found above " + Paths.get("").toAbsolutePath());
    }
}
