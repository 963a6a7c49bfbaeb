package org.tracegas.runner;

import java.util.List;

/**
 * One job of the headless runner, for example importing files or writing a report. Commands are contributed
 * through the extension point {@value CommandContributions#EXTENSION_POINT}: a contributed class has a public
 * no-argument constructor and takes what it needs at run time from its {@link RunnerContext}. The runner lists
 * every contributed command in its help, suggests the nearest name for a mistyped one, and turns the exceptions
 * of {@link #run} into its documented exit codes.
 */
public interface Command {

    /** The word that selects the command on the command line. */
    String name();

    /** One line that says what the command does. */
    String summary();

    /** The full help text: arguments, options and exit codes. */
    String usage();

    /**
     * Runs the command.
     *
     * @return the process exit code: {@link ExitCode}
     * @throws UsageException when the arguments are wrong; the runner prints the message and the usage
     */
    int run(List<String> arguments, RunnerContext context) throws Exception;
}
