package org.tracegas.runner;

import java.io.PrintStream;
import java.util.Locale;

/**
 * The progress line of long work: one line, rewritten in place, with count, percentage and rate. Updates
 * are throttled so that printing never slows the work it reports.
 */
public final class ProgressLine {

    private static final long MIN_INTERVAL_NANOS = 500_000_000L;

    private final PrintStream stream;
    private long started;
    private long lastPrinted;
    private String task = "";

    ProgressLine(PrintStream stream) {
        this.stream = stream;
    }

    public synchronized void begin(String taskName) {
        task = taskName;
        started = System.nanoTime();
        lastPrinted = 0;
    }

    public synchronized void update(long done, long total) {
        long now = System.nanoTime();
        if (done < total && now - lastPrinted < MIN_INTERVAL_NANOS) {
            return;
        }
        lastPrinted = now;
        stream.print('\r' + format(task, done, total, (now - started) / 1e9));
        if (done >= total) {
            stream.println();
        }
        stream.flush();
    }

    static String format(String task, long done, long total, double seconds) {
        double rate = seconds > 0 ? done / seconds : 0;
        double percent = total > 0 ? 100.0 * done / total : 100.0;
        return String.format(Locale.ROOT, "%s: %d/%d (%.1f%%) %.0f/s", task, done, total, percent, rate);
    }
}
