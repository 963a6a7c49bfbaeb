package org.tracegas.runner;

import java.io.PrintStream;
import java.util.Map;

/**
 * What a command needs from its surroundings: where to print, how to report progress, and the environment
 * (where secrets such as passwords come from, so that they stay off the command line).
 */
public final class RunnerContext {

    private final PrintStream out;
    private final PrintStream err;
    private final ProgressLine progress;
    private final Map<String, String> environment;

    /** A context with the process environment. */
    public RunnerContext(PrintStream out, PrintStream err) {
        this(out, err, System.getenv());
    }

    public RunnerContext(PrintStream out, PrintStream err, Map<String, String> environment) {
        this.out = out;
        this.err = err;
        this.progress = new ProgressLine(err);
        this.environment = Map.copyOf(environment);
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
}
