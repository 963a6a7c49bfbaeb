package org.tracegas.audit.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.ChainAnchor;
import org.tracegas.audit.ChainFinding;
import org.tracegas.audit.ChainFinding.Kind;
import org.tracegas.audit.VerificationReport;

/**
 * Walks audit_record in sequence order with a window of four records and classifies every break.
 * For each record: its own hash is recomputed (ALTERED when it differs); its back link (stored
 * previous hash equals the stored hash of the record before it) and forward link (the next record's back
 * link, or the chain head for the last record) are checked. A record with both links broken is out of
 * place (REORDERED when its predecessor exists elsewhere, INSERTED when the chain skips it or it links to
 * nothing); a record followed by one claiming the same predecessor was INSERTED; a back link to a hash
 * stored nowhere shows REMOVED records, or, where no sequence number is missing, a predecessor that was
 * ALTERED and re-hashed. Findings already explained by a neighbour's finding are not repeated.
 */
public final class ChainWalker {

    private static final int FETCH_SIZE = 1000;

    private final Connection c;
    private final int maxFindings;
    private final Map<Long, String> anchors = new HashMap<>();
    private long headSeq;
    private String headHash;
    private String headRecordId;

    // state of one walk
    private final List<ChainFinding> findings = new ArrayList<>();
    private boolean truncated;
    private Map<Long, String> pendingAnchors;
    private Map<String, Long> located;

    public ChainWalker(Connection c, int maxFindings, List<ChainAnchor> anchors) {
        this.c = c;
        this.maxFindings = maxFindings;
        for (ChainAnchor a : anchors) {
            this.anchors.put(a.sequence(), a.hash());
        }
    }

    /**
     * One streaming pass for an intact chain. At the first broken link the records that broken links point
     * to are located in two more passes (no index on the hash column: it would make every append rewrite
     * random index pages) and the walk is repeated with them.
     */
    public VerificationReport walk() throws SQLException {
        readHead();
        try {
            return walkOnce(null);
        } catch (LocationsNeeded e) {
            return walkOnce(locateBrokenLinkTargets());
        }
    }

    /** Thrown when a walk without locations meets a broken link. */
    private static final class LocationsNeeded extends RuntimeException {
        private static final long serialVersionUID = 1L;

        LocationsNeeded() {
            super(null, null, false, false);
        }
    }

    private VerificationReport walkOnce(Map<String, Long> locations) throws SQLException {
        findings.clear();
        truncated = false;
        pendingAnchors = new HashMap<>(anchors);
        located = locations;
        long count = 0;
        try (PreparedStatement q = c.prepareStatement("SELECT " + RecordRows.COLUMNS + " FROM audit_record ORDER BY seq")) {
            q.setFetchSize(FETCH_SIZE);
            try (ResultSet rs = q.executeQuery()) {
                // window: prev, cur, next, after; cur is classified once after is known. Four variables
                // shifted by assignment, not an array shifted by System.arraycopy onto itself: HotSpot C2 in
                // JDK 17.0.15 (JDK-8356989) can read stale elements of such a non-escaping array once the walk
                // is compiled, which showed the last two records as a fork of the chain
                AuditRecord prev = null;
                AuditRecord cur = null;
                AuditRecord next = null;
                boolean prevFlagged = false;
                while (rs.next()) {
                    AuditRecord after = RecordRows.readLenient(rs);
                    count++;
                    checkAnchor(after);
                    if (cur != null) {
                        prevFlagged = check(prev, prevFlagged, cur, next, after);
                    }
                    prev = cur;
                    cur = next;
                    next = after;
                }
                if (cur != null) {
                    prevFlagged = check(prev, prevFlagged, cur, next, null);
                }
                if (next != null) {
                    check(cur, prevFlagged, next, null, null);
                } else if (headSeq > 0) {
                    add(Kind.REMOVED, 1, headRecordId, "no audit records stored, but the chain head names record " + headSeq);
                }
            }
        }
        for (Map.Entry<Long, String> missing : new TreeMap<>(pendingAnchors).entrySet()) {
            add(Kind.REMOVED, missing.getKey(), null, "the anchored record is not stored");
        }
        return new VerificationReport(count, headSeq, headHash, findings, truncated);
    }

    /**
     * Pass one collects the previous-hash values of records whose back link is broken (bounded, so that a
     * wholly rewritten table cannot exhaust memory); pass two finds where records with those hashes stand.
     */
    private Map<String, Long> locateBrokenLinkTargets() throws SQLException {
        Map<String, Long> wanted = new HashMap<>();
        try (PreparedStatement q = c.prepareStatement("SELECT prev_hash, hash FROM audit_record ORDER BY seq")) {
            q.setFetchSize(FETCH_SIZE);
            try (ResultSet rs = q.executeQuery()) {
                String expected = ChainHash.GENESIS;
                while (rs.next() && wanted.size() < 4 * maxFindings) {
                    String prev = rs.getString(1);
                    if (prev != null && !prev.equals(expected)) {
                        wanted.put(prev, -1L);
                    }
                    expected = rs.getString(2);
                }
            }
        }
        try (PreparedStatement q = c.prepareStatement("SELECT seq, hash FROM audit_record")) {
            q.setFetchSize(FETCH_SIZE);
            try (ResultSet rs = q.executeQuery()) {
                while (rs.next()) {
                    String hash = rs.getString(2);
                    Long seq = wanted.get(hash);
                    if (seq != null && seq < 0) {
                        wanted.put(hash, rs.getLong(1));
                    }
                }
            }
        }
        return wanted;
    }

    private void checkAnchor(AuditRecord r) {
        String anchored = pendingAnchors.remove(r.sequence());
        if (anchored != null && !anchored.equals(r.hash())) {
            add(Kind.ALTERED, r.sequence(), r.recordId(), "hash differs from the anchor kept outside the database");
        }
    }

    private void readHead() throws SQLException {
        try (PreparedStatement q = c.prepareStatement(
                "SELECT last_seq, last_hash, last_record_id FROM audit_chain_head WHERE id = 1");
                ResultSet rs = q.executeQuery()) {
            if (!rs.next()) {
                throw new SQLException("audit_chain_head: row missing; the chain head was deleted or never installed");
            }
            headSeq = rs.getLong(1);
            headHash = rs.getString(2);
            headRecordId = rs.getString(3);
        }
    }

    /**
     * Classifies {@code cur} ({@code next} null for the last record); returns whether it was flagged, which
     * explains its successor's broken back link.
     */
    private boolean check(AuditRecord prev, boolean prevFlagged, AuditRecord cur, AuditRecord next,
            AuditRecord after) throws SQLException {
        String expectedPrev = prev == null ? ChainHash.GENESIS : prev.hash();
        long expectedSeq = prev == null ? 1 : prev.sequence() + 1;
        if (cur.sequence() > expectedSeq) {
            add(Kind.REMOVED, expectedSeq, cur.recordId(), "sequence numbers " + expectedSeq
                    + (cur.sequence() - 1 > expectedSeq ? " to " + (cur.sequence() - 1) : "") + " are missing before "
                    + cur.sequence());
        }
        if (cur.sequence() > headSeq) {
            add(Kind.INSERTED, cur.sequence(), cur.recordId(), "beyond the chain head (last sequence " + headSeq + ")");
            return true;
        }
        if (!selfConsistent(cur)) {
            add(Kind.ALTERED, cur.sequence(), cur.recordId(), "stored fields do not give the stored hash");
            return true;
        }
        boolean flagged = links(prev, prevFlagged, cur, next, after, expectedPrev, expectedSeq);
        if (next == null) {
            checkTail(cur, flagged);
        }
        return flagged;
    }

    private boolean links(AuditRecord prev, boolean prevFlagged, AuditRecord cur, AuditRecord next,
            AuditRecord after, String expectedPrev, long expectedSeq) throws SQLException {
        boolean backOk = cur.previousHash().equals(expectedPrev);
        boolean fwdOk = forwardOk(cur, next);
        if (backOk && fwdOk) {
            return false;
        }
        if (!backOk && !fwdOk) {
            return outOfPlace(prev, cur, next, expectedPrev);
        }
        if (!backOk) {
            // a gap was reported above; a moved predecessor is reported where it stands
            if (!prevFlagged && cur.sequence() == expectedSeq && seqOfHash(cur.previousHash()) < 0) {
                add(Kind.REMOVED, expectedSeq, cur.recordId(), "its predecessor's hash is stored nowhere");
            }
            return false;
        }
        // back link fine, forward link broken
        if (next != null && next.previousHash().equals(cur.previousHash())) {
            add(Kind.INSERTED, cur.sequence(), cur.recordId(), "the next record " + next.sequence()
                    + " links to the same predecessor");
            return true;
        }
        if (next != null && next.sequence() == cur.sequence() + 1 && forwardOk(next, after) && selfConsistent(next)
                && seqOfHash(next.previousHash()) < 0) {
            add(Kind.ALTERED, cur.sequence(), cur.recordId(), "the next record " + next.sequence()
                    + " links to a hash stored nowhere: this record was changed and re-hashed, or the record"
                    + " after it removed and the rest renumbered");
            return true;
        }
        return false;
    }

    /** Whether the record's fields are valid values and give its stored hash. */
    private static boolean selfConsistent(AuditRecord r) {
        return r.action() != null && ChainHash.isSha256Hex(r.previousHash()) && ChainHash.isSha256Hex(r.hash())
                && ChainHash.of(r).equals(r.hash());
    }

    /** Whether {@code next} (or, at the end, the chain head) links to {@code r}. */
    private boolean forwardOk(AuditRecord r, AuditRecord next) {
        return next == null ? r.sequence() == headSeq && r.hash().equals(headHash) : next.previousHash().equals(r.hash());
    }

    private boolean outOfPlace(AuditRecord prev, AuditRecord cur, AuditRecord next, String expectedPrev)
            throws SQLException {
        boolean successorBefore = prev != null && prev.previousHash().equals(cur.hash());
        boolean predecessorAfter = next != null && cur.previousHash().equals(next.hash());
        if (successorBefore && predecessorAfter) {
            return false; // its two neighbours changed places around it; they are reported
        }
        if (successorBefore || predecessorAfter) {
            add(Kind.REORDERED, cur.sequence(), cur.recordId(), "changed places with a neighbour");
            return true;
        }
        if (next != null && next.previousHash().equals(expectedPrev)) {
            add(Kind.INSERTED, cur.sequence(), cur.recordId(), "the chain skips this record");
            return true;
        }
        long linked = seqOfHash(cur.previousHash());
        if (linked >= 0) {
            add(Kind.REORDERED, cur.sequence(), cur.recordId(), "its predecessor is stored at sequence " + linked);
        } else {
            add(Kind.INSERTED, cur.sequence(), cur.recordId(), "links to a hash stored nowhere");
        }
        return true;
    }

    private void checkTail(AuditRecord last, boolean flagged) {
        if (last.sequence() < headSeq) {
            add(Kind.REMOVED, last.sequence() + 1, headSeq == last.sequence() + 1 ? headRecordId : null,
                    "the chain head names record " + headSeq + " but the chain ends at " + last.sequence());
        } else if (!flagged && last.sequence() == headSeq && !last.hash().equals(headHash)) {
            add(Kind.ALTERED, last.sequence(), last.recordId(), "hash differs from the chain head");
        }
    }

    /**
     * Sequence number of the record with this hash, 0 for the genesis value, -1 when stored nowhere (or
     * beyond the bound of located hashes).
     */
    private long seqOfHash(String hash) {
        if (hash.equals(ChainHash.GENESIS)) {
            return 0;
        }
        if (located == null) {
            throw new LocationsNeeded();
        }
        return located.getOrDefault(hash, -1L);
    }

    private void add(Kind kind, long seq, String recordId, String detail) {
        if (findings.size() < maxFindings) {
            findings.add(new ChainFinding(kind, seq, recordId, detail));
        } else {
            truncated = true;
        }
    }
}
