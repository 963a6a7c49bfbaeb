package org.tracegas.ui.parts;

import org.eclipse.swt.graphics.Color;

/** The product's plot colours (system-independent, so screenshots and prints look the same). */
public final class Palette {

    public static final Color SAMPLE = new Color(34, 40, 64);
    public static final Color FIT = new Color(226, 112, 20);
    public static final Color RESIDUAL = new Color(180, 30, 60);
    public static final Color REGION = new Color(110, 190, 140);
    public static final Color LIMIT = new Color(200, 0, 0);
    public static final Color PASS = new Color(220, 242, 224);
    public static final Color FAIL = new Color(250, 214, 214);
    public static final Color CHANGED = new Color(255, 240, 170);
    public static final Color INTACT = new Color(30, 120, 60);
    public static final Color BROKEN = new Color(170, 20, 20);

    private static final Color[] COMPOUNDS = {new Color(0, 128, 128), new Color(120, 60, 160),
            new Color(110, 130, 20), new Color(30, 100, 200), new Color(170, 90, 40), new Color(200, 60, 150),
            new Color(60, 60, 60), new Color(0, 160, 90)};

    private Palette() {
    }

    /** The colour of the i-th compound (colours repeat after eight). */
    public static Color compound(int i) {
        return COMPOUNDS[Math.floorMod(i, COMPOUNDS.length)];
    }
}
