package org.tracegas.audit;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;

import org.tracegas.audit.internal.ChainWalker;
import org.tracegas.audit.internal.Snapshot;

/**
 * Checks the audit chain: walks all records in sequence order (streamed) and reports every record that
 * was altered, removed, inserted or reordered, by sequence number and record id. This makes tampering by
 * someone who bypasses the database triggers evident (21 CFR 11.10(e); EU GMP Annex 11 section 9).
 *
 * <p>Limit: the hashes are unkeyed, so someone who rewrites every record after a point and the chain
 * head consistently is caught only by comparing with a {@link ChainAnchor} kept outside the database.
 */
public final class AuditVerifier {

    /** Findings kept at most; a report with more is marked truncated. */
    public static final int MAX_FINDINGS = 10_000;

    private AuditVerifier() {
    }

    /**
     * Verifies the whole chain in one read snapshot (a repeatable-read transaction of its own when
     * {@code c} is in auto-commit mode, otherwise the caller's transaction).
     */
    public static VerificationReport verify(Connection c) throws SQLException {
        return verify(c, List.of());
    }

    /**
     * Verifies as {@link #verify(Connection)} and also that each anchor's record is still stored with the
     * anchored hash (ALTERED when the hash differs, REMOVED when the record is gone).
     */
    public static VerificationReport verify(Connection c, List<ChainAnchor> anchors) throws SQLException {
        return Snapshot.read(c, conn -> new ChainWalker(conn, MAX_FINDINGS, anchors).walk());
    }
}
