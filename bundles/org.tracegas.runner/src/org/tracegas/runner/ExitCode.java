package org.tracegas.runner;

/** Exit codes of the headless runner, stable for scripts. */
public final class ExitCode {

    /** The job completed. */
    public static final int OK = 0;
    /** The job ran, but a check it made failed (a QA rule, the audit chain). */
    public static final int CHECK_FAILED = 1;
    /** The command line was wrong. */
    public static final int USAGE = 2;
    /** Input data was malformed or missing. */
    public static final int BAD_INPUT = 3;
    /** The job was cancelled. */
    public static final int CANCELLED = 4;
    /** An unexpected failure. */
    public static final int FAILURE = 5;

    private ExitCode() {
    }
}
