package org.phasewright.demo;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Fixed-point decimal text for demo files: the exact binary value rounded half-even to a fixed
 * number of places, never in exponent form, never "-0". Cost: one BigDecimal per number.
 */
final class Decimals {

    private Decimals() {
    }

    static String fixed(double x, int places) {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException("demo values must be finite, got " + x);
        }
        return new BigDecimal(x).setScale(places, RoundingMode.HALF_EVEN).toPlainString();
    }

    /** {@code x} rounded to {@code places} decimals, as the number a reader gets back from {@link #fixed}. */
    static double rounded(double x, int places) {
        return Double.parseDouble(fixed(x, places));
    }
}
