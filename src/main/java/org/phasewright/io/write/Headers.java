package org.phasewright.io.write;

import java.time.Instant;

/**
 * The column-header scheme of the files Phasewright writes: a quantity, then its unit in square
 * brackets ({@code residual [A]}, {@code time [s]}); a component carries its frequency in hertz
 * after an at-sign-free "at" ({@code sinusoid at 50 Hz [A]}). Phasewright's CSV reader
 * understands the bracketed unit, so written files read back by the quantity's name.
 */
final class Headers {

    private Headers() {
    }

    static String withUnit(String quantity, String unit) {
        return unit == null || unit.isEmpty() ? quantity : quantity + " [" + unit + "]";
    }

    /** ISO-8601 instant of {@code seconds} after {@code origin}, to the nanosecond. */
    static String instantAt(Instant origin, double seconds) {
        long whole = (long) Math.floor(seconds);
        long nanos = Math.round((seconds - whole) * 1e9);
        return origin.plusSeconds(whole).plusNanos(nanos).toString();
    }
}
