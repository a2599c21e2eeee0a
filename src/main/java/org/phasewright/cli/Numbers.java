package org.phasewright.cli;

import java.util.Locale;

/**
 * How the readable reports write numbers: estimates to the precision their standard error
 * supports (two significant digits of the SE, common practice in reporting measurements),
 * statistics to four significant digits, p-values in exponent form when small, shares in percent.
 */
final class Numbers {

    private Numbers() {
    }

    /** Decimal places that show two significant digits of {@code se} (0..12). */
    static int placesFor(double se) {
        if (!(se > 0) || !Double.isFinite(se)) {
            return 4;
        }
        int p = 1 - (int) Math.floor(Math.log10(se));
        return Math.max(0, Math.min(12, p));
    }

    static String fixed(double v, int places) {
        if (Double.isNaN(v)) {
            return "n/a";
        }
        String s = String.format(Locale.ROOT, "%." + places + "f", v);
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }

    /** Four significant digits, plain where readable. */
    static String sig(double v) {
        if (Double.isNaN(v)) {
            return "n/a";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-4 || a >= 1e6)) {
            return String.format(Locale.ROOT, "%.3e", v);
        }
        return Frequency.number(Double.parseDouble(String.format(Locale.ROOT, "%.4g", v)));
    }

    /** A standard error to two significant digits, in exponent form when tiny or huge. */
    static String error(double se) {
        if (!Double.isFinite(se)) {
            return "n/a";
        }
        if (se != 0 && (Math.abs(se) < 1e-4 || Math.abs(se) >= 1e6)) {
            return String.format(Locale.ROOT, "%.1e", se);
        }
        return new java.math.BigDecimal(se).round(new java.math.MathContext(2)).toPlainString();
    }

    /**
     * A probability such as a false-alarm probability: {@code <1e-16} below what a double resolves
     * beside 1, two significant digits in exponent form below 0.001 ({@code 3.2e-9}), else three decimals.
     */
    static String probability(double p) {
        if (Double.isNaN(p)) {
            return "n/a";
        }
        if (p < 1e-16) {
            return "<1e-16";
        }
        if (p < 1e-3) {
            return String.format(Locale.ROOT, "%.1e", p).replace("e-0", "e-");
        }
        return String.format(Locale.ROOT, "%.3f", p);
    }

    static String pValue(double p) {
        if (Double.isNaN(p)) {
            return "n/a";
        }
        if (p < 1e-16) {
            return "<1e-16";
        }
        if (p < 1e-3) {
            return String.format(Locale.ROOT, "%.1e", p);
        }
        return String.format(Locale.ROOT, "%.4f", p);
    }

    /** "= 0.0123" or "< 1e-16", for p-values inside sentences. */
    static String pRelation(double p) {
        String s = pValue(p);
        return s.startsWith("<") ? "< " + s.substring(1) : "= " + s;
    }

    /** A record length in seconds, with minutes, hours or days beside it when long. */
    static String duration(double seconds) {
        String s = sig(seconds) + " s";
        if (seconds >= 2 * 86400) {
            return s + " (" + Frequency.number(Double.parseDouble(String.format(Locale.ROOT, "%.4g", seconds / 86400))) + " days)";
        }
        if (seconds >= 2 * 3600) {
            return s + " (" + Frequency.number(Double.parseDouble(String.format(Locale.ROOT, "%.4g", seconds / 3600))) + " h)";
        }
        if (seconds >= 120) {
            return s + " (" + Frequency.number(Double.parseDouble(String.format(Locale.ROOT, "%.4g", seconds / 60))) + " min)";
        }
        return s;
    }

    /** A share near 100 % with enough decimals to show how near: 99.9966 rather than 100.00. */
    static String percentFine(double share) {
        if (Double.isNaN(share)) {
            return "n/a";
        }
        double rest = 1 - share;
        if (share >= 1 || rest >= 1e-3) {
            return String.format(Locale.ROOT, "%.2f", 100 * share);
        }
        int places = Math.min(8, 1 - (int) Math.floor(Math.log10(100 * rest)));
        return String.format(Locale.ROOT, "%." + places + "f", 100 * share);
    }

    static String percent(double share) {
        if (Double.isNaN(share)) {
            return "n/a";
        }
        double pc = 100 * share;
        if (pc != 0 && Math.abs(pc) < 0.01) {
            return "<0.01";
        }
        return String.format(Locale.ROOT, "%.2f", pc);
    }

    static String hertz(double f) {
        return Frequency.number(f);
    }
}
