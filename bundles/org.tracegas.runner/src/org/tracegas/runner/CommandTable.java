package org.tracegas.runner;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.logging.Level;
import java.util.logging.Logger;

import org.tracegas.store.AccessDeniedException;
import org.tracegas.store.LoginFailedException;
import org.tracegas.store.StoreException;

/** The runner's commands by name, and the dispatch of one command line to one of them. */
public final class CommandTable {

    private static final Logger LOG = Logger.getLogger(CommandTable.class.getName());

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

    private static final String HELP_USAGE = """
            usage: tracegas help [<command>]
              Lists the commands, or explains one: its arguments, options and exit codes.
            exit codes: 0 done, 2 no such command""";
    private static final String VERSION_USAGE = """
            usage: tracegas version
              Prints the version of the runner.
            exit codes: 0 done""";

    /** Runs the command a command line names; prints help for an empty line or "help". */
    public int dispatch(String[] argv, RunnerContext context) {
        if (argv.length == 0 || argv[0].equals("help") || argv[0].equals("--help")) {
            if (argv.length > 1) {
                String usage = usage(argv[1]);
                if (usage == null) {
                    return noSuchCommand(argv[1], context);
                }
                context.out().println(usage);
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
            return noSuchCommand(argv[0], context);
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
            if (e.showUsage()) {
                context.err().println(c.usage());
            }
            return ExitCode.USAGE;
        } catch (org.tracegas.store.TamperedDataException e) {
            // stored data no longer matches the audit trail: a check failed, and the message names the rows
            context.err().println("tracegas " + c.name() + ": " + e.getMessage());
            return ExitCode.CHECK_FAILED;
        } catch (LoginFailedException | AccessDeniedException e) {
            context.err().println("tracegas " + c.name() + ": refused: " + e.getMessage());
            return ExitCode.REFUSED;
        } catch (StoreException e) {
            // the message says what failed in words; the database's own text goes to the log file, not the console
            context.err().println("tracegas " + c.name() + ": " + e.getMessage());
            LOG.log(Level.INFO, "details of the failure of " + c.name(), e);
            return ExitCode.FAILURE;
        } catch (Exception e) {
            context.err().println("tracegas " + c.name() + ": " + describe(e));
            LOG.log(Level.INFO, "details of the failure of " + c.name(), e);
            return ExitCode.FAILURE;
        }
    }

    /** The help text of a command or of the table's own words, or null if there is no such command. */
    private String usage(String name) {
        if (name.equals("help")) {
            return HELP_USAGE;
        }
        if (name.equals("version")) {
            return VERSION_USAGE;
        }
        Command c = commands.get(name);
        return c == null ? null : c.usage();
    }

    private int noSuchCommand(String name, RunnerContext context) {
        List<String> names = new ArrayList<>(commands.keySet());
        names.add("help");
        names.add("version");
        context.err().println("tracegas: no command '" + name + "'"
                + NearestName.of(name, names).map(n -> "; did you mean " + n + "?").orElse("")
                + " ('help' lists them)");
        return ExitCode.USAGE;
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
        context.out().println("Exit codes: " + ExitCode.SUMMARY + ".");
        context.out().println("Caution: results concern toxic gases and may feed compliance decisions; they need "
                + "review by qualified staff under local regulations and accredited practice.");
    }
}
