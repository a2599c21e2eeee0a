package org.phasewright.cli;

import java.util.Locale;

/**
 * A unit to show frequencies in besides hertz ({@code --unit} of survey): any unit of the
 * frequency syntax ({@code rpm}, {@code /day}, {@code deg/h}, {@code khz}), or {@code period:h}
 * (and other time words) to show the period instead.
 *
 * @param text         as written
 * @param hertzPerUnit hertz in one unit; NaN for a period
 * @param periodSeconds seconds in one unit of period; NaN otherwise
 * @param symbol       printed after the number
 */
record DisplayUnit(String text, double hertzPerUnit, double periodSeconds, String symbol) {

    static DisplayUnit parse(String text) {
        String s = text.trim().toLowerCase(Locale.ROOT);
        if (s.startsWith("period:")) {
            String word = s.substring("period:".length()).trim();
            double sec = TimeUnitWord.seconds(word);
            if (Double.isNaN(sec)) {
                throw new IllegalArgumentException("'" + text + "' is not a unit: '" + word + "' is not a time unit (use "
                        + TimeUnitWord.known() + ")");
            }
            return new DisplayUnit(text, Double.NaN, sec, TimeUnitWord.canonical(word) + " period");
        }
        Frequency one;
        try {
            one = FrequencyParser.parse("1" + s);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("'" + text + "' is not a unit; write e.g. hz, rpm, /day, deg/h or period:h");
        }
        return new DisplayUnit(text, one.hertz(), Double.NaN, one.unit().symbol());
    }

    /** The frequency {@code hz} in this unit, e.g. {@code 1485 rpm} or {@code 12.42 h period}. */
    String show(double hz) {
        double v = Double.isNaN(periodSeconds) ? hz / hertzPerUnit : 1 / (hz * periodSeconds);
        return Frequency.number(Double.parseDouble(String.format(Locale.ROOT, "%.7g", v))) + " " + symbol;
    }
}
