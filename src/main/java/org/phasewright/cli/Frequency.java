package org.phasewright.cli;

import java.util.Locale;

/**
 * A frequency as the user wrote it: the number, its unit, and its value in hertz. Harmonics keep
 * the user's unit ({@code 1485rpm} times 2 is {@code 2970 rpm}; {@code period:12h} times 2 is
 * {@code period 6 h}), so tables can show both the user's figure and hertz.
 *
 * @param value   the number in the user's unit (for a period: the period in {@code periodUnit})
 * @param unit    the unit
 * @param periodUnit for a period, the canonical time unit word ("h", "day", ...); else null
 * @param hertz   the frequency in hertz
 */
record Frequency(double value, FrequencyUnit unit, String periodUnit, double hertz) {

    static Frequency hertz(double hz) {
        return new Frequency(hz, FrequencyUnit.HERTZ, null, hz);
    }

    /** The k-th harmonic, in the same unit. */
    Frequency times(int k) {
        if (unit == FrequencyUnit.PERIOD) {
            return new Frequency(value / k, unit, periodUnit, hertz * k);
        }
        return new Frequency(value * k, unit, periodUnit, hertz * k);
    }

    /** The frequency {@code hz} as a number in this frequency's unit (for a period: the period in its time unit). */
    double inUnit(double hz) {
        if (unit == FrequencyUnit.PERIOD) {
            return 1 / (hz * TimeUnitWord.seconds(periodUnit));
        }
        return hz / unit.toHertz();
    }

    /**
     * A standard error {@code seHz} of the frequency {@code hz}, in this frequency's unit: scaled by the
     * unit's factor, or for a period by the derivative of 1/f (P se / f, first order).
     */
    double uncertaintyInUnit(double hz, double seHz) {
        return Math.abs(inUnit(hz)) * seHz / hz;
    }

    /**
     * The frequency {@code hz} (for instance a refined one) in this frequency's unit, its number rounded
     * to the decimals that show two significant digits of its standard error {@code seHz} (all digits
     * when the error is not a positive number). The hertz value is kept exactly.
     */
    Frequency at(double hz, double seHz) {
        double v = inUnit(hz);
        double se = uncertaintyInUnit(hz, seHz);
        if (se > 0 && Double.isFinite(se)) {
            v = new java.math.BigDecimal(v).setScale(Numbers.placesFor(se), java.math.RoundingMode.HALF_EVEN).doubleValue();
        }
        return new Frequency(v, unit, periodUnit, hz);
    }

    /** True when the user wrote plain hertz, so a second column in their unit adds nothing. */
    boolean isHertz() {
        return unit == FrequencyUnit.HERTZ;
    }

    /** The figure in the user's unit, e.g. {@code 1485 rpm}, {@code 2 /day}, {@code period 12.42 h}. */
    String display() {
        if (unit == FrequencyUnit.PERIOD) {
            return "period " + number(value) + " " + periodUnit;
        }
        return number(value) + " " + unit.symbol();
    }

    static String number(double v) {
        String s = String.format(Locale.ROOT, "%.10g", v);
        int e = s.indexOf('e');
        if (e >= 0) {
            String mantissa = s.substring(0, e);
            if (mantissa.contains(".")) {
                mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
            return mantissa + s.substring(e);
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "");
            if (s.endsWith(".")) {
                s = s.substring(0, s.length() - 1);
            }
        }
        return s;
    }
}
