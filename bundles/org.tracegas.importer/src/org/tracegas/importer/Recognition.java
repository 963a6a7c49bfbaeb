package org.tracegas.importer;

/**
 * How sure a reader is that it can read a file, judged from the first bytes and the name.
 *
 * @param confidence 0 (not this format) to 1 (certain, for example a magic number matched)
 * @param reason     short explanation, shown when a user asks why a reader was chosen
 */
public record Recognition(double confidence, String reason) {

    public Recognition {
        if (!(confidence >= 0 && confidence <= 1)) {
            throw new IllegalArgumentException("confidence must lie in [0, 1], was " + confidence);
        }
        if (reason == null) {
            throw new IllegalArgumentException("reason must not be null");
        }
    }

    public static Recognition no(String reason) {
        return new Recognition(0, reason);
    }

    public boolean recognised() {
        return confidence > 0;
    }
}
