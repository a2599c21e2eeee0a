package org.phasewright.cli;

import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.phasewright.series.Series;

/**
 * A moment on a record's time axis as written on the command line: seconds from the record's time
 * zero ({@code 600}, {@code 600s}), a number with a time unit ({@code 90min}, {@code 8.25d}), or
 * an ISO 8601 date-time ({@code 2026-04-14T06:00:00Z}; one without an offset is read as UTC),
 * which needs a record with timestamps.
 *
 * @param text    what the user wrote
 * @param seconds seconds from time zero, or NaN when {@code instant} is set
 * @param instant the wall-clock moment, or null
 */
record TimePoint(String text, double seconds, Instant instant) {

    private static final Pattern NUMBER_UNIT = Pattern.compile(
            "([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*([a-zA-Z]*)");

    static TimePoint parse(String text) {
        String s = text.trim();
        Matcher m = NUMBER_UNIT.matcher(s);
        if (m.matches()) {
            double v = Double.parseDouble(m.group(1));
            String word = m.group(2);
            double unit = word.isEmpty() ? 1 : TimeUnitWord.seconds(word);
            if (Double.isNaN(unit)) {
                throw new IllegalArgumentException("'" + text + "' is not a time: '" + word
                        + "' is not a time unit (use " + TimeUnitWord.known() + ")");
            }
            return new TimePoint(text, v * unit, null);
        }
        try {
            return new TimePoint(text, Double.NaN, Instant.parse(s));
        } catch (DateTimeParseException e) {
            try {
                return new TimePoint(text, Double.NaN, LocalDateTime.parse(s).toInstant(ZoneOffset.UTC));
            } catch (DateTimeParseException e2) {
                throw new IllegalArgumentException("'" + text + "' is not a time: write seconds from the start (600),"
                        + " a number with a unit (90min, 8.25d) or an ISO date-time (2026-04-14T06:00:00Z)");
            }
        }
    }

    /** Seconds on the series' time axis; an ISO date-time needs the series to carry timestamps. */
    double secondsIn(Series series, String where) {
        if (instant == null) {
            return seconds;
        }
        Instant origin = series.origin().orElseThrow(() -> new InputProblem(where
                + " has no timestamps, so " + text + " cannot be placed on its time axis; give the time in seconds"
                + " from the start instead"));
        double s = (instant.getEpochSecond() - origin.getEpochSecond()) + (instant.getNano() - origin.getNano()) * 1e-9;
        return s;
    }

    @Override
    public String toString() {
        return text.toLowerCase(Locale.ROOT);
    }
}
