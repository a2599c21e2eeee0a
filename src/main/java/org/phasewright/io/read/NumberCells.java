package org.phasewright.io.read;

/**
 * Strict parsing of numeric CSV cells. Accepts an optional sign, digits with one decimal
 * separator and an optional exponent ({@code 1.5}, {@code -2e-3}, {@code .5}); with
 * {@code decimalComma} the separator may also be a comma ({@code 1,5}). Missing-value tokens
 * (empty, NaN, NA, N/A, null; any case) give NaN. Infinity tokens (Inf, Infinity) and numbers
 * too large for a double are reported as infinite so that the reader can refuse them. Rejects
 * the extra forms {@link Double#parseDouble} would accept (hexadecimal, {@code 1d}, {@code 1f}).
 * Cost: one pass over the characters plus {@code Double.parseDouble}.
 */
final class NumberCells {

    /** Thrown for text that is not a number; carries no stack trace (it is caught at once). */
    static final class NotANumber extends Exception {
        NotANumber() {
            super(null, null, false, false);
        }
    }

    private static final NotANumber NOT_A_NUMBER = new NotANumber();

    private NumberCells() {
    }

    /** True for empty, NaN, NA, N/A and null (any case). */
    static boolean isMissingToken(String s) {
        int n = s.length();
        if (n == 0) {
            return true;
        }
        if (n > 4) {
            return false;
        }
        return s.equalsIgnoreCase("nan") || s.equalsIgnoreCase("na") || s.equalsIgnoreCase("n/a")
                || s.equalsIgnoreCase("null");
    }

    /** Parses a trimmed cell; NaN for missing tokens, +-Infinity for infinite ones. */
    static double parse(String s, boolean decimalComma) throws NotANumber {
        if (isMissingToken(s)) {
            return Double.NaN;
        }
        int n = s.length();
        int i = 0;
        char c0 = s.charAt(0);
        boolean negative = c0 == '-';
        if (c0 == '+' || c0 == '-') {
            i = 1;
        }
        if (isInfinityWord(s, i)) {
            return negative ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
        }
        int digits = 0;
        int separatorAt = -1;
        boolean comma = false;
        for (; i < n; i++) {
            char c = s.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
            } else if ((c == '.' || (c == ',' && decimalComma)) && separatorAt < 0) {
                separatorAt = i;
                comma = c == ',';
            } else {
                break;
            }
        }
        if (digits == 0) {
            throw NOT_A_NUMBER;
        }
        if (i < n) {
            char e = s.charAt(i);
            if (e != 'e' && e != 'E') {
                throw NOT_A_NUMBER;
            }
            i++;
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int expDigits = 0;
            for (; i < n; i++) {
                char c = s.charAt(i);
                if (c < '0' || c > '9') {
                    throw NOT_A_NUMBER;
                }
                expDigits++;
            }
            if (expDigits == 0) {
                throw NOT_A_NUMBER;
            }
        }
        String text = comma ? s.replace(',', '.') : s;
        return Double.parseDouble(text);
    }

    private static boolean isInfinityWord(String s, int from) {
        int len = s.length() - from;
        return (len == 3 && s.regionMatches(true, from, "inf", 0, 3))
                || (len == 8 && s.regionMatches(true, from, "infinity", 0, 8));
    }
}
