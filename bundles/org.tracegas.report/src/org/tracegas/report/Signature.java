package org.tracegas.report;

import java.time.Instant;

import org.tracegas.report.internal.Check;

/**
 * An electronic signature shown on the report: printed name, time, meaning and the hash of the content
 * that was signed.
 *
 * @param printedName       the signer's printed name
 * @param signedAt          time of signing
 * @param meaning           review or approval
 * @param signedContentHash SHA-256 (hex) of the report content the signer saw, as {@link ReportContent#contentHash()}
 */
public record Signature(String printedName, Instant signedAt, SignatureMeaning meaning, String signedContentHash) {

    public Signature {
        Check.text("printedName", printedName);
        Check.notNull("signedAt", signedAt);
        Check.notNull("meaning", meaning);
        Check.text("signedContentHash", signedContentHash);
    }
}
