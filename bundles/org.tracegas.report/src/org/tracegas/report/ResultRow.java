package org.tracegas.report;

import java.time.Instant;
import java.util.List;
import java.util.OptionalDouble;

import org.tracegas.qa.basis.LimitStatus;
import org.tracegas.report.internal.Check;

/**
 * One averaged result on the reporting basis.
 *
 * @param compound            compound
 * @param period              averaging period label, for example "30 min"
 * @param periodStart         start of the averaging period
 * @param value               concentration on the reporting basis
 * @param expandedUncertainty expanded uncertainty U (k = 2) in the same unit
 * @param unit                unit, for example "mg/m³"
 * @param flags               data flags, for example "invalid: 70 % data", "O2 guard"
 * @param limit               the client's limit for this compound and period, if any
 * @param status              how the value stands against the limit: no limit, not assessed (the period lacks the
 *                            data its validity rule asks for), within, or exceeded
 * @param cellCorrection      the correction to the sample cell applied to the period's values, its factor and
 *                            where the cell's conditions came from (for example "x1.0012 (T header, p header,
 *                            path nominal); F 2.378"), empty when the row states none; the report states it once
 *                            for its table, the export for each row
 */
public record ResultRow(String compound, String period, Instant periodStart, double value, double expandedUncertainty,
        String unit, List<String> flags, OptionalDouble limit, LimitStatus status, String cellCorrection) {

    /**
     * Start of the flag of a value below its compound's method detection limit: the report's table shows the
     * value as this text, the CSV export keeps the value with the flag.
     */
    public static final String BELOW_MDL = "< MDL";

    public ResultRow {
        Check.text("compound", compound);
        Check.text("period", period);
        Check.notNull("periodStart", periodStart);
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value of " + compound + " at " + periodStart + " is not finite");
        }
        if (!(expandedUncertainty >= 0 && Double.isFinite(expandedUncertainty))) {
            throw new IllegalArgumentException("expandedUncertainty of " + compound + " at " + periodStart
                    + " must be non-negative and finite, was " + expandedUncertainty);
        }
        Check.notNull("unit", unit);
        flags = Check.list("flags", flags);
        Check.notNull("limit", limit);
        Check.notNull("status", status);
        Check.notNull("cellCorrection", cellCorrection);
        if ((status == LimitStatus.NO_LIMIT) != limit.isEmpty()) {
            throw new IllegalArgumentException("result of " + compound + " at " + periodStart + " has status "
                    + status + (limit.isEmpty() ? " but no limit" : " but a limit"));
        }
    }

    /** A row that states no cell correction. */
    public ResultRow(String compound, String period, Instant periodStart, double value, double expandedUncertainty,
            String unit, List<String> flags, OptionalDouble limit, LimitStatus status) {
        this(compound, period, periodStart, value, expandedUncertainty, unit, flags, limit, status, "");
    }

    /** Whether the value lies below its compound's method detection limit (a flag starting {@link #BELOW_MDL}). */
    public boolean belowMethodDetectionLimit() {
        return flags.stream().anyMatch(f -> f.startsWith(BELOW_MDL));
    }
}
