package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.tracegas.runner.commands.InventedBandSystem.header;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;

import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.model.Instrument;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;

/**
 * A workspace (an H2 folder or a PostgreSQL schema, as its options say) set up from the command line for the
 * batch tests: administrator root, analyst ana, the projects given, a library built from the
 * {@link InventedBandSystem} and the method "Stack" over it; and the raw files: a background file (two
 * backgrounds, so that samples are ratioed against different ones) and stack files of a few samples each, one
 * minute apart, with CO rising from file to file.
 */
final class BatchCampaign {

    static final String METHOD = "Stack";
    static final String PASSWORD = "admin-pw-1";
    static final Map<String, String> ENV = Map.of("TRACEGAS_PASSWORD", PASSWORD, "TRACEGAS_NEW_PASSWORD", PASSWORD,
            "TRACEGAS_DB_PASSWORD", System.getProperty("tracegas.test.pg.password", "tracegas"));
    static final Instant T0 = Instant.parse("2026-03-17T08:00:00Z");

    final List<String> workspace;
    final Path backgrounds;
    final List<Path> stackFiles = new ArrayList<>();
    final int samplesPerFile;

    /**
     * @param workspace the workspace options: --workspace folder, or --server and --user (the password in the environment)
     */
    BatchCampaign(Path folder, List<String> workspace, List<String> projects, int files, int samplesPerFile)
            throws IOException {
        this.workspace = List.copyOf(workspace);
        this.samplesPerFile = samplesPerFile;
        ok("workspace-init", "--admin", "root", "--name", "Admin");
        ok("user-add", "--as", "root", "--login", "ana", "--name", "Ana Lyst", "--roles", "analyst");
        for (String code : projects) {
            ok("project-add", "--as", "ana", "--client", "Client " + code, "--code", code, "--name", "Survey");
        }
        InventedBandSystem bands = new InventedBandSystem(folder);
        Random noise = new Random(23);
        backgrounds = folder.resolve("backgrounds.tgc");
        try (ContainerWriter w = ContainerWriter.create(backgrounds)) {
            w.append(header(SampleKind.BACKGROUND, T0.minusSeconds(600), null), bands.interferogram(Map.of(), noise));
            w.append(header(SampleKind.BACKGROUND, time(files / 2, 0).minusSeconds(30), null),
                    bands.interferogram(Map.of(), noise));
            w.commit();
        }
        for (int f = 0; f < files; f++) {
            Path file = folder.resolve("stack-" + f + ".tgc");
            try (ContainerWriter w = ContainerWriter.create(file)) {
                for (int k = 0; k < samplesPerFile; k++) {
                    // CO from 97 ppm·m (on a reference) upwards, within the library's references
                    w.append(header(SampleKind.SAMPLE, time(f, k), null), bands.interferogram(Map.of("CO",
                            20.0 + 4.0 * (f * samplesPerFile + k), "H2O", 100_000.0), noise));
                }
                w.commit();
            }
            stackFiles.add(file);
        }
        ok("library-build", "--as", "ana", "--plan", bands.libraryPlan().toString(), "--out",
                folder.resolve("lib").toString());
        Path method = folder.resolve("stack.method");
        Files.writeString(method, InventedBandSystem.methodFile(METHOD));
        ok("method-define", "--as", "ana", "--method", method.toString());
    }

    /** When sample k of stack file f was taken. */
    Instant time(int file, int k) {
        return T0.plusSeconds(60L * (file * samplesPerFile + k));
    }

    /**
     * The arguments of a quantification of the project: project, method, backgrounds and the files, then the
     * further options given.
     */
    String[] quantification(String project, List<Path> files, String... options) {
        List<String> a = new ArrayList<>(List.of("--as", "ana", "--project", project, "--method", METHOD,
                "--backgrounds", backgrounds.toString()));
        files.forEach(f -> a.addAll(List.of("--file", f.toString())));
        a.addAll(List.of(options));
        return a.toArray(String[]::new);
    }

    /**
     * Checks the figures of the containers written here: the {@link InventedBandSystem}'s reference laser and
     * cell path, and as maximum path difference the longer arm of its interferograms,
     * {@link InventedBandSystem#HALF} samples before the zero-path-difference sample, two laser wavelengths
     * (2 / laser wavenumber in cm) apart. Its inverse, 7.7 cm-1, is the resolution the band system's library is
     * built at (resolution taken as 1 / maximum path difference: common practice, no source).
     */
    static void assertWrittenFigures(Instrument instrument) {
        assertEquals(InventedBandSystem.LASER, instrument.getLaserWavenumber(), 0.0);
        assertEquals(InventedBandSystem.PATH, instrument.getCellPathLength(), 0.0);
        assertEquals(InventedBandSystem.HALF * 2 / InventedBandSystem.LASER, instrument.getMaxPathDifference(),
                1e-12);
    }

    /** The runner's table of the commands the batch tests use, as the application has them. */
    static CommandTable commands(CancellationFlag cancel) {
        return new CommandTable("test", List.of(new WorkspaceInitCommand(), new UserAddCommand(),
                new ProjectAddCommand(), new LibraryBuildCommand(cancel), new MethodDefineCommand(),
                new QuantifyCommand(cancel), new BatchSplitCommand(), new BatchWorkCommand(cancel),
                new BatchStatusCommand()));
    }

    /** Runs a command on this workspace: the command, then the workspace options, then the rest. */
    int run(ByteArrayOutputStream out, ByteArrayOutputStream err, String command, String... rest) {
        return run(new CancellationFlag(), out, err, command, rest);
    }

    /** Runs a command on this workspace with the cancellation flag the application would set on stopping. */
    int run(CancellationFlag cancel, ByteArrayOutputStream out, ByteArrayOutputStream err, String command,
            String... rest) {
        String[] argv = Stream.of(Stream.of(command), workspace.stream(), Stream.of(rest)).flatMap(s -> s)
                .toArray(String[]::new);
        return commands(cancel).dispatch(argv, new RunnerContext(
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8),
                ENV));
    }

    /** Runs a command that must succeed; returns what it printed on standard output. */
    String ok(String command, String... rest) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(ExitCode.OK, run(out, err, command, rest), () -> command + " " + String.join(" ", rest) + ": "
                + err.toString(StandardCharsets.UTF_8) + out.toString(StandardCharsets.UTF_8));
        return out.toString(StandardCharsets.UTF_8);
    }
}
