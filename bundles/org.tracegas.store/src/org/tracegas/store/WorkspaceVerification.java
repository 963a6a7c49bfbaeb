package org.tracegas.store;

import java.util.List;

import org.tracegas.audit.ChainAnchor;
import org.tracegas.audit.VerificationReport;

/**
 * The audit chain checked together with every stored data row it vouches for, read in one snapshot.
 * Immutable.
 *
 * @param chain        the chain's verification (with the anchors given)
 * @param rowsChecked  data rows read
 * @param dataFindings every data row changed, deleted or inserted outside the store's services, and every
 *                     binding list that no longer matches its record; empty when all data is as vouched for
 * @param truncated    whether more than {@link #MAX_FINDINGS} data findings were found and the rest left out
 */
public record WorkspaceVerification(VerificationReport chain, long rowsChecked, List<DataFinding> dataFindings,
        boolean truncated) {

    /** Data findings kept at most. */
    public static final int MAX_FINDINGS = 10_000;

    public WorkspaceVerification {
        dataFindings = List.copyOf(dataFindings);
    }

    /** Whether the chain is intact, passes through every anchor given, and all data is as vouched for. */
    public boolean intact() {
        return chain.intact() && dataFindings.isEmpty();
    }

    /** The chain head at verification, to be kept outside the database; null for an empty chain. */
    public ChainAnchor head() {
        return ChainAnchor.headOf(chain);
    }

    /** Whether some data finding of {@code kind} names this row. */
    public boolean names(DataFinding.Kind kind, String dataKind, String rowKey) {
        return dataFindings.stream().anyMatch(f -> f.kind() == kind && f.dataKind().equals(dataKind)
                && f.rowKey().equals(rowKey));
    }

    /**
     * @return this verification, when intact
     * @throws TamperedDataException naming the findings, when not intact
     * @param purpose what would have used the data, e.g. "make the report"
     */
    public WorkspaceVerification requireIntact(String purpose) {
        if (!intact()) {
            throw new TamperedDataException(purpose, this);
        }
        return this;
    }

    /** One line for a report or log: what was verified, the outcome and the chain anchor. */
    public String statement() {
        ChainAnchor head = head();
        return (intact() ? "Verified" : "VERIFICATION FAILED") + ": audit chain of " + chain.recordsChecked()
                + " records and " + rowsChecked + " data rows bound to it"
                + (intact() ? ", no change found" : ", " + (chain.findings().size() + dataFindings.size())
                        + " finding(s)")
                + "; chain anchor " + (head == null ? "none (empty chain)" : head.sequence() + ":" + head.hash());
    }
}
