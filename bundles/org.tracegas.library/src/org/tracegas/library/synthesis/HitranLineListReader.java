package org.tracegas.library.synthesis;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.library.io.FileFormatException;

/**
 * Reads line lists in the HITRAN 2004+ fixed-width format of 160 characters per line (Rothman et al., JQSRT 96,
 * 139 (2005)). Only the first ten fields are used; the quanta, uncertainty and reference fields are ignored.
 * Errors name the file, the line, the columns and the field.
 */
public final class HitranLineListReader {

    /** Field name, first column (0-based) and width in characters. */
    private enum Field {
        MOLECULE("molecule id", 0, 2), ISOTOPOLOGUE("isotopologue", 2, 1), WAVENUMBER("wavenumber", 3, 12),
        INTENSITY("intensity", 15, 10), EINSTEIN_A("Einstein A", 25, 10), GAMMA_AIR("air half width", 35, 5),
        GAMMA_SELF("self half width", 40, 5), LOWER_ENERGY("lower-state energy", 45, 10),
        N_AIR("temperature exponent", 55, 4), DELTA_AIR("pressure shift", 59, 8);

        final String label;
        final int start;
        final int width;

        Field(String label, int start, int width) {
            this.label = label;
            this.start = start;
            this.width = width;
        }

        String columns() {
            return "columns " + (start + 1) + "-" + (start + width);
        }
    }

    private static final int RECORD_LENGTH = 160;

    public LineList read(Path file) throws IOException {
        List<SpectralLine> lines = new ArrayList<>();
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.US_ASCII)) {
            String text;
            int lineNumber = 0;
            while ((text = in.readLine()) != null) {
                lineNumber++;
                if (text.isBlank()) {
                    continue;
                }
                if (text.length() != RECORD_LENGTH) {
                    throw new FileFormatException(file, lineNumber, "", "a HITRAN record has " + RECORD_LENGTH
                            + " characters, this line has " + text.length());
                }
                lines.add(parse(file, lineNumber, text));
            }
        }
        if (lines.isEmpty()) {
            throw new FileFormatException(file, 0, "", "holds no line records");
        }
        return new LineList(file.getFileName().toString(), lines);
    }

    private static SpectralLine parse(Path file, int line, String text) throws FileFormatException {
        int molecule = moleculeId(file, line, text);
        int isotopologue = isotopologue(file, line, text);
        double wavenumber = number(file, line, text, Field.WAVENUMBER);
        double intensity = number(file, line, text, Field.INTENSITY);
        double einsteinA = number(file, line, text, Field.EINSTEIN_A);
        double gammaAir = number(file, line, text, Field.GAMMA_AIR);
        double gammaSelf = number(file, line, text, Field.GAMMA_SELF);
        double lowerEnergy = number(file, line, text, Field.LOWER_ENERGY);
        double nAir = number(file, line, text, Field.N_AIR);
        double deltaAir = number(file, line, text, Field.DELTA_AIR);
        try {
            return new SpectralLine(molecule, isotopologue, wavenumber, intensity, einsteinA, gammaAir, gammaSelf,
                    lowerEnergy, nAir, deltaAir);
        } catch (IllegalArgumentException e) {
            throw new FileFormatException(file, line, "", e.getMessage());
        }
    }

    private static int moleculeId(Path file, int line, String text) throws FileFormatException {
        String s = text.substring(Field.MOLECULE.start, Field.MOLECULE.start + Field.MOLECULE.width).strip();
        try {
            return Integer.parseInt(s);
        } catch (NumberFormatException e) {
            throw new FileFormatException(file, line, Field.MOLECULE.label,
                    "'" + s + "' is not an integer (" + Field.MOLECULE.columns() + ")");
        }
    }

    /** HITRAN writes isotopologue 10 as '0' and 11, 12 as 'A', 'B' (from memory). */
    private static int isotopologue(Path file, int line, String text) throws FileFormatException {
        char c = text.charAt(Field.ISOTOPOLOGUE.start);
        if (c >= '1' && c <= '9') {
            return c - '0';
        }
        if (c == '0') {
            return 10;
        }
        if (c == 'A' || c == 'B') {
            return 11 + (c - 'A');
        }
        throw new FileFormatException(file, line, Field.ISOTOPOLOGUE.label,
                "'" + c + "' is no isotopologue number (" + Field.ISOTOPOLOGUE.columns() + ")");
    }

    private static double number(Path file, int line, String text, Field field) throws FileFormatException {
        String s = text.substring(field.start, field.start + field.width).strip();
        try {
            double v = Double.parseDouble(s);
            if (Double.isFinite(v) && !s.endsWith("d") && !s.endsWith("f")) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below with the columns
        }
        throw new FileFormatException(file, line, field.label,
                "'" + s + "' is not a number (" + field.columns() + ")");
    }
}
