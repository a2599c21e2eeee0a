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

    /** Formats a frequency in hertz compactly and exactly enough to tell terms apart. */
    static String hertz(double f) {
        String s = Double.toString(f);
        if (s.contains("E")) {
            s = String.format(java.util.Locale.ROOT, "%.6g", f);
        } else if (s.endsWith(".0")) {
            s = s.substring(0, s.length() - 2);
        }
        return s + " Hz";
    }
}
