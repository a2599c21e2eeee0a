package org.phasewright.cli;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a frequency written on the command line. The syntax (ours):
 * <pre>
 *   50          hertz (the default unit)        50hz, 50Hz, 2.5khz
 *   1485rpm     revolutions per minute
 *   2/day       cycles per time unit            3/h, 10/min, 1/week, 1/year
 *   28.98deg/h  angular speed in degrees        15deg/s, 360deg/day
 *   314.16rad/s angular frequency in radians per second
 *   period:12.42h   one cycle takes this long   period:20ms, period:365.25day
 * </pre>
 * Units are case-insensitive; a space between the number and the unit is allowed. Time words:
 * ms, s, min, h, day (d), week, year (365.25 days). The number must be positive and finite.
 * Cost: one regular-expression match.
 */
final class FrequencyParser {

    private static final Pattern FORM = Pattern.compile(
            "([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)");

    private FrequencyParser() {
    }

    static Frequency parse(String text) {
        String s = text.trim();
        String lower = s.toLowerCase(Locale.ROOT);
        if (lower.startsWith("period:") || lower.startsWith("period=")) {
            return period(text, s.substring("period:".length()).trim());
        }
        Matcher m = FORM.matcher(s);
        if (!m.matches()) {
            throw bad(text, "it does not start with a number");
        }
        double v = positive(text, m.group(1));
        String unit = m.group(2).trim().toLowerCase(Locale.ROOT).replace(" ", "");
        FrequencyUnit u = switch (unit) {
            case "", "hz" -> FrequencyUnit.HERTZ;
            case "khz" -> FrequencyUnit.KILOHERTZ;
            case "rpm", "rev/min" -> FrequencyUnit.RPM;
            case "rad/s" -> FrequencyUnit.RADIANS_PER_SECOND;
            default -> perTime(text, unit);
        };
        return new Frequency(v, u, null, v * u.toHertz());
    }

    private static FrequencyUnit perTime(String text, String unit) {
        boolean degrees = unit.startsWith("deg/");
        if (!degrees && !unit.startsWith("/")) {
            throw bad(text, "'" + unit + "' is not a unit");
        }
        String word = unit.substring(unit.indexOf('/') + 1);
        double seconds = TimeUnitWord.seconds(word);
        if (Double.isNaN(seconds) || seconds < 1) {
            throw bad(text, "'" + word + "' is not a time unit here; use s, min, h, day, week" + (degrees ? "" : " or year"));
        }
        String canonical = TimeUnitWord.canonical(word);
        if (degrees) {
            return switch (canonical) {
                case "s" -> FrequencyUnit.DEGREES_PER_SECOND;
                case "h" -> FrequencyUnit.DEGREES_PER_HOUR;
                case "day" -> FrequencyUnit.DEGREES_PER_DAY;
                default -> throw bad(text, "angular speeds are given in deg/s, deg/h or deg/day");
            };
        }
        return switch (canonical) {
            case "s" -> FrequencyUnit.PER_SECOND;
            case "min" -> FrequencyUnit.PER_MINUTE;
            case "h" -> FrequencyUnit.PER_HOUR;
            case "day" -> FrequencyUnit.PER_DAY;
            case "week" -> FrequencyUnit.PER_WEEK;
            case "year" -> FrequencyUnit.PER_YEAR;
            default -> throw bad(text, "'" + word + "' is not a time unit");
        };
    }

    private static Frequency period(String text, String rest) {
        Matcher m = FORM.matcher(rest);
        if (!m.matches()) {
            throw bad(text, "a period is written like period:12.42h");
        }
        double v = positive(text, m.group(1));
        String word = m.group(2).trim();
        if (word.isEmpty()) {
            throw bad(text, "a period needs a time unit (" + TimeUnitWord.known() + "), e.g. period:12.42h");
        }
        double seconds = TimeUnitWord.seconds(word);
        if (Double.isNaN(seconds)) {
            throw bad(text, "'" + word + "' is not a time unit; use " + TimeUnitWord.known());
        }
        return new Frequency(v, FrequencyUnit.PERIOD, TimeUnitWord.canonical(word), 1 / (v * seconds));
    }

    private static double positive(String text, String number) {
        double v = Double.parseDouble(number);
        if (!(v > 0) || Double.isInfinite(v)) {
            throw bad(text, "a frequency must be a positive finite number");
        }
        return v;
    }

    private static IllegalArgumentException bad(String text, String why) {
        return new IllegalArgumentException("'" + text + "' is not a frequency: " + why
                + " (write e.g. 50, 50hz, 1485rpm, 2/day, 28.98deg/h or period:12.42h)");
    }
}
