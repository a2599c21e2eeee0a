package org.phasewright.cli;

import java.util.Locale;

/**
 * The {@code --harmonics} value: a whole number K (harmonics 1..K), or {@code auto} to keep adding
 * harmonics while each new one is significant ({@code auto:K} tries harmonics up to K at most;
 * plain {@code auto} up to {@link #DEFAULT_LIMIT} or the Nyquist frequency, whichever comes first).
 *
 * @param count the number of harmonics, or the highest harmonic tried when {@code grow}
 * @param grow  true for {@code auto}
 */
record HarmonicCount(int count, boolean grow) {

    /** Highest harmonic {@code auto} tries when no limit is written. */
    static final int DEFAULT_LIMIT = 50;

    static HarmonicCount parse(String text) {
        String s = text.trim().toLowerCase(Locale.ROOT);
        if (s.equals("auto")) {
            return new HarmonicCount(DEFAULT_LIMIT, true);
        }
        if (s.startsWith("auto:")) {
            return new HarmonicCount(positive(text, s.substring(5)), true);
        }
        return new HarmonicCount(positive(text, s), false);
    }

    private static int positive(String text, String number) {
        int k;
        try {
            k = Integer.parseInt(number.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not a harmonic count; write a whole number K (harmonics"
                    + " 1..K), auto (add harmonics while significant) or auto:K (at most K)");
        }
        if (k < 1) {
            throw new IllegalArgumentException("'" + text + "': the harmonic count must be at least 1");
        }
        return k;
    }
}
