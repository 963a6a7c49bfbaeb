package org.tracegas.report;

import java.time.Instant;
import java.time.LocalDate;

import org.tracegas.report.internal.Check;

/**
 * The measurement campaign a report covers.
 *
 * @param reportId       identifier of the report
 * @param client         client the measurements were made for
 * @param plant          plant (site); null while it is left to the workspace, where the project names its
 *                       emission source (a report's content needs it)
 * @param source         emission source, for example a stack; null as the plant is
 * @param firstDay       first measurement day
 * @param lastDay        last measurement day
 * @param issued         when the report content was issued; it dates the PDF, so that the same content gives
 *                       the same file
 * @param reportingBasis the basis results are given on, for example "mg/m³ dry, 273.15 K, 101.3 kPa, 10 % O2"
 */
public record Campaign(String reportId, String client, String plant, String source, LocalDate firstDay,
        LocalDate lastDay, Instant issued, String reportingBasis) {

    public Campaign {
        Check.text("reportId", reportId);
        Check.text("client", client);
        if (plant != null || source != null) {
            Check.text("plant", plant);
            Check.text("source", source);
        }
        Check.notNull("firstDay", firstDay);
        Check.notNull("lastDay", lastDay);
        if (lastDay.isBefore(firstDay)) {
            throw new IllegalArgumentException("lastDay " + lastDay + " lies before firstDay " + firstDay);
        }
        Check.notNull("issued", issued);
        Check.text("reportingBasis", reportingBasis);
    }

    /** Whether the plant and the source are named (else they are left to the workspace). */
    public boolean placed() {
        return plant != null;
    }

    /** The same campaign at a plant and source. */
    public Campaign at(String plant, String source) {
        return new Campaign(reportId, client, Check.text("plant", plant), Check.text("source", source), firstDay,
                lastDay, issued, reportingBasis);
    }
}
