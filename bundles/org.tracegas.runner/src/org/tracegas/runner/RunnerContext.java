package org.tracegas.runner;

import java.io.PrintStream;

/** What a command needs from its surroundings: where to print, and how to report progress. */
public final class RunnerContext {

    private final PrintStream out;
    private final PrintStream err;
    private final ProgressLine progress;

    public RunnerContext(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
        this.progress = new ProgressLine(err);
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
