package org.phasewright.io.write;

/**
 * A unit other than hertz in which a frequency was given (rpm, cycles per day, a period in hours,
 * ...), so that a written result can repeat a refined frequency, its standard error and its
 * interval in the user's own unit beside hertz. The front end that parsed the unit supplies it;
 * the writers only apply it. Unit conversion, no statistics.
 */
public interface FrequencyInUnit {

    /** The unit as written in the result, e.g. {@code rpm}, {@code /day}, {@code period h}. */
    String unit();

    /** The frequency {@code hz} as a number in this unit (for a period: the period in its time unit). */
    double fromHertz(double hz);

    /** A standard error {@code seHz} of the frequency {@code hz}, in this unit (first order). */
    double uncertaintyFromHertz(double hz, double seHz);
}
