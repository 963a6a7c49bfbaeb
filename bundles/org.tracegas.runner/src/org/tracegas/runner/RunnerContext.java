package org.tracegas.runner;

import java.io.PrintStream;
import java.util.Map;

import org.tracegas.quantify.CancellationFlag;

/**
 * What a command needs from its surroundings: where to print, how to report progress, the environment (where
 * secrets such as passwords come from, so that they stay off the command line) and the runner's cancellation,
 * which stopping the application sets.
 */
public final class RunnerContext {

    private final PrintStream out;
    private final PrintStream err;
    private final ProgressLine progress;
    private final Map<String, String> environment;
    private final CancellationFlag cancellation;

    /** A context with the process environment. */
    public RunnerContext(PrintStream out, PrintStream err) {
        this(out, err, System.getenv());
    }

    /** A context whose cancellation is never set. */
    public RunnerContext(PrintStream out, PrintStream err, Map<String, String> environment) {
        this(out, err, environment, new CancellationFlag());
    }

    public RunnerContext(PrintStream out, PrintStream err, Map<String, String> environment,
            CancellationFlag cancellation) {
        this.out = out;
        this.err = err;
        this.progress = new ProgressLine(err);
        this.environment = Map.copyOf(environment);
        this.cancellation = cancellation;
    }

    /** A variable of the environment, or null. */
    public String environment(String name) {
        return environment.get(name);
    }

    public PrintStream out() {
        return out;
    }

    public PrintStream err() {
        return err;
    }

    public ProgressLine progress() {
        return progress;
    }

    /** Set when the runner is asked to stop; long jobs check it between their steps. */
    public CancellationFlag cancellation() {
        return cancellation;
    }
}
