package org.tracegas.importer.jcamp;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Map;

import org.tracegas.importer.jcamp.internal.AsdfEncoder;
import org.tracegas.importer.jcamp.internal.BlockConverter;
import org.tracegas.importer.jcamp.internal.JcampUnits;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Writes JCAMP-DX 5.01 files. Spectra on a uniform axis and interferograms go to ##XYDATA=(X++(Y..Y)) in
 * DIFDUP form with Y check values; spectra on a non-uniform axis to ##XYPOINTS=(XY..XY) in AFFN.
 *
 * <p>Quantisation: XYDATA stores integers times ##YFACTOR. When all ordinates are integers of at most
 * {@value #MAX_EXACT} in magnitude, YFACTOR is 1 and the values are kept exactly. Otherwise YFACTOR =
 * 2·precision·max|y|, so every ordinate read back differs from the written one by at most
 * precision·max|y| (half a quantisation step).
 */
public final class JcampWriter {

    /** Largest magnitude written exactly as an integer with YFACTOR 1. */
    public static final long MAX_EXACT = 1L << 40;

    private final double precision;

    /**
     * @param precision largest error of a written ordinate relative to the largest magnitude of the data, in
     *                  (1e-15, 0.5)
     */
    public JcampWriter(double precision) {
        if (!(precision > 1e-15 && precision < 0.5)) {
            throw new IllegalArgumentException("precision must lie in (1e-15, 0.5), was " + precision);
        }
        this.precision = precision;
    }

    /** A writer with a precision of 1e-7 relative to the largest magnitude (about seven significant digits). */
    public static JcampWriter defaultPrecision() {
        return new JcampWriter(1e-7);
    }

    public double precision() {
        return precision;
    }

    /**
     * The JCAMP-DX text of a spectrum.
     *
     * @param metadata written as private labels ##$KEY=value; keys and values must be single lines
     */
    public String write(Spectrum spectrum, String title, Map<String, String> metadata) {
        if (spectrum.ordinate() == Ordinate.INTERFEROGRAM) {
            throw new IllegalArgumentException("spectrum has ordinate INTERFEROGRAM; write an Interferogram instead");
        }
        SpectralAxis axis = spectrum.axis();
        String xUnits = switch (axis.unit()) {
            case WAVENUMBER -> "1/CM";
            case MICROMETRE -> "MICROMETERS";
            case SAMPLE_INDEX -> throw new IllegalArgumentException("spectrum axis unit SAMPLE_INDEX cannot be written");
        };
        StringBuilder b = header(title, "INFRARED SPECTRUM", metadata);
        b.append("##XUNITS=").append(xUnits).append('\n');
        b.append("##YUNITS=").append(JcampUnits.yName(spectrum.ordinate())).append('\n');
        double[] y = spectrum.toArray();
        if (axis.isUniform() || axis.size() == 1) {
            double step = axis.size() == 1 ? 1.0 : axis.step();
            xyData(b, y, axis.first(), step);
        } else {
            xyPoints(b, axis.toArray(), y);
        }
        return b.append("##END=\n").toString();
    }

    /** The JCAMP-DX text of an interferogram (abscissa in sample points, laser wavenumber as private label). */
    public String write(Interferogram interferogram, String title, Map<String, String> metadata) {
        StringBuilder b = header(title, "INTERFEROGRAM", metadata);
        b.append("##XUNITS=POINTS\n##YUNITS=ARBITRARY UNITS\n");
        b.append("##").append(BlockConverter.LASER_LABEL).append('=').append(interferogram.laserWavenumber()).append('\n');
        b.append("##").append(BlockConverter.SAMPLING_LABEL).append('=').append(interferogram.samplingInterval())
                .append('\n');
        xyData(b, interferogram.toArray(), 0, 1);
        return b.append("##END=\n").toString();
    }

    /** Writes the text to a file, replacing it only when complete (a temporary file is moved into place). */
    public static void save(String text, Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, ".jdx-", ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.US_ASCII);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** The YFACTOR this writer uses for the given ordinates. */
    public double yFactor(double[] y) {
        double max = 0;
        boolean integers = true;
        for (double v : y) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("ordinate " + v + " is not finite");
            }
            max = Math.max(max, Math.abs(v));
            integers &= v == Math.rint(v);
        }
        if (max == 0 || (integers && max <= MAX_EXACT)) {
            return 1.0;
        }
        return 2 * precision * max;
    }

    private StringBuilder header(String title, String dataType, Map<String, String> metadata) {
        StringBuilder b = new StringBuilder();
        b.append("##TITLE=").append(singleLine("title", title)).append('\n');
        b.append("##JCAMP-DX=5.01\n");
        b.append("##DATA TYPE=").append(dataType).append('\n');
        b.append("##ORIGIN=Tracegas Workbench\n");
        b.append("##OWNER=").append(singleLine("OWNER", metadata.getOrDefault("OWNER", ""))).append('\n');
        for (Map.Entry<String, String> e : metadata.entrySet()) {
            if (e.getKey().equals("OWNER")) {
                continue;
            }
            String key = singleLine("metadata key", e.getKey());
            if (key.isEmpty() || key.contains("=")) {
                throw new IllegalArgumentException("metadata key '" + key + "' must be non-empty and without '='");
            }
            b.append("##$").append(key).append('=').append(singleLine(key, e.getValue())).append('\n');
        }
        return b;
    }

    private void xyData(StringBuilder b, double[] y, double first, double step) {
        double yFactor = yFactor(y);
        long[] q = new long[y.length];
        for (int i = 0; i < y.length; i++) {
            q[i] = Math.round(y[i] / yFactor);
        }
        double last = first + step * (y.length - 1);
        b.append("##XFACTOR=1\n");
        b.append("##YFACTOR=").append(yFactor).append('\n');
        b.append("##FIRSTX=").append(first).append('\n');
        b.append("##LASTX=").append(last).append('\n');
        b.append("##DELTAX=").append(step).append('\n');
        b.append("##FIRSTY=").append(q[0] * yFactor).append('\n');
        b.append("##NPOINTS=").append(y.length).append('\n');
        b.append("##XYDATA=(X++(Y..Y))\n");
        List<String> lines = AsdfEncoder.encode(q, i -> first + step * i);
        for (String line : lines) {
            b.append(line).append('\n');
        }
    }

    private static void xyPoints(StringBuilder b, double[] x, double[] y) {
        b.append("##XFACTOR=1\n##YFACTOR=1\n");
        b.append("##NPOINTS=").append(x.length).append('\n');
        b.append("##XYPOINTS=(XY..XY)\n");
        for (int i = 0; i < x.length; i++) {
            b.append(x[i]).append(", ").append(y[i]).append('\n');
        }
    }

    private static String singleLine(String field, String value) {
        if (value == null) {
            throw new IllegalArgumentException(field + " must not be null");
        }
        if (value.contains("\n") || value.contains("\r") || value.contains("##") || value.contains("$$")) {
            throw new IllegalArgumentException(field + " must be one line without '##' or '$$': '" + value + "'");
        }
        return value.trim();
    }
}
