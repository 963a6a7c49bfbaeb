package org.tracegas.store.internal;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.HashMap;
import java.util.Map;

import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.SpectrumInput;

/** Rows of table spectral_data. */
final class SpectrumRows {

    /**
     * The columns {@link #read(ResultSet)} reads, from {@code spectral_data} unaliased. The recipe is that of
     * the results stored in the same audited write as the array: an analysis stores one absorbance with the
     * results fitted from it under one recipe, and the audit record binding the array binds those results
     * (the record's bindings are looked up through their index, one record's few rows per array).
     */
    static final String COLUMNS = "id, measurement_id, content, ordinate, axis_unit, point_count, axis_first,"
            + " axis_step, axis_values, value_encoding, value_data, sha256,"
            + " (SELECT MIN(r.recipe_sha256) FROM data_binding b"
            + " JOIN data_binding rb ON rb.audit_seq = b.audit_seq AND rb.kind = '" + DataKind.RESULT.label() + "'"
            + " JOIN analysis_result r ON r.id = rb.row_key"
            + " WHERE b.kind = '" + DataKind.SPECTRAL_DATA.label() + "' AND b.row_key = spectral_data.id)"
            + " AS recipe_sha256";

    static final String INSERT = DataKind.SPECTRAL_DATA.insert();

    private SpectrumRows() {
    }

    /** Binds one row to {@link #INSERT}. @return the new id and value hash */
    static String[] bindInsert(PreparedStatement ps, String projectId, SpectrumInput input) throws SQLException {
        Map<String, Object> row = row(projectId, input);
        DataKind.SPECTRAL_DATA.bind(ps, row);
        return new String[] {(String) row.get("id"), (String) row.get("sha256")};
    }

    /** A new row, with a new id, by column name as {@link DataKind#SPECTRAL_DATA} binds and hashes it. */
    static Map<String, Object> row(String projectId, SpectrumInput input) {
        Spectrum s = input.spectrum();
        SpectralAxis axis = s.axis();
        byte[] values = SpectrumCodec.encode(s.toArray(), input.encoding());
        Map<String, Object> row = new HashMap<>();
        row.put("id", RowIds.next());
        row.put("project_id", projectId);
        row.put("measurement_id", input.measurementId());
        row.put("content", input.content().name());
        row.put("ordinate", s.ordinate().name());
        row.put("axis_unit", axis.unit().name());
        row.put("point_count", axis.size());
        row.put("axis_first", axis.isUniform() ? axis.first() : null);
        row.put("axis_step", axis.isUniform() ? axis.step() : null);
        row.put("axis_values", axis.isUniform() ? null
                : SpectrumCodec.encode(axis.toArray(), SampleEncoding.FLOAT64_LE));
        row.put("value_encoding", input.encoding().name());
        row.put("value_data", values);
        row.put("sha256", SpectrumCodec.sha256Hex(values));
        return row;
    }

    static ProcessedSpectrum read(ResultSet rs) throws SQLException {
        String id = rs.getString("id");
        int count = rs.getInt("point_count");
        AxisUnit unit = AxisUnit.valueOf(rs.getString("axis_unit"));
        byte[] axisValues = rs.getBytes("axis_values");
        SpectralAxis axis = axisValues == null
                ? SpectralAxis.uniform(unit, rs.getDouble("axis_first"), rs.getDouble("axis_step"), count)
                : SpectralAxis.of(unit, SpectrumCodec.decode(axisValues, SampleEncoding.FLOAT64_LE, count,
                        "axis of spectrum " + id));
        SampleEncoding encoding = SampleEncoding.valueOf(rs.getString("value_encoding"));
        double[] values = SpectrumCodec.decode(rs.getBytes("value_data"), encoding, count, "spectrum " + id);
        ProcessedSpectrum s = WorkspaceFactory.eINSTANCE.createProcessedSpectrum();
        s.setId(id);
        s.setMeasurementId(rs.getString("measurement_id"));
        s.setContent(SpectralContent.valueOf(rs.getString("content")));
        s.setSampleEncoding(encoding.name());
        s.setSha256(rs.getString("sha256"));
        String recipe = rs.getString("recipe_sha256");
        s.setRecipeSha256(recipe == null ? null : recipe.trim()); // CHAR(64): H2 and PostgreSQL pad alike
        s.setSpectrum(new Spectrum(axis, values, Ordinate.valueOf(rs.getString("ordinate"))));
        return s;
    }
}
