package org.tracegas.ui.chart;

import java.text.FieldPosition;
import java.text.Format;
import java.text.ParsePosition;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.MonthDay;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;

/**
 * Tick labels and readouts of a time axis whose values count hours from a start: the clock time in UTC (the
 * time base of stored measurements), with the day in front when the period shown spans more than one day and
 * with the seconds when it spans less than half an hour.
 */
public final class ClockTime extends Format {

    private static final long serialVersionUID = 1L;
    private static final DateTimeFormatter MONTH_DAY = DateTimeFormatter.ofPattern("MM-dd");
    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("yyyy-MM-dd").withZone(ZoneOffset.UTC);

    private final Instant start;
    private final DateTimeFormatter pattern;

    /**
     * @param start the instant hour 0 stands for
     * @param spanHours the length of the period shown, which decides whether ticks carry the day
     */
    public ClockTime(Instant start, double spanHours) {
        if (start == null) {
            throw new IllegalArgumentException("start must not be null");
        }
        this.start = start;
        // a few minutes of one-minute samples need the seconds to tell ticks apart; more than a day the date
        this.pattern = DateTimeFormatter.ofPattern(spanHours > 24 ? "MM-dd HH:mm"
                : spanHours < 0.5 ? "HH:mm:ss" : "HH:mm").withZone(ZoneOffset.UTC);
    }

    /** The instant of a value in hours from the start. */
    public Instant at(double hours) {
        return start.plus(Duration.ofMillis(Math.round(hours * 3.6e6)));
    }

    /** The axis title: "Time (UTC) on 2026-07-14" or "Time (UTC), 2026-07-14 to 2026-07-15". */
    public String axisTitle(double lastHours) {
        String first = DAY.format(start);
        String last = DAY.format(at(lastHours));
        return first.equals(last) ? "Time (UTC) on " + first : "Time (UTC), " + first + " to " + last;
    }

    /** The time of a value with its date, for readouts: "2026-07-14 06:03 UTC". */
    public String full(double hours) {
        return DAY.format(at(hours)) + " " + DateTimeFormatter.ofPattern("HH:mm").withZone(ZoneOffset.UTC)
                .format(at(hours)) + " UTC";
    }

    @Override
    public StringBuffer format(Object hours, StringBuffer to, FieldPosition pos) {
        return to.append(pattern.format(at(((Number) hours).doubleValue())));
    }

    /**
     * Reads a label back into hours from the start (the chart does so to tell ticks apart): a clock time is
     * taken on the start's day, or the next day when it lies before the start; a label with the day in the
     * start's year. Returns null and sets the error index when the text is no such label.
     */
    @Override
    public Object parseObject(String source, ParsePosition pos) {
        String text = source.substring(pos.getIndex()).strip();
        try {
            LocalDateTime startTime = LocalDateTime.ofInstant(start, ZoneOffset.UTC);
            LocalDateTime at;
            if (text.indexOf('-') > 0) {
                at = MonthDay.parse(text.substring(0, 5), MONTH_DAY).atYear(startTime.getYear())
                        .atTime(LocalTime.parse(text.substring(6)));
            } else {
                at = startTime.toLocalDate().atTime(LocalTime.parse(text));
                if (at.isBefore(startTime.withSecond(0).withNano(0))) {
                    at = at.plusDays(1);
                }
            }
            pos.setIndex(source.length());
            return Duration.between(startTime, at).toMillis() / 3.6e6;
        } catch (DateTimeParseException | IndexOutOfBoundsException e) {
            pos.setErrorIndex(pos.getIndex());
            return null;
        }
    }
}
