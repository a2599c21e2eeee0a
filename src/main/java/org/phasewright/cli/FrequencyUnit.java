package org.phasewright.cli;

/**
 * The units a frequency may be written in on the command line, each with its factor to hertz.
 * A period is the odd one out: its number is a time, and the frequency is its reciprocal.
 */
enum FrequencyUnit {
    HERTZ("Hz", 1.0),
    KILOHERTZ("kHz", 1000.0),
    RPM("rpm", 1.0 / 60),
    PER_SECOND("/s", 1.0),
    PER_MINUTE("/min", 1.0 / 60),
    PER_HOUR("/h", 1.0 / 3600),
    PER_DAY("/day", 1.0 / TimeUnitWord.DAY_S),
    PER_WEEK("/week", 1.0 / (7 * TimeUnitWord.DAY_S)),
    PER_YEAR("/year", 1.0 / TimeUnitWord.YEAR_S),
    DEGREES_PER_SECOND("deg/s", 1.0 / 360),
    DEGREES_PER_HOUR("deg/h", 1.0 / 360 / 3600),
    DEGREES_PER_DAY("deg/day", 1.0 / 360 / TimeUnitWord.DAY_S),
    RADIANS_PER_SECOND("rad/s", 1.0 / (2 * Math.PI)),
    PERIOD("period", Double.NaN);

    private final String symbol;
    private final double toHertz;

    FrequencyUnit(String symbol, double toHertz) {
        this.symbol = symbol;
        this.toHertz = toHertz;
    }

    /** How the unit is printed after a number, e.g. {@code rpm} or {@code /day}. */
    String symbol() {
        return symbol;
    }

    /** Hertz per one of this unit; NaN for {@link #PERIOD}. */
    double toHertz() {
        return toHertz;
    }
}
