package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

/** The store contract on the PostgreSQL server, in a fresh schema per test. */
class PostgresWorkspaceStoreTest extends WorkspaceStoreContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }

    /** Runners on several machines start at once on a new lab-server schema: every one opens it. */
    @Test
    void severalRunnersOpenOneNewWorkspaceAtTheSameMoment() throws Exception {
        int runners = 6;
        try (PostgresBackend backend = new PostgresBackend()) {
            ExecutorService pool = Executors.newFixedThreadPool(runners);
            CountDownLatch start = new CountDownLatch(1);
            List<Future<Boolean>> opened = new ArrayList<>();
            for (int i = 0; i < runners; i++) {
                opened.add(pool.submit(() -> {
                    start.await();
                    try (WorkspaceStore store = backend.open()) {
                        return store.verifyAuditTrail().intact();
                    }
                }));
            }
            start.countDown();
            for (Future<Boolean> f : opened) {
                assertTrue(f.get(60, TimeUnit.SECONDS), "each runner finds an intact audit trail");
            }
            pool.shutdown();
            try (WorkspaceStore store = backend.open()) {
                assertEquals(0, store.verifyAuditTrail().recordsChecked(), "opening writes no audit record");
            }
        }
    }
}
