package org.phasewright.io.read;

/** Splits a header such as {@code "current [A]"} or {@code "temp (degC)"} into name and unit. */
final class HeaderText {

    private HeaderText() {
    }

    /** The unit written in trailing square brackets or parentheses, or "" when none. */
    static String unit(String header) {
        String h = header.trim();
        int open = unitStart(h);
        return open < 0 ? "" : h.substring(open + 1, h.length() - 1).trim();
    }

    /** The header without a trailing unit in brackets. */
    static String withoutUnit(String header) {
        String h = header.trim();
        int open = unitStart(h);
        return open <= 0 ? h : h.substring(0, open).trim();
    }

    private static int unitStart(String h) {
        if (h.endsWith("]")) {
            return h.lastIndexOf('[');
        }
        if (h.endsWith(")")) {
            return h.lastIndexOf('(');
        }
        return -1;
    }
}
