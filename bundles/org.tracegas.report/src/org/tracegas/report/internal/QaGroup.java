package org.tracegas.report.internal;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.tracegas.report.QaLine;

/**
 * The readings of one QA check name, in the order taken: the unit the QA summary shows as one row.
 *
 * @param check    the check name all readings share
 * @param readings the readings, at least one
 */
public record QaGroup(String check, List<QaLine> readings) {

    public QaGroup {
        Check.text("check", check);
        readings = Check.list("readings", readings);
        if (readings.isEmpty()) {
            throw new IllegalArgumentException("readings of check " + check + " must not be empty");
        }
        for (int i = 0; i < readings.size(); i++) {
            if (!readings.get(i).check().equals(check)) {
                throw new IllegalArgumentException("readings entry " + i + " is of check "
                        + readings.get(i).check() + ", not " + check);
            }
        }
    }

    /** The lines grouped by check name, groups in the order of each name's first reading. */
    public static List<QaGroup> of(List<QaLine> lines) {
        Map<String, List<QaLine>> byName = new LinkedHashMap<>();
        for (QaLine l : Check.list("lines", lines)) {
            byName.computeIfAbsent(l.check(), k -> new ArrayList<>()).add(l);
        }
        List<QaGroup> groups = new ArrayList<>(byName.size());
        byName.forEach((name, readings) -> groups.add(new QaGroup(name, readings)));
        return List.copyOf(groups);
    }

    public int size() {
        return readings.size();
    }

    public boolean repeated() {
        return readings.size() > 1;
    }

    /** 1-based numbers of the failed readings within this check. */
    public List<Integer> failedNumbers() {
        List<Integer> failed = new ArrayList<>();
        for (int i = 0; i < readings.size(); i++) {
            if (!readings.get(i).passed()) {
                failed.add(i + 1);
            }
        }
        return List.copyOf(failed);
    }

    /**
     * The reading closest to or furthest beyond its limits (the first of equals), or empty when some reading's
     * measured value or limits cannot be read as numbers.
     */
    public Optional<QaLine> worst() {
        List<Double> margins = new ArrayList<>(readings.size());
        for (QaLine l : readings) {
            OptionalDouble m = LimitMargin.of(l.measured(), l.limits());
            if (m.isEmpty()) {
                return Optional.empty();
            }
            margins.add(m.getAsDouble());
        }
        int worst = 0;
        for (int i = 1; i < margins.size(); i++) {
            if (margins.get(i) > margins.get(worst)) {
                worst = i;
            }
        }
        return Optional.of(readings.get(worst));
    }

    /** Whether every reading was judged by the same rule text and source. */
    public boolean oneRule() {
        QaLine first = readings.get(0);
        return readings.stream().allMatch(l -> l.rule().equals(first.rule()) && l.source().equals(first.source()));
    }

    /** Whether every reading has the same limits text. */
    public boolean oneLimits() {
        return readings.stream().map(QaLine::limits).distinct().count() == 1;
    }
}
