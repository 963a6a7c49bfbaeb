package org.tracegas.store;

import java.time.Duration;
import java.util.Optional;

/**
 * Child process for {@link WorkUnitProcessesTest}: a runner that claims units of a batch, "works" on each for
 * a while, completes it with the unit's block of {@link SampleBlocks} (3 spectra of 2 results, numbered from
 * 10 times the unit number) and prints "claimed N" and "completed N" (or "lost N") as it goes; it ends when
 * every unit of the batch is done.
 * Arguments: JDBC URL, user, password, batch id, runner id, lease in ms, work per unit in ms, method version
 * id, library version id.
 */
public final class WorkUnitWorkerProcess {

    static final int SPECTRA_PER_UNIT = 3;
    static final int RESULTS_PER_SPECTRUM = 2;

    private WorkUnitWorkerProcess() {
    }

    public static void main(String[] args) throws Exception {
        String batchId = args[3];
        String runnerId = args[4];
        Duration lease = Duration.ofMillis(Long.parseLong(args[5]));
        long workMillis = Long.parseLong(args[6]);
        try (WorkspaceStore store = Workspaces.openPostgres(args[0], args[1], args[2])) {
            Session analyst = store.users().logIn("ana", AnalysisFixture.ANALYST_PASSWORD);
            WorkUnitService units = store.workUnits();
            while (true) {
                Optional<WorkUnitLease> claimed = units.claim(analyst, batchId, runnerId, lease);
                if (claimed.isEmpty()) {
                    if (units.progress(analyst, batchId).finished()) {
                        return;
                    }
                    Thread.sleep(100); // units are held by others; one may come back when its lease expires
                    continue;
                }
                WorkUnitLease unit = claimed.get();
                say("claimed " + unit.seq());
                Thread.sleep(workMillis);
                try {
                    units.complete(analyst, unit, SampleBlocks.block(firstSpectrum(unit.seq()), SPECTRA_PER_UNIT,
                            RESULTS_PER_SPECTRUM, args[7], args[8]));
                    say("completed " + unit.seq());
                } catch (LeaseLostException e) {
                    say("lost " + unit.seq());
                }
            }
        }
    }

    /** The number of the first spectrum of a unit's block. */
    static int firstSpectrum(int seq) {
        return 10 * seq;
    }

    private static void say(String line) {
        System.out.println(line);
        System.out.flush();
    }
}
