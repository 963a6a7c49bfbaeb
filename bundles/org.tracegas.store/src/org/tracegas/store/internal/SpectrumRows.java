package org.tracegas.store.internal;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.UUID;

import org.tracegas.model.SpectralContent;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.StoredSpectrum;

/** Rows of table spectral_data. */
final class SpectrumRows {

    static final String COLUMNS = "id, measurement_id, content, ordinate, axis_unit, point_count, axis_first,"
            + " axis_step, axis_values, value_encoding, value_data, sha256";

    static final String INSERT = "INSERT INTO spectral_data (project_id, " + COLUMNS
            + ") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)";

    private SpectrumRows() {
    }

    /** Binds one row to {@link #INSERT}. @return the new id and value hash */
    static String[] bindInsert(PreparedStatement ps, String projectId, SpectrumInput input) throws SQLException {
        Spectrum s = input.spectrum();
        SpectralAxis axis = s.axis();
        byte[] values = SpectrumCodec.encode(s.toArray(), input.encoding());
        String id = UUID.randomUUID().toString();
        String sha256 = SpectrumCodec.sha256Hex(values);
        Tx.bind(ps, projectId, id, input.measurementId(), input.content(), s.ordinate(), axis.unit(), axis.size(),
                axis.isUniform() ? axis.first() : null, axis.isUniform() ? axis.step() : null,
                axis.isUniform() ? null : SpectrumCodec.encode(axis.toArray(), SampleEncoding.FLOAT64_LE),
                input.encoding(), values, sha256);
        return new String[] {id, sha256};
    }

    static StoredSpectrum read(ResultSet rs) throws SQLException {
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
        Spectrum spectrum = new Spectrum(axis, values, Ordinate.valueOf(rs.getString("ordinate")));
        return new StoredSpectrum(id, rs.getString("measurement_id"),
                SpectralContent.valueOf(rs.getString("content")), spectrum, encoding, rs.getString("sha256"));
    }
}
