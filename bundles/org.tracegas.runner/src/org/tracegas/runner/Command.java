package org.tracegas.runner;

import java.util.List;

/** One job of the headless runner, for example importing files or writing a report. */
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
