package org.tracegas.report.campaign;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.tracegas.model.ContentVersion;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.store.ResultRow;

/**
 * A project's stored results as CSV (RFC 4180: CRLF line ends, a header line, fields with comma, quote or line
 * break in double quotes with inner quotes doubled), one line per result, each standing alone: its measurement
 * and time, the file it came from, the value with its standard uncertainty, detection limit, unit and flags, the
 * method and library by name and version number, the SHA-256 of the absorbance it was fitted from (its
 * provenance) and of the recipe that made that absorbance, and what the value was corrected with: the sample
 * cell's temperature (K), pressure (kPa) and path (m) with where each came from, the references' temperature and
 * pressure, the path of the fit, the factor applied, and the transform's noise factor F with where it came from
 * (empty for a result not corrected). Numbers are written in full with a point; times in ISO 8601 UTC.
 */
public final class ResultsCsv {

    /** The header line's fields. */
    public static final List<String> HEADER = List.of("measurement", "measured_utc", "source_file", "compound",
            "value", "standard_uncertainty", "detection_limit", "unit", "flags", "method", "method_version",
            "library", "library_version", "provenance_sha256", "recipe_sha256", "cell_temperature_k",
            "cell_temperature_origin", "cell_pressure_kpa", "cell_pressure_origin", "path_length_m",
            "path_length_origin", "reference_temperature_k", "reference_pressure_kpa", "fit_path_length_m",
            "correction_factor", "noise_factor", "noise_factor_origin");

    private ResultsCsv() {
    }

    /**
     * @param versions the stored version of an id (method and library versions named by the results)
     * @return the number of result lines written
     */
    public static int write(List<ResultRow> rows, Function<String, ContentVersion> versions, Writer out)
            throws IOException {
        Map<String, ContentVersion> known = new HashMap<>();
        line(out, HEADER);
        for (ResultRow row : rows) {
            Result r = row.result();
            Provenance p = r.getProvenance();
            ContentVersion method = known.computeIfAbsent(p.methodVersionId(), versions);
            ContentVersion library = known.computeIfAbsent(p.libraryVersionId(), versions);
            List<String> fields = new ArrayList<>(List.of(text(r.getMeasurementId()),
                    row.measured() == null ? "" : row.measured().toString(), text(row.sourceFile()), r.getCompound(),
                    Double.toString(r.getConcentration()), Double.toString(r.getStandardUncertainty()),
                    Double.toString(r.getDetectionLimit()), r.getUnit(),
                    String.join(" ", r.getFlags().stream().map(f -> f.getName()).sorted().toList()),
                    method.getItemName(), Integer.toString(method.getNumber()), library.getItemName(),
                    Integer.toString(library.getNumber()),
                    p.inputHash(), text(row.recipeSha256())));
            fields.addAll(conditions(r.getConditions()));
            line(out, fields);
        }
        return rows.size();
    }

    private static List<String> conditions(ResultConditions c) {
        if (c == null) {
            return java.util.Collections.nCopies(12, "");
        }
        return List.of(Double.toString(c.cellTemperatureK()), c.temperatureOrigin(),
                Double.toString(c.cellPressureKPa()), c.pressureOrigin(), Double.toString(c.pathM()), c.pathOrigin(),
                Double.toString(c.referenceTemperatureK()), Double.toString(c.referencePressureKPa()),
                Double.toString(c.fitPathM()), Double.toString(c.correctionFactor()),
                Double.toString(c.noiseFactor()), c.noiseFactorOrigin());
    }

    private static String text(String value) {
        return value == null ? "" : value;
    }

    private static void line(Writer out, List<String> fields) throws IOException {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                out.write(',');
            }
            String f = fields.get(i);
            if (f.indexOf(',') >= 0 || f.indexOf('"') >= 0 || f.indexOf('\n') >= 0 || f.indexOf('\r') >= 0) {
                out.write('"' + f.replace("\"", "\"\"") + '"');
            } else {
                out.write(f);
            }
        }
        out.write("\r\n");
    }
}
