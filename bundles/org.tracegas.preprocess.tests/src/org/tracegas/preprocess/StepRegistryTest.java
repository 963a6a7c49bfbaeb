package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.eclipse.core.runtime.ContributorFactorySimple;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.eclipse.core.runtime.spi.RegistryStrategy;
import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Spectrum;

class StepRegistryTest {

    private static final Object MASTER = new Object();

    /** A real (non-OSGi) extension registry holding the bundle's own plugin.xml and optional extra contributions. */
    private static IExtensionRegistry registryWith(String... extraPluginXml) throws IOException {
        // classes are loaded through this test's loader: inside OSGi the registry bundle cannot see them
        RegistryStrategy strategy = new RegistryStrategy(null, null) {
            @Override
            public Object createExecutableExtension(org.eclipse.core.runtime.spi.RegistryContributor contributor,
                    String className, String overriddenContributorName) throws org.eclipse.core.runtime.CoreException {
                try {
                    return Class.forName(className, true, StepRegistryTest.class.getClassLoader())
                            .getDeclaredConstructor().newInstance();
                } catch (ReflectiveOperationException | LinkageError e) {
                    throw new org.eclipse.core.runtime.CoreException(new org.eclipse.core.runtime.Status(
                            org.eclipse.core.runtime.IStatus.ERROR, "org.tracegas.preprocess.tests",
                            "cannot create " + className, e));
                }
            }
        };
        IExtensionRegistry registry = RegistryFactory.createRegistry(strategy, MASTER, null);
        try (InputStream in = pluginXml()) {
            assertTrue(registry.addContribution(in, ContributorFactorySimple.createContributor("org.tracegas.preprocess"),
                    false, "plugin.xml", null, MASTER));
        }
        int i = 0;
        for (String xml : extraPluginXml) {
            assertTrue(registry.addContribution(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)),
                    ContributorFactorySimple.createContributor("org.example.extra" + i++), false, "plugin.xml", null,
                    MASTER));
        }
        return registry;
    }

    /**
     * plugin.xml from the bundle root: on the class path inside OSGi (other jars on a flat class path have their
     * own, hence the content check), else found from the working directory upwards.
     */
    private static InputStream pluginXml() throws IOException {
        try (InputStream in = StepRegistry.class.getResourceAsStream("/plugin.xml")) {
            if (in != null) {
                byte[] bytes = in.readAllBytes();
                if (isOurs(bytes)) {
                    return new ByteArrayInputStream(bytes);
                }
            }
        }
        for (Path dir = Path.of("").toAbsolutePath(); dir != null; dir = dir.getParent()) {
            for (Path candidate : new Path[] {dir.resolve("org.tracegas.preprocess/plugin.xml"),
                    dir.resolve("bundles/org.tracegas.preprocess/plugin.xml")}) {
                if (Files.isRegularFile(candidate) && isOurs(Files.readAllBytes(candidate))) {
                    return Files.newInputStream(candidate);
                }
            }
        }
        throw new IOException("plugin.xml of org.tracegas.preprocess not found from " + Path.of("").toAbsolutePath());
    }

    private static boolean isOurs(byte[] pluginXml) {
        return new String(pluginXml, StandardCharsets.UTF_8).contains("<extension-point id=\"steps\"");
    }

    @Test
    void pluginXmlDeclaresExactlyTheBuiltInSteps() throws IOException {
        StepRegistry fromExtensions = StepRegistry.fromExtensions(registryWith());
        assertEquals(StepRegistry.withBuiltInSteps().ids(), fromExtensions.ids());
        SpectrumStep shift = fromExtensions.create("shift", Map.of("offset", "0.5"));
        assertEquals("shift", shift.id());
        assertEquals("0.5", shift.parameters().get("offset"));
    }

    @Test
    void contributedStepIsUsableAndWrongContributionsAreNamed() throws IOException {
        String negate = """
                <?xml version="1.0" encoding="UTF-8"?>
                <plugin>
                   <extension point="org.tracegas.preprocess.steps">
                      <step id="negate" class="org.tracegas.preprocess.StepRegistryTest$NegateFactory"/>
                   </extension>
                </plugin>
                """;
        StepRegistry registry = StepRegistry.fromExtensions(registryWith(negate));
        Spectrum in = SincResamplerTest.sampled();
        Spectrum out = registry.create("negate", Map.of()).apply(in);
        assertEquals(-in.get(5), out.get(5), 0.0);

        String wrongId = negate.replace("id=\"negate\"", "id=\"flip\"");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StepRegistry.fromExtensions(registryWith(wrongId)));
        assertTrue(e.getMessage().contains("step 'flip' of org.example.extra0"), e.getMessage());
        String missing = negate.replace("NegateFactory", "MissingFactory");
        e = assertThrows(IllegalArgumentException.class, () -> StepRegistry.fromExtensions(registryWith(missing)));
        assertTrue(e.getMessage().contains("cannot be created"), e.getMessage());
    }

    @Test
    void plainRegistrationRejectsDuplicates() {
        StepRegistry registry = StepRegistry.withBuiltInSteps();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> registry.register(new NegateFactory()).register(new NegateFactory()));
        assertTrue(e.getMessage().contains("'negate'"), e.getMessage());
        assertNotNull(registry.create("negate", Map.of()));
    }

    /** A step contributed from outside the bundle. */
    public static final class NegateFactory implements SpectrumStepFactory {
        @Override
        public String id() {
            return "negate";
        }

        @Override
        public SpectrumStep create(Map<String, String> parameters) {
            return new SpectrumStep() {
                @Override
                public String id() {
                    return "negate";
                }

                @Override
                public java.util.SortedMap<String, String> parameters() {
                    return java.util.Collections.emptySortedMap();
                }

                @Override
                public Spectrum apply(Spectrum input) {
                    double[] v = input.toArray();
                    for (int i = 0; i < v.length; i++) {
                        v[i] = -v[i];
                    }
                    return input.withValues(v, input.ordinate());
                }
            };
        }
    }
}
