package org.tracegas.report.campaign;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.KeyValueFile;
import org.tracegas.qa.basis.EmissionLimit;
import org.tracegas.qa.basis.OxygenCorrection;
import org.tracegas.qa.basis.ReportingBasis;
import org.tracegas.qa.basis.StandardConditions;
import org.tracegas.qa.uncertainty.FtirResultBudget;
import org.tracegas.report.Campaign;

/**
 * How to report a campaign, read from a report plan file:
 *
 * <pre>
 * report-id = R-2026-031
 * client = ...
 * plant = ...                          (optional) the site, with source; where the project names its
 * source = Line 2 stack                emission source in the workspace, that names both, and the plan
 *                                      must agree with it
 * first-day = 2026-03-17
 * last-day = 2026-03-17
 * issued = 2026-03-19T00:00:00Z        dates the PDF, so the same content gives the same file
 * standard-temperature = 273.15        K, of the reporting basis
 * standard-pressure = 101.3            kPa
 * reference-o2 = 11                    %vol dry
 * o2-guard = 20                        %vol dry at or above which no corrected value is given
 * o2-file = o2-analyzer.csv            time-stamped side channel, relative to this file
 * o2-channel = O2                      its column, %vol wet
 * o2-uncertainty = 0.2                 standard uncertainty of the O2 reading, %vol
 * water = H2O                          compound of the moisture result; or none where the method measures
 *                                      no water, with the two keys below
 * moisture = 8.5                       (with water = none) %vol of the stack gas, stated: the dry basis rests on it
 * moisture-uncertainty = 1.5           (with water = none) its standard uncertainty, %vol
 * cell-temperature = 438.15            K, for the budget of results stored without cell conditions
 * cell-pressure = 101.3                kPa
 * reference-uncertainty = 0.02         relative; path-uncertainty m, temperature-uncertainty K,
 * path-uncertainty = 0.05              pressure-uncertainty kPa: standard uncertainties of the budget
 * temperature-uncertainty = 2
 * pressure-uncertainty = 0.5
 * periods = 30 min, 1 d                averaging periods
 * example-fit = 2026-03-17T07:10:30Z CO morning upset   (optional) the stored sample and analyte to plot,
 *                                      and a caption
 * qa-plan = qa.plan                    (optional) the QA plan the checks were evaluated with, whose control
 *                                      charts the report draws again; needed when the stored checks hold charts
 *
 * [compound]                           one block per reported compound
 * name = CO
 * molar-mass = 28.010
 * limit = 100 per 30 min               (optional, repeatable) mg/m³ on the basis, per averaging period
 * </pre>
 */
public record ReportPlan(Path file, Campaign campaign, ReportingBasis basis, Path o2File, String o2Channel,
        double o2UncertaintyPercent, Moisture moisture, double cellTemperatureK, double cellPressureKPa, double referenceUncertainty,
        double pathUncertaintyM, double temperatureUncertaintyK, double pressureUncertaintyKPa,
        List<Duration> periods, Instant exampleTime, String exampleCompound, String exampleCaption,
        List<CampaignReportBuilder.Reported> reported, Path qaPlan) {

    private static final Set<String> HEAD = Set.of("report-id", "client", "plant", "source", "first-day", "last-day",
            "issued", "standard-temperature", "standard-pressure", "reference-o2", "o2-guard", "o2-file",
            "o2-channel", "o2-uncertainty", "water", "moisture", "moisture-uncertainty", "cell-temperature", "cell-pressure", "reference-uncertainty",
            "path-uncertainty", "temperature-uncertainty", "pressure-uncertainty", "periods", "example-fit", "qa-plan");

    /** The value of key water where the method measures no water. */
    public static final String NO_WATER = "none";

    public ReportPlan {
        periods = List.copyOf(periods);
        reported = List.copyOf(reported);
    }

    /** The uncertainty budget of a result at the method's path length. */
    public FtirResultBudget budget(double pathM) {
        return new FtirResultBudget(referenceUncertainty, pathM, pathUncertaintyM, temperatureUncertaintyK,
                pressureUncertaintyKPa);
    }

    /** @throws FileFormatException naming the file, line and key of the first error */
    public static ReportPlan read(Path file) throws IOException {
        KeyValueFile f = KeyValueFile.read(file);
        f.allowBlocks(Set.of("compound"));
        KeyValueFile.Section h = f.head().allow(HEAD);
        ReportingBasis basis;
        try {
            basis = new ReportingBasis(new StandardConditions(h.number("standard-temperature"),
                    h.number("standard-pressure")), new OxygenCorrection(h.number("reference-o2"),
                            h.number("o2-guard")));
        } catch (IllegalArgumentException e) {
            throw h.error(e.getMessage().startsWith("guard") ? "o2-guard" : "reference-o2", e.getMessage());
        }
        String basisText = String.format(java.util.Locale.ROOT, "mg/m³ dry gas, %s K, %s kPa, %s %% O2",
                h.text("standard-temperature"), h.text("standard-pressure"), h.text("reference-o2"));
        if (h.has("plant") != h.has("source")) {
            String missing = h.has("plant") ? "source" : "plant";
            throw h.error(missing, "is missing: a plan names the plant and the source together, or leaves both to"
                    + " the project's emission source in the workspace");
        }
        Campaign campaign;
        try {
            campaign = new Campaign(h.text("report-id"), h.text("client"), h.has("plant") ? h.text("plant") : null,
                    h.has("source") ? h.text("source") : null,
                    day(h, "first-day"), day(h, "last-day"), instant(h.value("issued")), basisText);
        } catch (IllegalArgumentException e) {
            throw h.error("report-id", e.getMessage());
        }
        List<Duration> periods = new ArrayList<>();
        for (String p : h.text("periods").split(",")) {
            periods.add(new KeyValueFile.Value(h, "periods", p.strip(), h.value("periods").line()).duration());
        }
        Instant exampleTime = null;
        String exampleCompound = null;
        String exampleCaption = null;
        if (h.has("example-fit")) {
            KeyValueFile.Value v = h.value("example-fit");
            List<String> words = v.words();
            if (words.size() < 2) {
                throw v.error("expected '<time> <compound> [caption]'");
            }
            exampleTime = instant(new KeyValueFile.Value(h, v.key(), words.get(0), v.line()));
            exampleCompound = words.get(1);
            exampleCaption = words.size() > 2 ? String.join(" ", words.subList(2, words.size())) : null;
        }
        List<CampaignReportBuilder.Reported> reported = new ArrayList<>();
        for (KeyValueFile.Section b : f.blocks("compound")) {
            b.allow(Set.of("name", "molar-mass", "limit"));
            List<EmissionLimit> limits = new ArrayList<>();
            for (KeyValueFile.Value v : b.all("limit")) {
                String[] parts = v.text().split("\\s+per\\s+");
                if (parts.length != 2) {
                    throw v.error("expected '<mg/m³> per <period>'");
                }
                double value = new KeyValueFile.Value(b, v.key(), parts[0], v.line()).number();
                Duration period = new KeyValueFile.Value(b, v.key(), parts[1], v.line()).duration();
                if (!periods.contains(period)) {
                    throw v.error("period " + parts[1] + " is not among the averaging periods");
                }
                limits.add(new EmissionLimit(b.text("name"), value, basisText, period));
            }
            if (!(b.number("molar-mass") > 0)) {
                throw b.error("molar-mass", "must be positive");
            }
            reported.add(new CampaignReportBuilder.Reported(b.text("name"), b.number("molar-mass"), limits));
        }
        if (reported.isEmpty()) {
            throw new FileFormatException(file, 0, "[compound]", "the plan reports no compound");
        }
        if (!(h.number("o2-uncertainty") >= 0)) {
            throw h.error("o2-uncertainty", "must not be negative, was " + h.number("o2-uncertainty"));
        }
        return new ReportPlan(file, campaign, basis, f.resolve(h.text("o2-file")), h.text("o2-channel"),
                h.number("o2-uncertainty"), moisture(h, file), h.number("cell-temperature"), h.number("cell-pressure"),
                h.number("reference-uncertainty"), h.number("path-uncertainty"), h.number("temperature-uncertainty"),
                h.number("pressure-uncertainty"), periods, exampleTime, exampleCompound, exampleCaption, reported,
                h.has("qa-plan") ? f.resolve(h.text("qa-plan")) : null);
    }

    /**
     * The water result named, or with {@code water = none} the moisture the plan states; a stated moisture beside a
     * measured one is refused, so that the basis has one source.
     */
    private static Moisture moisture(KeyValueFile.Section h, Path file) throws FileFormatException {
        String water = h.text("water");
        if (!NO_WATER.equals(water)) {
            for (String key : List.of("moisture", "moisture-uncertainty")) {
                if (h.has(key)) {
                    throw h.error(key, "is stated only with water = " + NO_WATER + "; the method measures " + water);
                }
            }
            return Moisture.measured(water);
        }
        double percent = h.number("moisture");
        if (!(percent >= 0 && percent < 100)) {
            throw h.error("moisture", "must lie in 0 to below 100 % vol, was " + h.text("moisture"));
        }
        double u = h.number("moisture-uncertainty");
        if (!(u >= 0 && Double.isFinite(u))) {
            throw h.error("moisture-uncertainty", "must not be negative, was " + h.text("moisture-uncertainty"));
        }
        return Moisture.stated(percent, u, "report plan " + file.getFileName()
                + ", line " + h.value("moisture").line());
    }

    private static LocalDate day(KeyValueFile.Section h, String key) throws FileFormatException {
        try {
            return LocalDate.parse(h.text(key));
        } catch (DateTimeParseException e) {
            throw h.error(key, "'" + h.text(key) + "' is not a date such as 2026-03-17");
        }
    }

    private static Instant instant(KeyValueFile.Value v) throws FileFormatException {
        try {
            return Instant.parse(v.text());
        } catch (DateTimeParseException e) {
            throw v.error("'" + v.text() + "' is not a UTC time such as 2026-03-19T00:00:00Z");
        }
    }
}
