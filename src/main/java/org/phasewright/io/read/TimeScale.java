package org.phasewright.io.read;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * The unit of a numeric time column; readers convert every time to seconds by multiplying by
 * {@link #seconds()}. A year is the Julian year of 365.25 days (the astronomical convention, as
 * used for the light-year), a day is 86 400 s (no leap seconds).
 */
public enum TimeScale {
    SECONDS("s", 1.0),
    MILLISECONDS("ms", 1e-3),
    MINUTES("min", 60.0),
    HOURS("h", 3600.0),
    DAYS("day", 86_400.0),
    YEARS("year", 365.25 * 86_400.0);

    private final String symbol;
    private final double seconds;

    TimeScale(String symbol, double seconds) {
        this.symbol = symbol;
        this.seconds = seconds;
    }

    /** The short name a user types: s, ms, min, h, day, year. */
    public String symbol() {
        return symbol;
    }

    /** Seconds in one unit. */
    public double seconds() {
        return seconds;
    }

    /** Reads s, ms, min, h, day or year (also sec, hour, d, days, yr, years), ignoring case. */
    public static TimeScale parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        switch (t) {
            case "s": case "sec": case "second": case "seconds": return SECONDS;
            case "ms": case "millisecond": case "milliseconds": return MILLISECONDS;
            case "min": case "minute": case "minutes": return MINUTES;
            case "h": case "hour": case "hours": return HOURS;
            case "d": case "day": case "days": return DAYS;
            case "yr": case "year": case "years": return YEARS;
            default:
                throw new IllegalArgumentException("unknown time unit '" + text + "'; use one of "
                        + Arrays.stream(values()).map(TimeScale::symbol).collect(Collectors.joining(", ")));
        }
    }
}
