package org.tracegas.importer.jcamp.internal;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportedInterferogram;
import org.tracegas.importer.ImportedRecord;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.importer.internal.Numbers;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** Turns one JCAMP-DX data block into a spectrum or an interferogram with its metadata. */
public final class BlockConverter {

    /** Private label for the reference laser wavenumber of interferograms (cm-1). */
    public static final String LASER_LABEL = "$LASER WAVENUMBER";
    /** Private label for the laser fringes per interferogram sample. */
    public static final String SAMPLING_LABEL = "$SAMPLING INTERVAL";
    /** Metadata key set when the laser wavenumber was not in the file and the HeNe value was assumed. */
    public static final String LASER_ASSUMED_KEY = "laser wavenumber assumed";

    /** HeNe reference laser, 15798 cm-1 (632.99 nm in air; common practice, no source). */
    private static final double HENE_WAVENUMBER = 15798.0;

    /**
     * Relative tolerance between ##DELTAX and (##LASTX-##FIRSTX)/(##NPOINTS-1): allows DELTAX written with about
     * five significant digits (common practice, no source).
     */
    public static final double DELTAX_TOLERANCE = 1e-4;

    private static final Set<String> STRUCTURE = Set.of("END", "XYDATA", "XYPOINTS", "PEAKTABLE");

    private final String source;
    private final long maxPoints;

    public BlockConverter(String source, long maxPoints) {
        this.source = source;
        this.maxPoints = maxPoints;
    }

    /** Records of a top-level block: the block itself, or the nested blocks of a linked block. */
    public void convert(Block block, List<ImportedRecord> out) throws ImportException {
        requireVersion(block);
        if (!block.isLinkBlock()) {
            out.add(checkedData(block, Map.of()));
            return;
        }
        Ldr blocks = block.find("BLOCKS");
        int declared = (int) integer(blocks, 1, Integer.MAX_VALUE);
        if (declared != block.children().size()) {
            throw new ImportException(source, blocks.line(), "##" + blocks.rawLabel(), "declares " + declared
                    + " blocks but the linked block holds " + block.children().size());
        }
        Map<String, String> linkMetadata = Map.of("LINK TITLE", block.find("TITLE").fullValue());
        for (Block child : block.children()) {
            if (child.isLinkBlock()) {
                throw new ImportException(source, child.startLine(), "##BLOCKS", "nested linked blocks");
            }
            if (child.find("BLOCKID") == null) {
                throw new ImportException(source, child.startLine(), "##BLOCK_ID",
                        "a block inside a linked block needs ##BLOCK_ID=");
            }
            out.add(checkedData(child, linkMetadata));
        }
    }

    private void requireVersion(Block block) throws ImportException {
        Ldr version = block.find("JCAMPDX");
        if (version == null) {
            throw new ImportException(source, block.startLine(), "##JCAMP-DX", "missing version label");
        }
        String v = version.fullValue().trim();
        if (!(v.startsWith("4.") || v.startsWith("5."))) {
            throw new ImportException(source, version.line(), "##" + version.rawLabel(),
                    "unsupported version '" + v + "' (4.24 and 5.01 are read)");
        }
    }

    /** Values that pass the label checks can still be out of range for the value objects (overflowing axes). */
    private ImportedRecord checkedData(Block block, Map<String, String> inherited) throws ImportException {
        try {
            return convertData(block, inherited);
        } catch (IllegalArgumentException e) {
            throw new ImportException(source, block.startLine(), "block", "values out of range: "
                    + e.getMessage(), e);
        }
    }

    private ImportedRecord convertData(Block block, Map<String, String> inherited) throws ImportException {
        Map<String, String> metadata = new LinkedHashMap<>(inherited);
        Ldr table = null;
        for (Ldr r : block.records()) {
            if (STRUCTURE.contains(r.label())) {
                if (!r.label().equals("END")) {
                    if (table != null) {
                        throw new ImportException(source, r.line(), "##" + r.rawLabel(),
                                "a second data table in the block (first at line " + table.line() + ")");
                    }
                    table = r;
                }
            } else if (!r.label().isEmpty()) {
                metadata.putIfAbsent(r.rawLabel(), r.fullValue());
            }
        }
        if (table == null) {
            throw new ImportException(source, block.startLine(), "##XYDATA",
                    "the block holds no ##XYDATA, ##XYPOINTS or ##PEAK TABLE");
        }
        Ldr dataType = block.find("DATATYPE");
        boolean interferogram = dataType != null
                && dataType.fullValue().toUpperCase(Locale.ROOT).contains("INTERFEROGRAM");
        double xFactor = optionalReal(block, "XFACTOR", 1.0);
        double yFactor = optionalReal(block, "YFACTOR", 1.0);
        Ldr xUnitsLdr = require(block, "XUNITS", "##XUNITS");
        JcampUnits.X xUnit = JcampUnits.x(xUnitsLdr.fullValue());
        if (xUnit == null) {
            throw new ImportException(source, xUnitsLdr.line(), "##" + xUnitsLdr.rawLabel(),
                    "unknown unit '" + xUnitsLdr.fullValue() + "'");
        }
        double[] y;
        String form = squeeze(table.value());
        if (table.label().equals("XYDATA")) {
            if (!form.equals("(X++(Y..Y))")) {
                throw new ImportException(source, table.line(), "##" + table.rawLabel(),
                        "unsupported variable list '" + table.value() + "' (expected (X++(Y..Y)))");
            }
            Ldr nLdr = require(block, "NPOINTS", "##NPOINTS");
            int n = (int) integer(nLdr, 1, maxPoints);
            double firstX = real(require(block, "FIRSTX", "##FIRSTX"));
            double lastX = real(require(block, "LASTX", "##LASTX"));
            double deltaX = step(block, firstX, lastX, n);
            y = XyDataTable.decode(table, source, firstX, deltaX, xFactor, n);
            if (interferogram) {
                return interferogram(block, y, yFactor, xUnit, xUnitsLdr, deltaX, metadata, table);
            }
            SpectralAxis axis = axis(xUnit, xUnitsLdr, firstX, deltaX, n, metadata);
            return spectrum(block, axis, y, yFactor, metadata, table);
        }
        if (!form.equals("(XY..XY)")) {
            throw new ImportException(source, table.line(), "##" + table.rawLabel(),
                    "unsupported variable list '" + table.value() + "' (expected (XY..XY))");
        }
        AffnTable.Pairs pairs = AffnTable.decode(table, source, maxPoints);
        Ldr nLdr = block.find("NPOINTS");
        if (nLdr != null && integer(nLdr, 1, maxPoints) != pairs.x().length) {
            throw new ImportException(source, nLdr.line(), "##" + nLdr.rawLabel(), "declares "
                    + nLdr.fullValue() + " points but the table holds " + pairs.x().length);
        }
        if (interferogram) {
            throw new ImportException(source, table.line(), "##" + table.rawLabel(),
                    "an interferogram must be stored as ##XYDATA=(X++(Y..Y))");
        }
        double[] x = pairs.x();
        for (int i = 0; i < x.length; i++) {
            x[i] *= xFactor;
        }
        SpectralAxis axis;
        try {
            axis = SpectralAxis.of(axisUnit(xUnit, xUnitsLdr), toMicrometresIfNanometres(xUnit, x, metadata));
        } catch (IllegalArgumentException e) {
            int line = pairs.lines()[Math.min(x.length - 1, indexIn(e.getMessage()))];
            throw new ImportException(source, line, "##" + table.rawLabel() + " X", e.getMessage());
        }
        return spectrum(block, axis, pairs.y(), yFactor, metadata, table);
    }

    private ImportedRecord spectrum(Block block, SpectralAxis axis, double[] y, double yFactor,
            Map<String, String> metadata, Ldr table) throws ImportException {
        Ldr yUnits = require(block, "YUNITS", "##YUNITS");
        Ordinate ordinate = JcampUnits.y(yUnits.fullValue());
        if (ordinate == null) {
            throw new ImportException(source, yUnits.line(), "##" + yUnits.rawLabel(),
                    "unknown unit '" + yUnits.fullValue() + "'");
        }
        return new ImportedSpectrum(new Spectrum(axis, scale(y, yFactor, table), ordinate), metadata,
                block.startLine(), block.endLine());
    }

    private ImportedRecord interferogram(Block block, double[] y, double yFactor, JcampUnits.X xUnit, Ldr xUnits,
            double deltaX, Map<String, String> metadata, Ldr table) throws ImportException {
        if (y.length < 2) {
            throw new ImportException(source, table.line(), "##NPOINTS", "an interferogram needs at least 2 points");
        }
        Ldr laserLdr = block.find(Labels.normalise(LASER_LABEL));
        Ldr intervalLdr = block.find(Labels.normalise(SAMPLING_LABEL));
        double laser;
        int interval;
        if (xUnit == JcampUnits.X.CENTIMETRE) {
            // the abscissa is optical path difference: its step fixes the sampling
            double spacing = Math.abs(deltaX);
            if (laserLdr == null) {
                laser = 1.0 / spacing;
                interval = 1;
            } else {
                laser = positive(laserLdr);
                double fringes = laser * spacing;
                interval = (int) Math.round(fringes);
                if (interval < 1 || Math.abs(fringes - interval) > 0.01) {
                    throw new ImportException(source, laserLdr.line(), "##" + laserLdr.rawLabel(), "step "
                            + spacing + " cm is not a whole number of laser fringes (" + fringes + ")");
                }
            }
        } else if (xUnit == JcampUnits.X.POINTS) {
            if (laserLdr == null) {
                laser = HENE_WAVENUMBER;
                metadata.put(LASER_ASSUMED_KEY, "true");
            } else {
                laser = positive(laserLdr);
            }
            interval = intervalLdr == null ? 1 : (int) integer(intervalLdr, 1, 1 << 20);
        } else {
            throw new ImportException(source, xUnits.line(), "##" + xUnits.rawLabel(), "unit '"
                    + xUnits.fullValue() + "' is not one of an interferogram (POINTS or CM)");
        }
        return new ImportedInterferogram(new Interferogram(scale(y, yFactor, table), laser, interval), metadata,
                block.startLine(), block.endLine());
    }

    private double[] scale(double[] y, double yFactor, Ldr table) throws ImportException {
        double[] out = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            out[i] = y[i] * yFactor;
            if (!Double.isFinite(out[i])) {
                throw new ImportException(source, table.line(), "##YFACTOR",
                        "ordinate " + (i + 1) + " times YFACTOR is not finite");
            }
        }
        return out;
    }

    private SpectralAxis axis(JcampUnits.X xUnit, Ldr xUnits, double firstX, double deltaX, int n,
            Map<String, String> metadata) throws ImportException {
        AxisUnit unit = axisUnit(xUnit, xUnits);
        if (xUnit == JcampUnits.X.NANOMETRE) {
            metadata.put("axis converted from", "NANOMETERS");
            return SpectralAxis.uniform(unit, firstX / 1000.0, n == 1 ? 1.0 : deltaX / 1000.0, n);
        }
        return SpectralAxis.uniform(unit, firstX, n == 1 ? 1.0 : deltaX, n);
    }

    private static double[] toMicrometresIfNanometres(JcampUnits.X xUnit, double[] x, Map<String, String> metadata) {
        if (xUnit != JcampUnits.X.NANOMETRE) {
            return x;
        }
        metadata.put("axis converted from", "NANOMETERS");
        double[] um = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            um[i] = x[i] / 1000.0;
        }
        return um;
    }

    private AxisUnit axisUnit(JcampUnits.X xUnit, Ldr xUnits) throws ImportException {
        return switch (xUnit) {
            case WAVENUMBER -> AxisUnit.WAVENUMBER;
            case MICROMETRE, NANOMETRE -> AxisUnit.MICROMETRE;
            case POINTS, CENTIMETRE -> throw new ImportException(source, xUnits.line(), "##" + xUnits.rawLabel(),
                    "unit '" + xUnits.fullValue() + "' belongs to interferograms but ##DATA TYPE is not INTERFEROGRAM");
        };
    }

    /** The abscissa step; ##DELTAX when it agrees with FIRSTX, LASTX and NPOINTS, else an error. */
    private double step(Block block, double firstX, double lastX, int n) throws ImportException {
        Ldr deltaLdr = block.find("DELTAX");
        if (n == 1) {
            if (firstX != lastX) {
                Ldr last = block.find("LASTX");
                throw new ImportException(source, last.line(), "##" + last.rawLabel(),
                        "one point but ##FIRSTX " + firstX + " differs from ##LASTX " + lastX);
            }
            return deltaLdr == null ? 1.0 : real(deltaLdr);
        }
        double computed = (lastX - firstX) / (n - 1);
        if (!Double.isFinite(computed)) {
            Ldr last = block.find("LASTX");
            throw new ImportException(source, last.line(), "##" + last.rawLabel(),
                    "the span from ##FIRSTX to ##LASTX exceeds the range of numbers");
        }
        if (computed == 0) {
            Ldr last = block.find("LASTX");
            throw new ImportException(source, last.line(), "##" + last.rawLabel(),
                    "equals ##FIRSTX, so the axis is not monotonic");
        }
        if (deltaLdr == null) {
            return computed;
        }
        double declared = real(deltaLdr);
        if (!(Math.abs(declared - computed) <= DELTAX_TOLERANCE * Math.abs(computed))) {
            throw new ImportException(source, deltaLdr.line(), "##" + deltaLdr.rawLabel(), "is " + declared
                    + " but (LASTX-FIRSTX)/(NPOINTS-1) = " + computed + "; FIRSTX, LASTX, DELTAX and NPOINTS"
                    + " disagree beyond a relative " + DELTAX_TOLERANCE);
        }
        // keep a DELTAX that reproduces LASTX to rounding, else the endpoints are the better information
        return Math.abs(firstX + (n - 1) * declared - lastX) <= 1e-9 * Math.abs(lastX - firstX) ? declared : computed;
    }

    private Ldr require(Block block, String label, String field) throws ImportException {
        Ldr r = block.find(label);
        if (r == null) {
            throw new ImportException(source, block.startLine(), field, "required label is missing");
        }
        return r;
    }

    private double optionalReal(Block block, String label, double fallback) throws ImportException {
        Ldr r = block.find(label);
        if (r == null) {
            return fallback;
        }
        double v = real(r);
        if (v == 0) {
            throw new ImportException(source, r.line(), "##" + r.rawLabel(), "must not be zero");
        }
        return v;
    }

    private double positive(Ldr r) throws ImportException {
        double v = real(r);
        if (!(v > 0)) {
            throw new ImportException(source, r.line(), "##" + r.rawLabel(), "must be positive, was " + v);
        }
        return v;
    }

    private double real(Ldr r) throws ImportException {
        String text = r.fullValue().trim();
        Double v = Numbers.parseDecimal(text);
        if (v == null || !Double.isFinite(v)) {
            throw new ImportException(source, r.line(), "##" + r.rawLabel(), "not a finite number: '"
                    + Numbers.shown(text) + "'");
        }
        return v;
    }

    private long integer(Ldr r, long min, long max) throws ImportException {
        String text = r.fullValue().trim();
        long v;
        try {
            v = Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw new ImportException(source, r.line(), "##" + r.rawLabel(), "not an integer: '" + Numbers.shown(text) + "'");
        }
        if (v < min || v > max) {
            throw new ImportException(source, r.line(), "##" + r.rawLabel(), v + " lies outside " + min + ".." + max);
        }
        return v;
    }

    private static String squeeze(String s) {
        return s.replace(" ", "").toUpperCase(Locale.ROOT);
    }

    /** The index named in a SpectralAxis message ("... at index 7 ..."), 0 when absent. */
    private static int indexIn(String message) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("index (\\d+)").matcher(message);
        return m.find() ? Integer.parseInt(m.group(1)) : 0;
    }
}
