package org.tracegas.runner;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/** The runner's commands by name, and the dispatch of one command line to one of them. */
public final class CommandTable {

    private final Map<String, Command> commands = new TreeMap<>();
    private final String version;

    public CommandTable(String version, Collection<? extends Command> all) {
        this.version = version;
        for (Command c : all) {
            if (commands.putIfAbsent(c.name(), c) != null) {
                throw new IllegalArgumentException("two commands are named '" + c.name() + "'");
            }
        }
    }

    public Collection<Command> commands() {
        return Collections.unmodifiableCollection(commands.values());
    }

    /** Runs the command a command line names; prints help for an empty line or "help". */
    public int dispatch(String[] argv, RunnerContext context) {
        if (argv.length == 0 || argv[0].equals("help") || argv[0].equals("--help")) {
            if (argv.length > 1) {
                Command c = commands.get(argv[1]);
                if (c == null) {
                    context.err().println("tracegas: no command '" + argv[1] + "'; 'help' lists them");
                    return ExitCode.USAGE;
                }
                context.out().println(c.usage());
                return ExitCode.OK;
            }
            printOverview(context);
            return ExitCode.OK;
        }
        if (argv[0].equals("version") || argv[0].equals("--version")) {
            context.out().println("Tracegas Workbench runner " + version);
            return ExitCode.OK;
        }
        Command c = commands.get(argv[0]);
        if (c == null) {
            context.err().println("tracegas: no command '" + argv[0] + "'; 'help' lists them");
            return ExitCode.USAGE;
        }
        List<String> args = new ArrayList<>(Arrays.asList(argv).subList(1, argv.length));
        if (args.contains("--help")) {
            context.out().println(c.usage());
            return ExitCode.OK;
        }
        try {
            return c.run(args, context);
        } catch (UsageException e) {
            context.err().println("tracegas " + c.name() + ": " + e.getMessage());
            context.err().println(c.usage());
            return ExitCode.USAGE;
        } catch (org.tracegas.store.TamperedDataException e) {
            // stored data no longer matches the audit trail: a check failed, and the message names the rows
            context.err().println("tracegas " + c.name() + ": " + e.getMessage());
            return ExitCode.CHECK_FAILED;
        } catch (Exception e) {
            context.err().println("tracegas " + c.name() + ": " + describe(e));
            return ExitCode.FAILURE;
        }
    }

    private static String describe(Throwable e) {
        StringBuilder sb = new StringBuilder(String.valueOf(e.getMessage()));
        for (Throwable cause = e.getCause(); cause != null && cause != cause.getCause(); cause = cause.getCause()) {
            sb.append("\n  caused by: ").append(cause.getMessage());
        }
        return sb.toString();
    }

    private void printOverview(RunnerContext context) {
        context.out().println("Tracegas Workbench runner " + version);
        context.out().println("usage: tracegas <command> [arguments]   ('help <command>' for details)");
        context.out().println();
        context.out().println("commands:");
        context.out().printf("  %-16s %s%n", "help", "list the commands, or explain one");
        context.out().printf("  %-16s %s%n", "version", "print the version");
        for (Command c : commands.values()) {
            context.out().printf("  %-16s %s%n", c.name(), c.summary());
        }
        context.out().println();
        context.out().println("Exit codes: 0 done, 1 a check failed, 2 wrong command line, 3 bad input, "
                + "4 cancelled, 5 failure.");
        context.out().println("Caution: results concern toxic gases and may feed compliance decisions; they need "
                + "review by qualified staff under local regulations and accredited practice.");
    }
}
