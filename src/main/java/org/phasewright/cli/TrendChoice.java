package org.phasewright.cli;

import java.util.Locale;
import java.util.Optional;
import org.phasewright.model.KnotPlacement;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.SplineTrend;
import org.phasewright.model.TermSpec;

/**
 * The {@code --trend} value: {@code none}, {@code poly:D} (a polynomial of degree D) or
 * {@code spline:K} (a cubic spline with K interior knots), optionally followed by
 * {@code :quantile} (knots at quantiles of the sample times instead of evenly spaced) and/or
 * {@code :natural} (linear beyond the end knots, steadier at the record's ends).
 */
final class TrendChoice {

    private TrendChoice() {
    }

    static Optional<TermSpec> parse(String text) {
        String s = text.trim().toLowerCase(Locale.ROOT);
        if (s.equals("none")) {
            return Optional.empty();
        }
        String[] parts = s.split(":");
        if (parts.length < 2) {
            throw bad(text);
        }
        int count = number(text, parts[1]);
        try {
            if (parts[0].equals("poly") && parts.length == 2) {
                return Optional.of(new PolynomialTrend(count));
            }
            if (parts[0].equals("spline")) {
                KnotPlacement placement = KnotPlacement.EVEN;
                boolean natural = false;
                for (int i = 2; i < parts.length; i++) {
                    switch (parts[i]) {
                        case "quantile" -> placement = KnotPlacement.QUANTILE;
                        case "even" -> placement = KnotPlacement.EVEN;
                        case "natural" -> natural = true;
                        default -> throw new IllegalArgumentException("'" + text + "' is not a trend: '" + parts[i]
                                + "' is neither quantile, even nor natural");
                    }
                }
                return Optional.of(new SplineTrend(count, placement, natural));
            }
        } catch (IllegalArgumentException e) {
            if (e.getMessage().startsWith("'")) {
                throw e;
            }
            throw new IllegalArgumentException("'" + text + "' is not a usable trend: " + e.getMessage());
        }
        throw bad(text);
    }

    private static int number(String text, String digits) {
        try {
            return Integer.parseInt(digits);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not a trend: '" + digits + "' is not a whole number");
        }
    }

    private static IllegalArgumentException bad(String text) {
        return new IllegalArgumentException("'" + text + "' is not a trend: write none, poly:D (e.g. poly:2) or"
                + " spline:K (e.g. spline:6, spline:6:quantile, spline:6:natural)");
    }
}
