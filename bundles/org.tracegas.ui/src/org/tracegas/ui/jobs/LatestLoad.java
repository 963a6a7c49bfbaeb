package org.tracegas.ui.jobs;

import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;

/**
 * Reads data for one control in a background job and hands it to the UI thread. Starting a new read cancels
 * the one before, and only the latest read delivers: a result that arrives after a newer request, or after
 * the control was disposed, is dropped.
 *
 * @param <T> what is read
 */
public final class LatestLoad<T> {

    /** The reading, run in the job's thread; it checks the monitor and may throw OperationCanceledException. */
    @FunctionalInterface
    public interface Reader<T> {
        T read(IProgressMonitor monitor);
    }

    private final Control owner;
    private final AtomicLong latest = new AtomicLong();
    private Job running;

    /** @param owner the control the results are for; nothing is delivered once it is disposed */
    public LatestLoad(Control owner) {
        this.owner = owner;
    }

    /**
     * Starts reading in a job named {@code name}. Call in the UI thread.
     *
     * @param shown  receives the result in the UI thread, if this is still the latest request
     * @param failed receives the error message in the UI thread, if this is still the latest request
     * @return the scheduled job
     */
    public Job start(String name, Reader<T> reader, Consumer<T> shown, Consumer<String> failed) {
        long request = latest.incrementAndGet();
        if (running != null) {
            running.cancel();
        }
        Display display = owner.getDisplay();
        Job job = new Job(name) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                try {
                    T result = reader.read(monitor);
                    if (monitor.isCanceled()) {
                        return Status.CANCEL_STATUS;
                    }
                    deliver(display, request, () -> shown.accept(result));
                    return Status.OK_STATUS;
                } catch (OperationCanceledException e) {
                    return Status.CANCEL_STATUS;
                } catch (RuntimeException e) {
                    String message = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
                    deliver(display, request, () -> failed.accept(message));
                    // the view shows the failure; the job itself ends quietly instead of raising a second dialog
                    return Status.OK_STATUS;
                } finally {
                    monitor.done();
                }
            }
        };
        running = job;
        job.schedule();
        return job;
    }

    /** Drops whatever reads are under way (e.g. when the view closes). */
    public void cancel() {
        latest.incrementAndGet();
        if (running != null) {
            running.cancel();
        }
    }

    /** True while {@code request} is the newest one. */
    private boolean current(long request) {
        return latest.get() == request;
    }

    private void deliver(Display display, long request, Runnable toUi) {
        if (display.isDisposed()) {
            return;
        }
        try {
            display.asyncExec(() -> {
                if (!owner.isDisposed() && current(request)) {
                    toUi.run();
                }
            });
        } catch (org.eclipse.swt.SWTException disposedMeanwhile) {
            // the display went away between the check and the call: nobody is left to show the result
        }
    }
}
