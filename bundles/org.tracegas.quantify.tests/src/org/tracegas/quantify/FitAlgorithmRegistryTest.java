package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.eclipse.core.runtime.ContributorFactorySimple;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.RegistryFactory;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.spi.RegistryContributor;
import org.eclipse.core.runtime.spi.RegistryStrategy;
import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Spectrum;

/** The algorithms as a plug-in point: the bundle's own through its plugin.xml, a lab's through its own. */
class FitAlgorithmRegistryTest {

    private static final Object MASTER = new Object();

    /** A real (non-OSGi) extension registry holding the bundle's own plugin.xml and optional extra contributions. */
    private static IExtensionRegistry registryWith(String... extraPluginXml) throws IOException {
        // classes are loaded through this test's loader: inside OSGi the registry bundle cannot see them
        RegistryStrategy strategy = new RegistryStrategy(null, null) {
            @Override
            public Object createExecutableExtension(RegistryContributor contributor, String className,
                    String overriddenContributorName) throws CoreException {
                try {
                    return Class.forName(className, true, FitAlgorithmRegistryTest.class.getClassLoader())
                            .getDeclaredConstructor().newInstance();
                } catch (ReflectiveOperationException | LinkageError e) {
                    throw new CoreException(new Status(IStatus.ERROR, "org.tracegas.quantify.tests",
                            "cannot create " + className, e));
                }
            }
        };
        IExtensionRegistry registry = RegistryFactory.createRegistry(strategy, MASTER, null);
        try (InputStream in = pluginXml()) {
            assertTrue(registry.addContribution(in, ContributorFactorySimple.createContributor("org.tracegas.quantify"),
                    false, "plugin.xml", null, MASTER));
        }
        int i = 0;
        for (String xml : extraPluginXml) {
            assertTrue(registry.addContribution(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)),
                    ContributorFactorySimple.createContributor("org.example.lab" + i++), false, "plugin.xml", null,
                    MASTER));
        }
        return registry;
    }

    /** plugin.xml from the bundle root: on the class path inside OSGi, else found from the working directory up. */
    private static InputStream pluginXml() throws IOException {
        try (InputStream in = FitAlgorithm.class.getResourceAsStream("/plugin.xml")) {
            if (in != null) {
                byte[] bytes = in.readAllBytes();
                if (isOurs(bytes)) {
                    return new ByteArrayInputStream(bytes);
                }
            }
        }
        for (Path dir = Path.of("").toAbsolutePath(); dir != null; dir = dir.getParent()) {
            for (Path candidate : new Path[] {dir.resolve("org.tracegas.quantify/plugin.xml"),
                    dir.resolve("bundles/org.tracegas.quantify/plugin.xml")}) {
                if (Files.isRegularFile(candidate) && isOurs(Files.readAllBytes(candidate))) {
                    return Files.newInputStream(candidate);
                }
            }
        }
        throw new IOException("plugin.xml of org.tracegas.quantify not found from " + Path.of("").toAbsolutePath());
    }

    private static boolean isOurs(byte[] pluginXml) {
        return new String(pluginXml, StandardCharsets.UTF_8).contains("<extension-point id=\"algorithms\"");
    }

    private static final String LAB = """
            <?xml version="1.0" encoding="UTF-8"?>
            <plugin>
               <extension point="org.tracegas.quantify.algorithms">
                  <algorithm name="band-area" class="org.tracegas.quantify.FitAlgorithmRegistryTest$BandArea"/>
               </extension>
            </plugin>
            """;

    @Test
    void pluginXmlDeclaresExactlyTheBuiltInAlgorithms() throws IOException {
        FitAlgorithmRegistry fromExtensions = FitAlgorithmRegistry.fromExtensions(registryWith());
        assertEquals(Set.of("classical-least-squares", "curve-of-growth"), fromExtensions.names());
        // the instances the extension registry creates are the constants methods are built with
        assertEquals(FitAlgorithm.CURVE_OF_GROWTH, fromExtensions.get("curve-of-growth"));
        assertEquals(FitAlgorithm.CLASSICAL_LEAST_SQUARES, fromExtensions.get("classical-least-squares"));
        assertEquals(FitAlgorithmRegistry.withBuiltInAlgorithms().names(), fromExtensions.names());
        assertTrue(FitAlgorithmRegistry.installed().names().containsAll(fromExtensions.names()));
    }

    /** A lab's algorithm fits a method, is named in the method's text and found by that name when read back. */
    @Test
    void contributedAlgorithmFitsAMethodAndTravelsWithItsText() throws IOException {
        FitAlgorithmRegistry registry = FitAlgorithmRegistry.fromExtensions(registryWith(LAB));
        QuantificationMethod m = method(registry.get("band-area"));
        assertTrue(m.canonicalText().contains("\nalgorithm BAND_AREA\n"), m.canonicalText());
        QuantificationMethod back = QuantificationMethod.parse(m.canonicalText(), registry);
        assertEquals(m, back);
        assertEquals(new BandArea(), back.algorithm());

        // twice the reference's absorbance: twice its 100 ppm·m over the 2 m path
        Spectrum reference = SyntheticGas.named("CH4").reference(100, 0).absorbance();
        double[] twice = reference.toArray();
        for (int i = 0; i < twice.length; i++) {
            twice[i] *= 2;
        }
        Quantifier q = new Quantifier(PreparedMethod.prepare(m, reference.axis()), "l", "v", false);
        CompoundResult r = q.quantify(Sample.of(reference.withValues(twice, reference.ordinate()))).compound("CH4")
                .orElseThrow();
        assertEquals(100.0, r.concentration(), 1e-9);
    }

    @Test
    void anUnknownAlgorithmInAMethodTextIsRefusedNamingLineAndKnownNames() throws IOException {
        String text = method(FitAlgorithm.CURVE_OF_GROWTH).canonicalText().replace("algorithm CURVE_OF_GROWTH",
                "algorithm BAND_AREA");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> QuantificationMethod.parse(text, FitAlgorithmRegistry.withBuiltInAlgorithms()));
        assertTrue(e.getMessage().startsWith("line 10, field 'algorithm': unknown fit algorithm 'band-area', known: "
                + "classical-least-squares, curve-of-growth"), e.getMessage());
        // with the lab's bundle installed the same text reads
        assertEquals(new BandArea(), QuantificationMethod.parse(text,
                FitAlgorithmRegistry.fromExtensions(registryWith(LAB))).algorithm());
    }

    @Test
    void wrongContributionsAreNamed() throws IOException {
        String wrongName = LAB.replace("name=\"band-area\"", "name=\"band-sum\"");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FitAlgorithmRegistry.fromExtensions(registryWith(wrongName)));
        assertTrue(e.getMessage().contains("fit algorithm 'band-sum' of org.example.lab0")
                && e.getMessage().contains("is named 'band-area'"), e.getMessage());
        String missing = LAB.replace("$BandArea", "$Missing");
        e = assertThrows(IllegalArgumentException.class, () -> FitAlgorithmRegistry.fromExtensions(registryWith(missing)));
        assertTrue(e.getMessage().contains("cannot be created"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> FitAlgorithmRegistry.fromExtensions(registryWith(LAB,
                LAB)));
        assertTrue(e.getMessage().contains("'band-area' is registered twice"), e.getMessage());
    }

    @Test
    void plainRegistrationRefusesDuplicatesAndBadNames() {
        FitAlgorithmRegistry registry = FitAlgorithmRegistry.withBuiltInAlgorithms().register(new BandArea());
        assertEquals(List.of("band-area", "classical-least-squares", "curve-of-growth"),
                List.copyOf(registry.names()));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> registry.register(
                new BandArea()));
        assertTrue(e.getMessage().contains("'band-area' is registered twice"), e.getMessage());
        FitAlgorithm shouting = new BandArea() {
            @Override
            public String name() {
                return "Band Area";
            }
        };
        e = assertThrows(IllegalArgumentException.class, () -> registry.register(shouting));
        assertTrue(e.getMessage().contains("Band Area"), e.getMessage());
    }

    /** A method whose shift term the algorithm does not offer is refused, naming the terms it offers. */
    @Test
    void shiftTermsAreTheAlgorithms() {
        QuantificationMethod.Builder b = builder().algorithm(new BandArea()).shiftTerm(ShiftTerm.SCALE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, b::build);
        assertTrue(e.getMessage().contains("band-area (in method texts BAND_AREA), which offers []"), e.getMessage());
    }

    private static QuantificationMethod.Builder builder() {
        return QuantificationMethod.builder("CH4 band area").pathLengthMetres(2)
                .analyte(new Analyte("CH4", List.of(), List.of(AnalysisRegion.of(2900, 3100, 0))))
                .reference(SyntheticGas.named("CH4").reference(100, 0));
    }

    private static QuantificationMethod method(FitAlgorithm algorithm) {
        return builder().algorithm(algorithm).build();
    }

    /**
     * A lab's algorithm: the analyte's band area over its regions against that of its highest reference. Not for
     * use, only to show that any algorithm fits in.
     */
    public static class BandArea implements FitAlgorithm {

        @Override
        public String name() {
            return "band-area";
        }

        @Override
        public Set<ShiftTerm> shiftTerms() {
            return Set.of();
        }

        @Override
        public PreparedFit prepare(QuantificationMethod method, org.tracegas.spectrum.SpectralAxis axis) {
            return new PreparedFit() {
                @Override
                public int systemCount() {
                    return method.analytes().size();
                }

                @Override
                public List<CompoundResult> fit(Sample sample, boolean keepSpectra) {
                    List<CompoundResult> out = new ArrayList<>();
                    for (Analyte a : method.analytes()) {
                        List<ReferenceSpectrum> refs = method.references(a.compound());
                        ReferenceSpectrum highest = refs.get(refs.size() - 1);
                        double ratio = area(sample.absorbance(), a) / area(highest.absorbance(), a);
                        out.add(new CompoundResult(a.compound(), ratio * highest.ppmMetres()
                                / method.pathLengthMetres(), Double.NaN, Double.NaN, method.reportingUnit(), List.of(),
                                EnumSet.noneOf(QualityFlag.class), 0, Double.NaN, Double.NaN, Double.NaN,
                                Optional.empty()));
                    }
                    return out;
                }
            };
        }

        private static double area(Spectrum s, Analyte a) {
            double sum = 0;
            for (int i = 0; i < s.size(); i++) {
                for (AnalysisRegion r : a.regions()) {
                    sum += r.contains(s.axis().get(i)) ? s.get(i) : 0;
                }
            }
            return sum;
        }

        @Override
        public boolean equals(Object o) {
            return o != null && o.getClass() == BandArea.class;
        }

        @Override
        public int hashCode() {
            return BandArea.class.hashCode();
        }
    }
}
