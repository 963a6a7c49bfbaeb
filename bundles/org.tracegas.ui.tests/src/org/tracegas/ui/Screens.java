package org.tracegas.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/** Event-loop helpers and screenshots for the UI tests. */
public final class Screens {

    private Screens() {
    }

    /** Runs the event loop until no event is pending. */
    public static void flush(Display display) {
        while (display.readAndDispatch()) {
            // keep dispatching
        }
    }

    /** Runs the event loop until {@code done} holds; fails after {@code millis}. */
    public static void waitFor(Display display, BooleanSupplier done, long millis) {
        long end = System.currentTimeMillis() + millis;
        while (!done.getAsBoolean()) {
            if (System.currentTimeMillis() > end) {
                throw new AssertionError("condition not reached within " + millis + " ms");
            }
            if (!display.readAndDispatch()) {
                display.timerExec(20, () -> { });
                display.sleep();
            }
        }
        flush(display);
    }

    /**
     * Saves what the shell shows as target/screenshots/{name}.png in the test fragment's folder.
     *
     * @return the file written
     */
    public static Path save(Shell shell, String name) throws Exception {
        Display display = shell.getDisplay();
        shell.layout(true, true);
        flush(display);
        // give the window system time to map and paint the window before copying its pixels
        long until = System.currentTimeMillis() + 300;
        while (System.currentTimeMillis() < until) {
            if (!display.readAndDispatch()) {
                display.timerExec(20, () -> { });
                display.sleep();
            }
        }
        Point size = shell.getSize();
        Image image = new Image(display, size.x, size.y);
        // a shown window is copied from the screen, menu bar and all; the shell's own GC starts below the menu bar
        GC gc = shell.isVisible() ? new GC(display) : new GC(shell);
        try {
            Point at = shell.isVisible() ? shell.getLocation() : new Point(0, 0);
            gc.copyArea(image, at.x, at.y);
        } finally {
            gc.dispose();
        }
        if (blank(image.getImageData())) {
            // some window systems hand back an empty copy; draw the widgets into the image instead
            GC ig = new GC(image);
            try {
                shell.print(ig);
            } finally {
                ig.dispose();
            }
        }
        Path dir = Path.of(System.getProperty("user.dir"), "target", "screenshots");
        Files.createDirectories(dir);
        Path file = dir.resolve(name + ".png");
        ImageLoader loader = new ImageLoader();
        loader.data = new ImageData[] {image.getImageData()};
        loader.save(file.toString(), SWT.IMAGE_PNG);
        image.dispose();
        return file;
    }

    private static boolean blank(ImageData d) {
        int first = d.getPixel(0, 0);
        for (int y = 0; y < d.height; y += 7) {
            for (int x = 0; x < d.width; x += 7) {
                if (d.getPixel(x, y) != first) {
                    return false;
                }
            }
        }
        return true;
    }
}
