package org.tracegas.releng.apibaseline;

import java.io.File;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import aQute.bnd.differ.Baseline;
import aQute.bnd.differ.DiffPluginImpl;
import aQute.bnd.header.Attrs;
import aQute.bnd.header.Parameters;
import aQute.bnd.osgi.Jar;
import aQute.bnd.osgi.Processor;
import aQute.bnd.service.diff.Delta;
import aQute.bnd.service.diff.Diff;
import aQute.bnd.service.diff.Type;
import aQute.bnd.version.Version;

/**
 * Guards the bundles' API across releases with bnd's baseline analysis.
 *
 * <ul>
 * <li>{@code check <baseline folder> <bundles folder>}: every exported package of every built bundle
 * ({@code bundles/<id>/target/<id>-*.jar}) carries a version, and no package exported as API (not
 * {@code x-internal}) in the baseline changed incompatibly without a major step of its version. Incompatible
 * is what bnd finds removed or changed, and a method added to one of the interfaces that add-ons implement
 * ({@code consumer-types.txt}); a method added to any other type is compatible, since only the workbench
 * implements those. A compatible addition without a minor step is reported, not failed. Exit 1 on a
 * failure.</li>
 * <li>{@code record <baseline folder> <bundles folder>}: writes the built bundles' API (their manifests and
 * the classes of their non-internal exported packages) as the baseline of a release.</li>
 * </ul>
 */
public final class ApiBaseline {

    private static final String EXPORT = "Export-Package";
    private static final String INTERNAL = "x-internal:";

    private ApiBaseline() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length != 4 || !(args[0].equals("check") || args[0].equals("record"))) {
            throw new IllegalArgumentException("usage: (check|record) <baseline folder> <bundles folder>"
                    + " <consumer types file>, got " + List.of(args));
        }
        Path baseline = Path.of(args[1]);
        List<Path> built = builtBundles(Path.of(args[2]));
        if (built.isEmpty()) {
            throw new IllegalArgumentException(args[2] + ": no built bundles (bundles/*/target/*.jar); build first");
        }
        if (args[0].equals("record")) {
            Files.createDirectories(baseline);
            for (Path jar : built) {
                record(jar, baseline.resolve(symbolicName(jar) + ".jar"));
            }
            System.out.println("recorded the API of " + built.size() + " bundles in " + baseline);
            return;
        }
        Set<String> consumerTypes = consumerTypes(Path.of(args[3]));
        List<String> failures = new ArrayList<>();
        for (Path jar : built) {
            failures.addAll(unversionedExports(jar));
            Path older = baseline.resolve(symbolicName(jar) + ".jar");
            if (Files.exists(older)) {
                failures.addAll(compare(jar, older, consumerTypes));
            } else {
                System.out.println(symbolicName(jar) + ": new since the baseline, nothing to compare");
            }
        }
        failures.forEach(f -> System.err.println("API baseline: " + f));
        System.out.println("API baseline " + baseline.getFileName() + ": " + built.size() + " bundles, "
                + failures.size() + " failure(s)");
        if (!failures.isEmpty()) {
            System.exit(1);
        }
    }

    /** The bundles the reactor built: bundles/<id>/target/<id>-<version>.jar, test fragments left out. */
    static List<Path> builtBundles(Path bundles) throws IOException {
        List<Path> jars = new ArrayList<>();
        try (Stream<Path> folders = Files.list(bundles)) {
            for (Path folder : folders.sorted().toList()) {
                String id = folder.getFileName().toString();
                Path target = folder.resolve("target");
                if (id.endsWith(".tests") || !Files.isDirectory(target)) {
                    continue;
                }
                try (Stream<Path> files = Files.list(target)) {
                    files.filter(f -> f.getFileName().toString().startsWith(id + "-")
                            && f.getFileName().toString().endsWith(".jar")
                            && !f.getFileName().toString().endsWith("-sources.jar")).forEach(jars::add);
                }
            }
        }
        return jars;
    }

    static List<String> unversionedExports(Path jar) throws IOException {
        List<String> failures = new ArrayList<>();
        for (Map.Entry<String, Attrs> e : exports(jar).entrySet()) {
            if (e.getValue().getVersion() == null) {
                failures.add(symbolicName(jar) + ": Export-Package " + e.getKey() + " has no version");
            }
        }
        return failures;
    }

    static List<String> compare(Path newer, Path older, Set<String> consumerTypes) throws Exception {
        List<String> failures = new ArrayList<>();
        Parameters olderExports = exports(older);
        try (Processor reporter = new Processor(); Jar n = new Jar(newer.toFile()); Jar o = new Jar(older.toFile())) {
            for (Baseline.Info info : new Baseline(reporter, new DiffPluginImpl()).baseline(n, o, null)) {
                Attrs was = olderExports.get(info.packageName);
                if (was == null || was.containsKey(INTERNAL)) {
                    continue; // not API in the release: free to change
                }
                Delta delta = info.packageDiff.getDelta();
                String where = symbolicName(newer) + ": package " + info.packageName;
                List<String> incompatible = new ArrayList<>();
                collect(info.packageDiff, false, consumerTypes, incompatible);
                if (delta == Delta.REMOVED) {
                    failures.add(where + " was API in the baseline and is no longer exported");
                } else if (!incompatible.isEmpty() && majorOf(info.newerVersion) <= majorOf(info.olderVersion)) {
                    failures.add(where + " changed incompatibly (" + summary(incompatible) + ") but its version"
                            + " went from " + info.olderVersion + " to " + info.newerVersion + "; an incompatible"
                            + " change needs the next major version, " + (majorOf(info.olderVersion) + 1) + ".0.0");
                } else if (delta != Delta.UNCHANGED && delta != Delta.MICRO
                        && info.newerVersion.compareTo(info.olderVersion) <= 0) {
                    System.out.println(where + ": compatible additions; raise its minor version at the next release");
                }
            }
        }
        return failures;
    }

    private static String summary(List<String> changes) {
        return changes.size() <= 5 ? String.join("; ", changes)
                : String.join("; ", changes.subList(0, 5)) + "; and " + (changes.size() - 5) + " more";
    }

    /** The changes that break a user of the package, walking bnd's tree of differences. */
    private static void collect(Diff diff, boolean inConsumerType, Set<String> consumerTypes, List<String> out) {
        boolean consumer = inConsumerType
                || (diff.getType() == Type.INTERFACE && consumerTypes.contains(diff.getName()));
        switch (diff.getDelta()) {
            case REMOVED -> out.add("removed " + diff.getType().toString().toLowerCase() + " " + diff.getName());
            case CHANGED -> {
                if (diff.getChildren().isEmpty()) {
                    out.add("changed " + diff.getType().toString().toLowerCase() + " " + diff.getName());
                } else {
                    diff.getChildren().forEach(c -> collect(c, consumer, consumerTypes, out));
                }
            }
            case ADDED -> {
                if (consumer && diff.getType() == Type.METHOD) {
                    out.add("added method " + diff.getName() + " to a type add-ons implement");
                }
            }
            case MAJOR, MINOR -> diff.getChildren().forEach(c -> collect(c, consumer, consumerTypes, out));
            default -> {
                // unchanged, ignored or a micro change: compatible
            }
        }
    }

    private static Set<String> consumerTypes(Path file) throws IOException {
        return Files.readAllLines(file).stream().map(String::trim).filter(l -> !l.isEmpty() && !l.startsWith("#"))
                .collect(Collectors.toSet());
    }

    private static int majorOf(Version v) {
        return v == null ? -1 : v.getMajor();
    }

    /** Writes the API part of a bundle: its manifest and the classes of its exported, non-internal packages. */
    static void record(Path jar, Path into) throws IOException {
        Parameters exports = exports(jar);
        try (JarFile in = new JarFile(jar.toFile());
                OutputStream file = Files.newOutputStream(into);
                JarOutputStream out = new JarOutputStream(file, in.getManifest())) {
            for (JarEntry e : in.stream().toList()) {
                String name = e.getName();
                int slash = name.lastIndexOf('/');
                if (!name.endsWith(".class") || slash < 0) {
                    continue;
                }
                Attrs attrs = exports.get(name.substring(0, slash).replace('/', '.'));
                if (attrs == null || attrs.containsKey(INTERNAL)) {
                    continue;
                }
                JarEntry copy = new JarEntry(name);
                copy.setTime(0); // the same API gives the same bytes
                out.putNextEntry(copy);
                in.getInputStream(e).transferTo(out);
                out.closeEntry();
            }
        }
    }

    private static Parameters exports(Path jar) throws IOException {
        return new Parameters(mainAttributes(jar).getValue(EXPORT));
    }

    private static String symbolicName(Path jar) throws IOException {
        String bsn = mainAttributes(jar).getValue("Bundle-SymbolicName");
        if (bsn == null) {
            throw new IOException(jar + ": no Bundle-SymbolicName in its manifest");
        }
        return bsn.split(";")[0].trim();
    }

    private static Attributes mainAttributes(Path jar) throws IOException {
        try (JarFile f = new JarFile(new File(jar.toString()))) {
            Manifest m = f.getManifest();
            if (m == null) {
                throw new IOException(jar + ": no manifest");
            }
            return m.getMainAttributes();
        }
    }
}
