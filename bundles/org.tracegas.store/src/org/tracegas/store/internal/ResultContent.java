package org.tracegas.store.internal;

import java.nio.charset.StandardCharsets;
import java.util.Locale;

import org.tracegas.store.ResultInfo;

/** The exact text a signature on a stored result covers: its values and what made them. */
final class ResultContent {

    private ResultContent() {
    }

    /**
     * The signed bytes of a result. Lines end in a line feed on every platform, so that a signature given on
     * one machine is verified on another.
     */
    static byte[] of(ResultInfo r) {
        String text = String.format(Locale.ROOT,
                "result=%s\ncompound=%s\nconcentration=%s\nuncertainty=%s\ndetection_limit=%s\nunit=%s\n"
                        + "method_version=%s\nlibrary_version=%s\ninput_sha256=%s\nrecorded_by=%s\nrecorded=%s\n",
                r.id(), r.values().compound(), r.values().concentration(), r.values().uncertainty(),
                r.values().detectionLimit(), r.values().unit(), r.values().methodVersionId(),
                r.values().libraryVersionId(), r.values().inputHash(), r.recordedBy(), r.recorded());
        return text.getBytes(StandardCharsets.UTF_8);
    }
}
