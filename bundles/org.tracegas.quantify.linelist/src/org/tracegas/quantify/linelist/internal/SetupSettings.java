package org.tracegas.quantify.linelist.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.tracegas.library.synthesis.HitranLineListReader;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.PartitionFunction;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.internal.Sha256;
import org.tracegas.quantify.linelist.LineListSetup;

/**
 * Builds the line-list setup from the settings a method carries: temperature (K), pressure (kPa), field-of-view
 * (rad), apodization and resolution (cm-1) once each, optionally cell-conditions (stated, the default, or measured:
 * each sample's own measured cell temperature and pressure), and per compound a gas "name molar-mass m partition
 * linear|non-linear sha256 h file path". Every line list is read anew and must still have the SHA-256 the method
 * states, so that the fit computes the spectra the method's version binds.
 */
public final class SetupSettings {

    /** The setting that chooses the stated or each sample's measured cell conditions. */
    private static final String CELL_CONDITIONS = "cell-conditions";

    private SetupSettings() {
    }

    /**
     * @throws IllegalArgumentException naming the method and the setting at fault; for a line list whose bytes
     *                                  changed, its file and both hashes
     */
    public static LineListSetup read(QuantificationMethod method) {
        Map<String, LineByLineModel> models = new HashMap<>();
        HitranLineListReader reader = new HitranLineListReader();
        for (String gas : method.algorithmSettings("gas")) {
            String[] w = gas.split(" ", 8);
            if (w.length != 8 || !w[1].equals("molar-mass") || !w[3].equals("partition") || !w[5].equals("sha256")
                    || !w[7].startsWith("file ")) {
                throw error(method, "gas", "expected '<compound> molar-mass <g/mol> partition <linear|non-linear>"
                        + " sha256 <hex> file <line list>', found '" + gas + "'");
            }
            Path file = Path.of(w[7].substring(5));
            try {
                String actual = Sha256.hex(Files.readAllBytes(file));
                if (!actual.equals(w[6])) {
                    throw error(method, "gas", "sha256 of " + w[0] + ": the line list " + file + " has SHA-256 "
                            + actual + ", the method states " + w[6] + " (the file changed since the method was"
                            + " defined)");
                }
                models.put(w[0], new LineByLineModel(reader.read(file), number(method, "gas", w[2]),
                        partition(method, w[4])));
            } catch (IOException e) {
                throw error(method, "gas", "line list of " + w[0] + " " + file + " cannot be read: "
                        + e.getMessage());
            }
        }
        String apodization = single(method, "apodization");
        Apodization shape;
        try {
            shape = Apodization.valueOf(apodization.toUpperCase(Locale.ROOT).replace('-', '_'));
        } catch (IllegalArgumentException e) {
            throw error(method, "apodization", "'" + apodization + "' is none of " + List.of(Apodization.values()));
        }
        try {
            return new LineListSetup(models, number(method, "temperature", single(method, "temperature")),
                    number(method, "pressure", single(method, "pressure")),
                    InstrumentLineShape.forResolution(shape,
                            number(method, "resolution", single(method, "resolution"))),
                    number(method, "field-of-view", single(method, "field-of-view")), measured(method));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("method " + method.name() + ": " + e.getMessage(), e);
        }
    }

    /**
     * Whether the method computes its spectra at each sample's measured cell conditions: cell-conditions measured,
     * or stated (also when absent, as in the methods defined before the setting existed).
     */
    private static boolean measured(QuantificationMethod method) {
        List<String> values = method.algorithmSettings(CELL_CONDITIONS);
        if (values.isEmpty()) {
            return false;
        }
        String value = single(method, CELL_CONDITIONS);
        return switch (value) {
            case "measured" -> true;
            case "stated" -> false;
            default -> throw error(method, CELL_CONDITIONS, "'" + value + "' is none of measured, stated");
        };
    }

    private static PartitionFunction partition(QuantificationMethod method, String kind) {
        return switch (kind) {
            case "linear" -> PowerLawPartitionFunction.linearMolecule();
            case "non-linear" -> PowerLawPartitionFunction.nonLinearMolecule();
            default -> throw error(method, "gas", "partition '" + kind + "' is none of linear, non-linear");
        };
    }

    private static String single(QuantificationMethod method, String key) {
        List<String> values = method.algorithmSettings(key);
        if (values.size() != 1) {
            throw error(method, key, "must be given once, found " + values.size());
        }
        return values.get(0);
    }

    private static double number(QuantificationMethod method, String key, String text) {
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw error(method, key, "'" + text + "' is not a number");
        }
    }

    private static IllegalArgumentException error(QuantificationMethod method, String key, String reason) {
        return new IllegalArgumentException("method " + method.name() + ", line-list setting '" + key + "': "
                + reason);
    }
}
