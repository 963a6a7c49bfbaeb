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
    /**
     * The workspace refused the user: unknown login or wrong password, a locked account, or a role or project
     * grant the job needs is missing. Nothing was done; a refusal is not a failure of the software.
     */
    public static final int REFUSED = 6;

    /** The exit codes in one line, for help texts. */
    public static final String SUMMARY = "0 done, 1 a check failed, 2 wrong command line or no such workspace, "
            + "3 bad input, 4 cancelled, 5 failure, 6 refused (log-in, locked account or missing rights)";

    private ExitCode() {
    }
}
