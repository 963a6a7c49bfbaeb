package org.tracegas.store.internal;

import java.nio.charset.StandardCharsets;
import java.util.Locale;

import org.tracegas.model.Provenance;
import org.tracegas.model.Result;

/** The exact text a signature on a stored result covers: its values and what made them. */
final class ResultContent {

    private ResultContent() {
    }

    /**
     * The signed bytes of a result. Lines end in a line feed on every platform, so that a signature given on
     * one machine is verified on another.
     */
    static byte[] of(Result r) {
        Provenance p = r.getProvenance();
        String text = String.format(Locale.ROOT,
                "result=%s\ncompound=%s\nconcentration=%s\nuncertainty=%s\ndetection_limit=%s\nunit=%s\n"
                        + "method_version=%s\nlibrary_version=%s\ninput_sha256=%s\nrecorded_by=%s\nrecorded=%s\n",
                r.getId(), r.getCompound(), r.getConcentration(), r.getStandardUncertainty(), r.getDetectionLimit(),
                r.getUnit(), p.methodVersionId(), p.libraryVersionId(), p.inputHash(), r.getRecordedBy(),
                r.getRecorded());
        return text.getBytes(StandardCharsets.UTF_8);
    }
}
