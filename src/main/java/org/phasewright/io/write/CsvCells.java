package org.phasewright.io.write;

import java.util.Locale;

/**
 * Formats cells of the CSV files Phasewright writes. Numbers are written with
 * {@link Double#toString(double)}, the shortest decimal that reads back to the same double, so a
 * round trip is exact; gaps (NaN) are written as empty cells. Text cells that a spreadsheet
 * would take for a formula (starting with = + - @, a tab or a carriage return) are prefixed
 * with an apostrophe, the usual defence against formula injection (common practice, as
 * recommended by OWASP).
 */
public final class CsvCells {

    private CsvCells() {
    }

    /** A number cell: the shortest exact decimal, or "" for NaN. */
    public static String number(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v).toLowerCase(Locale.ROOT);
    }

    /** A text cell made safe for spreadsheets. */
    public static String label(String text) {
        if (text.isEmpty()) {
            return text;
        }
        char c = text.charAt(0);
        if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') {
            return "'" + text;
        }
        return text;
    }
}
