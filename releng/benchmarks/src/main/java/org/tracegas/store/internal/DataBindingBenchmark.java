package org.tracegas.store.internal;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.h2.jdbcx.JdbcDataSource;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.tracegas.benchmarks.BlockStorageBenchmark;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.WorkspaceVerification;

/**
 * What binding stored data to the audit trail costs, on an H2 workspace file:
 * <ul>
 * <li>{@code verifyWorkspace}: one verification of chain and data of a workspace holding {@code spectra}
 * processed spectra (6,800-point float32 absorbance, 9 results each, as the demo campaign makes them);
 * rows/s = rows checked (printed at setup) / time per verification, from which a year of 1-minute data
 * (525,600 spectra, about 4.7 million results) is extrapolated;</li>
 * <li>{@code blockBound} against {@code blockUnbound}: one block of 64 such spectra stored in one transaction
 * with and without the rows' binding (hashed from the values inserted, digested into the audit record,
 * kept in data_binding), in the same run, so their ratio is the binding's cost on the batch path.</li>
 * </ul>
 * It lives in the store's internal package to switch the binding off, which the store itself never does.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = "-Xmx2g")
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 4, time = 5)
public class DataBindingBenchmark {

    /** A workspace with an analyst, a project and a method and library version to store blocks under. */
    @State(Scope.Benchmark)
    public static class Workspace {
        JdbcWorkspaceStore store;
        Transactions transactions;
        Session analyst;
        String projectId;
        List<ProcessedSpectrum> block;

        void open() throws Exception {
            Path folder = Files.createTempDirectory("tracegas-binding-bench");
            store = JdbcWorkspaceStore.openH2(folder, JdbcWorkspaceStore.DEFAULT_MAX_FAILED_LOGINS);
            Session admin = store.users().createFirstAdministrator("admin", "Admin", "bench-admin-1".toCharArray());
            store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "bench-ana-12".toCharArray());
            analyst = store.users().logIn("ana", "bench-ana-12".toCharArray());
            projectId = store.projects().createProject(analyst, store.projects().createClient(analyst,
                    "Client").getId(),
                    "B-1", "Benchmark").getId();
            String method = store.versions().create(analyst, VersionKind.METHOD, "m", "a=1\n", "bench").getId();
            String library = store.versions().create(analyst, VersionKind.LIBRARY, "l", "b=1\n", "bench").getId();
            block = BlockStorageBenchmark.block(method, library, null);
            // a second data source onto the same open database, for the unbound block path
            JdbcDataSource ds = new JdbcDataSource();
            ds.setURL("jdbc:h2:file:" + folder.toAbsolutePath().resolve("workspace")
                    + ";DB_CLOSE_DELAY=-1;LAZY_QUERY_EXECUTION=TRUE;LOCK_TIMEOUT=30000;CACHE_SIZE=16384;WRITE_DELAY=0");
            transactions = new Transactions(ds);
        }

        @Setup(Level.Trial)
        public void setUp() throws Exception {
            open();
        }

        @TearDown(Level.Trial)
        public void tearDown() {
            store.close();
        }
    }

    /** A workspace holding {@link #spectra} stored spectra, only read. */
    @State(Scope.Benchmark)
    public static class Filled extends Workspace {
        @Param({"1024"})
        public int spectra;

        @Override
        @Setup(Level.Trial)
        public void setUp() throws Exception {
            open();
            for (int stored = 0; stored < spectra; stored += block.size()) {
                store.blocks().store(analyst, projectId, block);
            }
            WorkspaceVerification v = store.audit().verifyWorkspace(List.of());
            System.out.println("workspace of " + spectra + " spectra: " + v.rowsChecked() + " data rows, "
                    + v.chain().recordsChecked() + " audit records, intact " + v.intact());
        }
    }

    /** One verification of chain and data of the filled workspace. */
    @Benchmark
    public long verifyWorkspace(Filled w) {
        return w.store.audit().verifyWorkspace(List.of()).rowsChecked();
    }

    /** One block of 64 spectra with 9 results each, bound as the store binds it. */
    @Benchmark
    public int blockBound(Workspace w) {
        return w.store.blocks().store(w.analyst, w.projectId, w.block).size();
    }

    /** The same block with the binding left out: the audit records carry no data digest. */
    @Benchmark
    public int blockUnbound(Workspace w) {
        return w.transactions.run("storing an unbound block", tx -> {
            Guard.requireProject(tx, w.analyst, w.projectId, AccessLevel.WRITE);
            JdbcBlockService.Written written = JdbcBlockService.insert(tx, (JdbcVersionService) w.store.versions(),
                    w.analyst, w.projectId, w.block);
            List<List<RowBindings.RowRef>> none = new ArrayList<>();
            for (int i = 0; i < written.audit().size(); i++) {
                none.add(List.of());
            }
            tx.auditAll(written.audit(), none);
            return written.stored().size();
        });
    }
}
