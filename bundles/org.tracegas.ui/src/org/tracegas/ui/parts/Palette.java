package org.tracegas.ui.parts;

import java.util.List;
import java.util.Locale;
import java.util.Map;

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

    /**
     * The eight colours of Okabe and Ito's "Color Universal Design" (2008), told apart by people with the common
     * forms of colour-vision deficiency: black, orange, sky blue, bluish green, yellow, blue, vermilion and
     * reddish purple.
     */
    static final List<Color> OKABE_ITO = List.of(new Color(0x00, 0x00, 0x00), new Color(0xE6, 0x9F, 0x00),
            new Color(0x56, 0xB4, 0xE9), new Color(0x00, 0x9E, 0x73), new Color(0xF0, 0xE4, 0x42),
            new Color(0x00, 0x72, 0xB2), new Color(0xD5, 0x5E, 0x00), new Color(0xCC, 0x79, 0xA7));

    /**
     * Fixed colours of the compounds of flue-gas work, so that a compound looks the same in every project and
     * the gases most often shown together (CO, NO, NO2, N2O) get the most distinct hues; yellow, faint on
     * white, goes to a compound rarely drawn beside the others.
     */
    private static final Map<String, Color> FIXED = Map.of("CO", OKABE_ITO.get(6), "NO", OKABE_ITO.get(5),
            "NO2", OKABE_ITO.get(1), "N2O", OKABE_ITO.get(3), "SO2", OKABE_ITO.get(7), "H2O", OKABE_ITO.get(2),
            "CO2", OKABE_ITO.get(0), "CH4", OKABE_ITO.get(4));

    private Palette() {
    }

    /**
     * The colour of a compound: fixed for the common ones; any other gets one chosen by its name alone
     * (String.hashCode is specified by the Java language, so the choice is the same on every run and machine).
     */
    public static Color compound(String name) {
        Color fixed = FIXED.get(name.strip().toUpperCase(Locale.ROOT));
        return fixed != null ? fixed : OKABE_ITO.get(Math.floorMod(name.strip().toUpperCase(Locale.ROOT).hashCode(),
                OKABE_ITO.size()));
    }
}
