package org.phasewright.io.read;

import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;

/**
 * Parses ISO-8601 date-times as loggers write them: {@code 2026-03-01T12:00:00.125Z},
 * {@code 2026-03-01T12:00:00+01:00}, {@code 2026-03-01 12:00:00} (space instead of T, as RFC 3339
 * allows), offsets {@code Z}, {@code +hh}, {@code +hhmm}, {@code +hh:mm}, and plain dates
 * {@code 2026-03-01} (midnight). A time without an offset is read in the zone given to the
 * reader (UTC unless the user names another).
 */
final class TimestampCells {

    private TimestampCells() {
    }

    /** Result of parsing: the instant, and whether the text carried its own offset. */
    record Parsed(Instant instant, boolean hadOffset) {
    }

    /** Parses a trimmed cell, or returns null when it is not an ISO-8601 date or date-time. */
    static Parsed parse(String s, ZoneId zoneForLocal) {
        if (s.length() < 10 || s.charAt(4) != '-' || s.charAt(7) != '-') {
            return null;
        }
        try {
            if (s.length() == 10) {
                return new Parsed(LocalDate.parse(s).atStartOfDay(zoneForLocal).toInstant(), false);
            }
            char sep = s.charAt(10);
            if (sep != 'T' && sep != 't' && sep != ' ') {
                return null;
            }
            String text = sep == 'T' ? s : s.substring(0, 10) + 'T' + s.substring(11);
            int offsetAt = offsetStart(text);
            if (offsetAt < 0) {
                return new Parsed(LocalDateTime.parse(text).atZone(zoneForLocal).toInstant(), false);
            }
            LocalDateTime local = LocalDateTime.parse(text.substring(0, offsetAt));
            String off = text.substring(offsetAt).trim();
            ZoneOffset offset = off.equalsIgnoreCase("z") ? ZoneOffset.UTC : ZoneOffset.of(off);
            return new Parsed(local.toInstant(offset), true);
        } catch (DateTimeParseException | IllegalArgumentException e) {
            return null;
        }
    }

    /** Index where the offset begins (Z, + or - after the time of day), or -1. */
    private static int offsetStart(String text) {
        for (int i = text.length() - 1; i > 11; i--) {
            char c = text.charAt(i);
            if (c == 'Z' || c == 'z' || c == '+' || c == '-') {
                return i;
            }
        }
        return -1;
    }
}
