package org.tracegas.demo.internal;

import java.nio.file.Path;
import java.util.List;

import org.tracegas.demo.DemoCampaign;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.commands.Options;

/**
 * Runs the demo campaign end to end on an embedded H2 workspace. The demo bundle contributes it to the runner's
 * commands, as a lab's bundle would its own; it stops on the runner's cancellation.
 */
public final class DemoCommand implements Command {

    @Override
    public String name() {
        return "demo";
    }

    @Override
    public String summary() {
        return "run the demo campaign end to end (invented plant, synthetic data) and write its report";
    }

    @Override
    public String usage() {
        return """
                usage: tracegas demo --workspace <folder> --out <folder>
                  Synthesizes a day of 1-minute interferograms of an invented plant (first run only), builds the
                  synthetic reference library and the method, processes and fits every spectrum into the H2
                  workspace in <folder>/db, runs the QA checks, writes the PDF report and the CSV of results
                  into the --out folder and verifies the audit trail. A second run reuses the workspace and
                  makes the report again from the stored results.
                  Makes the demo users in this workspace only and prints them with their demo password.
                exit codes: 0 done and every QA check passed, 1 a QA check failed or the audit chain is broken,
                  2 wrong arguments, 3 bad input file, 4 cancelled, 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, List.of("--workspace", "--out"));
        Path workspace = options.path("--workspace");
        Path out = options.path("--out");
        long started = System.nanoTime();
        context.progress().begin("demo");
        DemoCampaign.Outcome outcome = new DemoCampaign(workspace, out, context.out())
                .run(context.progress()::update, context.cancellation());
        if (outcome.cancelled()) {
            context.err().println("tracegas demo: cancelled after " + outcome.spectraProcessed() + " spectra");
            return ExitCode.CANCELLED;
        }
        long failed = outcome.qa().stream().filter(c -> !c.passed()).count();
        context.out().printf("Spectra processed now: %d%s%n", outcome.spectraProcessed(),
                outcome.reusedResults() ? " (stored results reused)" : "");
        context.out().printf("QA checks: %d, failed: %d%n", outcome.qa().size(), failed);
        for (CheckOutcome c : outcome.qa()) {
            context.out().println("  " + (c.passed() ? "pass " : "FAIL ") + c.summary());
        }
        context.out().printf("Audit trail: %d records, %s%n", outcome.audit().recordsChecked(),
                outcome.audit().intact() ? "chain intact" : "CHAIN BROKEN: " + outcome.audit().findings());
        context.out().println("Report: " + outcome.report());
        context.out().println("Results: " + outcome.csv());
        context.out().println(DemoCampaign.demoUsers());
        context.out().printf("Wall time: %.1f s%n", (System.nanoTime() - started) / 1e9);
        context.out().println("Caution: demo data are invented and the references synthetic; real results need review "
                + "by qualified staff under local regulations and accredited practice.");
        return failed == 0 && outcome.audit().intact() ? ExitCode.OK : ExitCode.CHECK_FAILED;
    }

}
