package org.tracegas.ui.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.ui.Screens;

class LatestLoadTest {

    private Display display;
    private Shell shell;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
    }

    @AfterEach
    void close() {
        if (!shell.isDisposed()) {
            shell.dispose();
        }
    }

    @Test
    void aLaterRequestWinsOverAnEarlierOneThatFinishesLast() throws Exception {
        Label owner = new Label(shell, 0);
        LatestLoad<String> load = new LatestLoad<>(owner);
        List<String> shown = new ArrayList<>();
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch reading = new CountDownLatch(1);
        Job first = load.start("first", m -> {
            reading.countDown();
            try {
                release.await(10, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return "first";
        }, shown::add, shown::add);
        // the later request comes while the earlier one is reading (a job cancelled before it runs has no result)
        assertTrue(reading.await(10, TimeUnit.SECONDS));
        Job second = load.start("second", m -> "second", shown::add, shown::add);
        second.join(10_000, null);
        release.countDown();
        first.join(10_000, null);
        Screens.flush(display);
        assertEquals(List.of("second"), shown);
        // the earlier job was told to stop and, finding so, ends as cancelled
        assertEquals(IStatus.CANCEL, first.getResult().getSeverity());
    }

    @Test
    void nothingIsDeliveredToADisposedControlAndFailuresArriveAsMessages() throws Exception {
        Label owner = new Label(shell, 0);
        LatestLoad<String> load = new LatestLoad<>(owner);
        List<String> shown = new ArrayList<>();
        Job failing = load.start("failing", m -> {
            throw new IllegalStateException("database gone");
        }, shown::add, message -> shown.add("failed: " + message));
        failing.join(10_000, null);
        Screens.flush(display);
        assertEquals(List.of("failed: database gone"), shown);

        Job late = load.start("late", m -> "late", shown::add, shown::add);
        late.join(10_000, null);
        owner.dispose();
        Screens.flush(display);
        assertEquals(1, shown.size(), "the disposed control got nothing: " + shown);
        assertTrue(late.getResult().isOK());
    }
}
