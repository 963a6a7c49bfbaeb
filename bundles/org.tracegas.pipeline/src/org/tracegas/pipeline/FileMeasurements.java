package org.tracegas.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedInterferogram;
import org.tracegas.importer.ImportedRecord;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.SpectralContent;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.NewMeasurement;
import org.tracegas.store.RawFile;

/**
 * A lab's file read as measurements to store: the bytes kept whole, and each record a measurement whose kind,
 * time, title and cell conditions come from the file's labels, or from defaults the lab states when its files
 * do not carry them. Labels are found whatever their case, spacing and punctuation:
 * <ul>
 * <li>title: {@code ##TITLE}; otherwise the file name and record number;</li>
 * <li>time: {@code ##LONGDATE} ({@code yyyy/MM/dd HH:mm:ss}, JCAMP-DX 5.01, from memory), {@code ##DATE} with
 * {@code ##TIME} ({@code yy/MM/dd} and {@code HH:mm:ss}, JCAMP-DX 4.24, from memory), or an ISO-8601 instant
 * under {@code time.utc}, {@code acquired} or {@code ##$MEASURED AT}; a time without zone is read as UTC;</li>
 * <li>cell temperature: {@code ##$CELL TEMPERATURE} or {@code cell.temperature.K} in K, {@code ##TEMPERATURE}
 * in °C (JCAMP-DX 4.24, from memory);</li>
 * <li>cell pressure: {@code ##$CELL PRESSURE} or {@code cell.pressure.hPa} in hPa;</li>
 * <li>kind: {@code ##$KIND} or {@code kind}: sample, background, zero, span, spike or
 * calibration-transfer-standard;</li>
 * <li>content: values in arbitrary units are a single beam when {@code ##$CONTENT=single beam} says so.</li>
 * </ul>
 * An interferogram keeps its laser wavenumber and sampling interval as the labels {@value #LASER} and
 * {@value #SAMPLING}, so that it can be transformed later.
 */
public final class FileMeasurements {

    /** Label of an imported interferogram's laser wavenumber, cm-1. */
    public static final String LASER = "interferogram.laser-wavenumber";
    /** Label of an imported interferogram's sampling interval, in laser fringes. */
    public static final String SAMPLING = "interferogram.sampling-interval";

    private static final DateTimeFormatter LONGDATE = DateTimeFormatter.ofPattern("yyyy/MM/dd HH:mm:ss[.SSS]");
    private static final DateTimeFormatter JCAMP_DATE = DateTimeFormatter.ofPattern("yy/MM/dd");

    /**
     * What a lab states for files that do not carry a value; null where it states nothing.
     *
     * @param kind            the kind of every record without a kind label (null: sample)
     * @param time            the time of every record without a time label
     * @param cellTemperature K
     * @param cellPressure    hPa
     */
    public record Defaults(MeasurementKind kind, Instant time, Double cellTemperature, Double cellPressure) {

        /** No defaults: every record is a sample, and its file must state its time and conditions. */
        public static Defaults none() {
            return new Defaults(null, null, null, null);
        }
    }

    /** A file read whole: its bytes and its records as measurements, in file order. */
    public record Read(RawFile file, List<NewMeasurement> measurements) {

        public Read {
            measurements = List.copyOf(measurements);
        }
    }

    private FileMeasurements() {
    }

    /**
     * Reads a file with the reader that recognises it.
     *
     * @throws ImportException naming the file, the record's first line and the label when no reader recognises
     *                         the file, a record does not say what its values are, or a time or condition is
     *                         neither in the file nor among the defaults
     */
    public static Read read(ReaderRegistry readers, Path file, Defaults defaults) throws ImportException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new ImportException(file.toString(), 0, "file", "cannot be read: " + e.getMessage(), e);
        }
        ImportedData data = readers.read(file, ImportOptions.defaults());
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        List<NewMeasurement> measurements = new ArrayList<>();
        for (int i = 0; i < data.records().size(); i++) {
            measurements.add(measurement(file, name, i, data.records().get(i), defaults));
        }
        return new Read(new RawFile(name, data.format(), bytes), measurements);
    }

    private static NewMeasurement measurement(Path file, String name, int index, ImportedRecord record,
            Defaults defaults) throws ImportException {
        Map<String, String> labels = new LinkedHashMap<>(record.metadata());
        Map<String, String> byKey = new LinkedHashMap<>();
        labels.forEach((k, v) -> byKey.putIfAbsent(key(k), v.strip()));
        Where where = new Where(file.toString(), record.firstLine());
        SpectralContent content;
        Spectrum values;
        if (record instanceof ImportedSpectrum s) {
            values = s.spectrum();
            content = switch (values.ordinate()) {
                case ABSORBANCE -> SpectralContent.ABSORBANCE;
                case TRANSMITTANCE -> SpectralContent.TRANSMITTANCE;
                case SINGLE_BEAM -> SpectralContent.SINGLE_BEAM;
                case INTERFEROGRAM -> SpectralContent.INTERFEROGRAM;
                // JCAMP-DX has no unit of single beams: a file says it with a label
                case ARBITRARY -> {
                    if (!byKey.getOrDefault("CONTENT", "").toUpperCase(Locale.ROOT).replaceAll("[^A-Z]", "")
                            .equals("SINGLEBEAM")) {
                        throw where.error("##YUNITS", "the values' meaning (absorbance, transmittance, single beam)"
                                + " is not stated; label a single beam ##$CONTENT=single beam");
                    }
                    values = values.withValues(values.toArray(), Ordinate.SINGLE_BEAM);
                    yield SpectralContent.SINGLE_BEAM;
                }
            };
        } else {
            Interferogram igm = ((ImportedInterferogram) record).interferogram();
            values = new Spectrum(SpectralAxis.uniform(AxisUnit.SAMPLE_INDEX, 0, 1, igm.size()), igm.toArray(),
                    Ordinate.INTERFEROGRAM);
            content = SpectralContent.INTERFEROGRAM;
            labels.put(LASER, Double.toString(igm.laserWavenumber()));
            labels.put(SAMPLING, Integer.toString(igm.samplingInterval()));
        }
        String title = byKey.getOrDefault("TITLE", "").isBlank() ? name + " record " + (index + 1)
                : byKey.get("TITLE");
        try {
            return new NewMeasurement(kind(byKey, defaults, where), time(byKey, defaults, where),
                    temperature(byKey, defaults, where), pressure(byKey, defaults, where), title, labels, content,
                    values);
        } catch (IllegalArgumentException e) {
            throw where.error("record", e.getMessage());
        }
    }

    /** Upper case without '$' and anything but letters and digits: how labels are matched. */
    private static String key(String label) {
        return label.toUpperCase(Locale.ROOT).replaceAll("[^A-Z0-9]", "");
    }

    private static MeasurementKind kind(Map<String, String> labels, Defaults defaults, Where where)
            throws ImportException {
        String v = labels.containsKey("KIND") ? labels.get("KIND") : labels.get("MEASUREMENTKIND");
        if (v == null) {
            return defaults.kind() == null ? MeasurementKind.SAMPLE : defaults.kind();
        }
        MeasurementKind kind = MeasurementKind.getByName(v.strip().toUpperCase(Locale.ROOT).replace(' ', '_')
                .replace('-', '_'));
        if (kind == null) {
            throw where.error("kind", "'" + v + "' is none of " + MeasurementKind.VALUES);
        }
        return kind;
    }

    private static Instant time(Map<String, String> labels, Defaults defaults, Where where) throws ImportException {
        for (String k : List.of("TIMEUTC", "ACQUIRED", "MEASUREDAT")) {
            if (labels.containsKey(k)) {
                try {
                    return Instant.parse(labels.get(k));
                } catch (DateTimeException e) {
                    throw where.error(k, "'" + labels.get(k) + "' is not an ISO-8601 instant (2026-03-17T08:00:00Z)");
                }
            }
        }
        if (labels.containsKey("LONGDATE")) {
            String v = labels.get("LONGDATE");
            try {
                return LocalDateTime.parse(v, LONGDATE).toInstant(ZoneOffset.UTC);
            } catch (DateTimeException e) {
                throw where.error("##LONGDATE", "'" + v + "' is not yyyy/MM/dd HH:mm:ss");
            }
        }
        if (labels.containsKey("DATE") && labels.containsKey("TIME")) {
            try {
                return LocalDate.parse(labels.get("DATE"), JCAMP_DATE).atTime(LocalTime.parse(labels.get("TIME")))
                        .toInstant(ZoneOffset.UTC);
            } catch (DateTimeException e) {
                throw where.error("##DATE", "'" + labels.get("DATE") + " " + labels.get("TIME")
                        + "' is not yy/MM/dd with HH:mm:ss");
            }
        }
        if (defaults.time() != null) {
            return defaults.time();
        }
        throw where.error("##LONGDATE", "the record states no measurement time (##LONGDATE, ##DATE with ##TIME,"
                + " or an ISO-8601 time.utc)");
    }

    /** The labels of a cell temperature in K, as {@link #key} matches them; ##TEMPERATURE is in degrees C. */
    private static final List<String> KELVIN = List.of("CELLTEMPERATUREK", "CELLTEMPERATURE");
    private static final List<String> HECTOPASCAL = List.of("CELLPRESSUREHPA", "CELLPRESSURE");

    /** Whether a record's labels state its cell temperature; else it is the one given for files without. */
    static boolean statesTemperature(Map<String, String> labels) {
        return labels.keySet().stream().map(FileMeasurements::key)
                .anyMatch(k -> KELVIN.contains(k) || k.equals("TEMPERATURE"));
    }

    /** Whether a record's labels state its cell pressure; else it is the one given for files without. */
    static boolean statesPressure(Map<String, String> labels) {
        return labels.keySet().stream().map(FileMeasurements::key).anyMatch(HECTOPASCAL::contains);
    }

    /**
     * What a measurement was for, as its label {@value MeasurementRole#KEY} (in a JCAMP-DX file {@code ##$ROLE=})
     * states it, in lower case: a QA role such as {@value MeasurementRole#CTS}, or {@value MeasurementRole#SAMPLE}
     * when no label states one.
     */
    static String role(Map<String, String> labels) {
        return labels.entrySet().stream().filter(e -> key(e.getKey()).equals("ROLE"))
                .map(e -> e.getValue().strip().toLowerCase(Locale.ROOT)).findFirst().orElse(MeasurementRole.SAMPLE);
    }

    private static double temperature(Map<String, String> labels, Defaults defaults, Where where)
            throws ImportException {
        Double kelvin = stated(labels, KELVIN, where);
        if (kelvin == null && labels.containsKey("TEMPERATURE")) {
            kelvin = number(labels.get("TEMPERATURE"), "##TEMPERATURE", where) + 273.15;
        }
        return orDefault(kelvin, defaults.cellTemperature(), "##$CELL TEMPERATURE", "cell temperature", where);
    }

    private static double pressure(Map<String, String> labels, Defaults defaults, Where where)
            throws ImportException {
        return orDefault(stated(labels, HECTOPASCAL, where), defaults.cellPressure(),
                "##$CELL PRESSURE", "cell pressure", where);
    }

    /** The number under the first of the labels the record has, or null. */
    private static Double stated(Map<String, String> labels, List<String> keys, Where where) throws ImportException {
        for (String k : keys) {
            if (labels.containsKey(k)) {
                return number(labels.get(k), k, where);
            }
        }
        return null;
    }

    private static double orDefault(Double stated, Double byDefault, String label, String what, Where where)
            throws ImportException {
        if (stated != null) {
            return stated;
        }
        if (byDefault != null) {
            return byDefault;
        }
        throw where.error(label, "the record states no " + what + "; state it in the file or give it for files"
                + " without one");
    }

    private static double number(String value, String label, Where where) throws ImportException {
        try {
            return Double.parseDouble(value.strip().split("\\s+")[0]);
        } catch (NumberFormatException e) {
            throw where.error(label, "'" + value + "' is not a number");
        }
    }

    /** Where in the file a record starts, for errors. */
    private record Where(String file, long line) {
        ImportException error(String field, String message) {
            return new ImportException(file, line, field, message);
        }
    }
}
