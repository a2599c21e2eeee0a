package org.phasewright.cli;

import java.util.Locale;
import java.util.Map;

/**
 * The time units the command line understands after a number ({@code 12.42h}, {@code 90min},
 * {@code 8.25d}), with their length in seconds. A day is 86 400 s; a year is the Julian year of
 * 365.25 days (common practice for seasonal cycles).
 */
final class TimeUnitWord {
    static final double DAY_S = 86_400.0;
    static final double YEAR_S = 365.25 * DAY_S;

    private static final Map<String, Double> SECONDS = Map.ofEntries(
            Map.entry("ms", 1e-3),
            Map.entry("s", 1.0), Map.entry("sec", 1.0), Map.entry("second", 1.0), Map.entry("seconds", 1.0),
            Map.entry("min", 60.0), Map.entry("minute", 60.0), Map.entry("minutes", 60.0),
            Map.entry("h", 3600.0), Map.entry("hr", 3600.0), Map.entry("hour", 3600.0), Map.entry("hours", 3600.0),
            Map.entry("d", DAY_S), Map.entry("day", DAY_S), Map.entry("days", DAY_S),
            Map.entry("week", 7 * DAY_S), Map.entry("weeks", 7 * DAY_S),
            Map.entry("year", YEAR_S), Map.entry("years", YEAR_S), Map.entry("yr", YEAR_S));

    /** The canonical word printed for each length. */
    private static final Map<Double, String> CANONICAL = Map.of(
            1e-3, "ms", 1.0, "s", 60.0, "min", 3600.0, "h", DAY_S, "day", 7 * DAY_S, "week", YEAR_S, "year");

    private TimeUnitWord() {
    }

    /** Seconds in one {@code word}, or NaN when the word is not a time unit. */
    static double seconds(String word) {
        Double s = SECONDS.get(word.toLowerCase(Locale.ROOT));
        return s == null ? Double.NaN : s;
    }

    /** The canonical spelling of the unit {@code word} (e.g. "hours" gives "h"). */
    static String canonical(String word) {
        return CANONICAL.get(seconds(word));
    }

    static String known() {
        return "ms, s, min, h, day, week, year";
    }
}
