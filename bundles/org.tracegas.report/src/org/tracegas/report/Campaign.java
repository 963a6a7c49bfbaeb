package org.tracegas.report;

import java.time.Instant;
import java.time.LocalDate;

import org.tracegas.report.internal.Check;

/**
 * The measurement campaign a report covers.
 *
 * @param reportId       identifier of the report
 * @param client         client the measurements were made for
 * @param plant          plant (site)
 * @param source         emission source, for example a stack
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
        Check.text("plant", plant);
        Check.text("source", source);
        Check.notNull("firstDay", firstDay);
        Check.notNull("lastDay", lastDay);
        if (lastDay.isBefore(firstDay)) {
            throw new IllegalArgumentException("lastDay " + lastDay + " lies before firstDay " + firstDay);
        }
        Check.notNull("issued", issued);
        Check.text("reportingBasis", reportingBasis);
    }
}
