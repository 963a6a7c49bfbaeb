package org.tracegas.qa.basis;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracegas.qa.internal.Require;

/**
 * The basis results are reported on: mass concentration at standard conditions, on dry gas, optionally at
 * a reference oxygen content.
 */
public final class ReportingBasis {

    private final StandardConditions conditions;
    private final OxygenCorrection oxygen; // null: no oxygen correction

    public ReportingBasis(StandardConditions conditions, OxygenCorrection oxygen) {
        this.conditions = Require.notNull("conditions", conditions);
        this.oxygen = oxygen;
    }

    public StandardConditions conditions() {
        return conditions;
    }

    public Optional<OxygenCorrection> oxygen() {
        return Optional.ofNullable(oxygen);
    }

    /** For example "mg/m³ dry, 273.15 K, 101.3 kPa, 10 % O2". */
    public String describe() {
        String base = "mg/m³ dry, " + plain(conditions.temperatureK()) + " K, " + plain(conditions.pressureKPa())
                + " kPa";
        return oxygen == null ? base : base + ", " + plain(oxygen.referencePercent()) + " % O2";
    }

    // configured values as written (273.15, 101.3), not rounded
    private static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** One reading on this basis, or empty if its O2 lies at or above the guard of the oxygen correction. */
    public Optional<TimedValue> convert(GasReading reading, double molarMassGPerMol) {
        Require.notNull("reading", reading);
        if (oxygen != null && !oxygen.canCorrect(reading.o2PercentDry())) {
            return Optional.empty();
        }
        double dry = MoistureCorrection.toDry(reading.wetPpm(), reading.h2oFraction());
        double mass = conditions.ppmToMgPerCubicMetre(dry, molarMassGPerMol);
        return Optional.of(new TimedValue(reading.time(),
                oxygen == null ? mass : oxygen.correct(mass, reading.o2PercentDry())));
    }

    /** All readings on this basis; readings rejected by the oxygen guard are left out. */
    public List<TimedValue> convertAll(List<GasReading> readings, double molarMassGPerMol) {
        Require.notNull("readings", readings);
        List<TimedValue> out = new ArrayList<>(readings.size());
        for (GasReading r : readings) {
            convert(r, molarMassGPerMol).ifPresent(out::add);
        }
        return List.copyOf(out);
    }
}
