package org.phasewright.model;

/**
 * The hard limit on frequencies in uniformly sampled records: a frequency at or above the
 * Nyquist frequency rate/2 is indistinguishable from its alias below it (sampling theorem,
 * common practice), so asking for it is an error that names the alias.
 */
public final class FrequencyLimits {
    private FrequencyLimits() {
    }

    /** The frequency in [0, rate/2] that {@code f} aliases to when sampled at {@code rate}. */
    public static double alias(double f, double rate) {
        double r = f - rate * Math.floor(f / rate);
        return Math.min(r, rate - r);
    }

    static void requireBelowNyquist(String label, double f, BindingContext context) {
        if (!context.isUniform()) {
            return;
        }
        double rate = context.rate();
        double nyquist = rate / 2;
        if (f >= nyquist * (1 - 1e-12)) {
            throw new ModelException("the " + label + " is at or above the Nyquist frequency " + TermSpec.hertz(nyquist)
                    + " of a record sampled at " + TermSpec.hertz(rate) + "; it cannot be told apart from its alias at "
                    + TermSpec.hertz(alias(f, rate)));
        }
    }
}
