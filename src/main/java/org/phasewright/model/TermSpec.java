package org.phasewright.model;

/**
 * What a user asks the model to contain: one entry of a {@link ModelSpec}. A spec is a plain value
 * (a record) that can be saved and loaded; {@link #bind(BindingContext)} turns it into a
 * {@link Term} that knows the record it is fitted to (time span, knots, covariate columns).
 */
public sealed interface TermSpec
        permits Intercept, PolynomialTrend, SplineTrend, Sinusoid, HarmonicSeries, Step, Covariate {

    /** A short human-readable label, unique within a model, e.g. {@code "sinusoid 50 Hz"}. */
    String label();

    /** The kind of term as a stable lower-case word used in result files. */
    String kind();

    /** Binds the spec to a record, checking what can be checked before any fitting. */
    Term bind(BindingContext context);

    /**
     * Formats a frequency in hertz for labels: at most 10 significant digits, trailing zeros
     * dropped, plain decimals from 0.001 Hz up and scientific notation below ("50 Hz",
     * "24.74991206 Hz", "2.2364278e-5 Hz").
     */
    static String hertz(double f) {
        java.math.BigDecimal d = new java.math.BigDecimal(f).round(new java.math.MathContext(10)).stripTrailingZeros();
        String s;
        if (f != 0 && Math.abs(f) < 1e-3) {
            String mantissa = d.unscaledValue().toString();
            int exponent = mantissa.length() - 1 - d.scale();
            String digits = mantissa.replaceFirst("^-", "");
            s = (f < 0 ? "-" : "") + digits.charAt(0) + (digits.length() > 1 ? "." + digits.substring(1) : "")
                    + "e" + (exponent - (mantissa.length() - digits.length()));
        } else {
            s = d.toPlainString();
        }
        return s + " Hz";
    }
}
