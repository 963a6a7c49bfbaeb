package org.tracegas.store;

/** The lab's instruments and the instrument of a measurement on the PostgreSQL server, in a fresh schema per test. */
class PostgresInstrumentServiceTest extends InstrumentServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
