package org.tracegas.store;

import java.util.List;

/**
 * Thrown instead of using stored data that no longer matches the audit trail: the message names the rows (kind,
 * id, vouching audit record) and the chain breaks found.
 */
public final class TamperedDataException extends StoreException {

    private static final long serialVersionUID = 1L;

    /** Findings named in the message at most. */
    static final int NAMED = 20;

    private final transient WorkspaceVerification verification;

    TamperedDataException(String purpose, WorkspaceVerification verification) {
        super(message(purpose, verification), null);
        this.verification = verification;
    }

    /** The verification that failed. */
    public WorkspaceVerification verification() {
        return verification;
    }

    private static String message(String purpose, WorkspaceVerification v) {
        List<String> lines = new java.util.ArrayList<>();
        v.chain().findings().forEach(f -> lines.add(f.toString()));
        v.dataFindings().forEach(f -> lines.add(f.toString()));
        StringBuilder m = new StringBuilder("refusing to " + purpose + ": the stored data does not match the audit"
                + " trail (" + lines.size() + (v.truncated() || v.chain().truncated() ? "+" : "") + " finding(s))");
        for (String line : lines.subList(0, Math.min(NAMED, lines.size()))) {
            m.append("\n  ").append(line);
        }
        if (lines.size() > NAMED) {
            m.append("\n  ... and ").append(lines.size() - NAMED).append(" more; 'audit-verify' lists them all");
        }
        return m.toString();
    }
}
