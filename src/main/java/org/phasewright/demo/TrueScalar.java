package org.phasewright.demo;

/**
 * A non-periodic coefficient a demo signal was made with (a constant offset, a level step, a
 * covariate's gain).
 *
 * @param label the name of the coefficient as the README states it
 * @param kind  the term kind it belongs to ("intercept", "step" or "covariate")
 * @param value the true value, in the unit of the signal column (per unit of the covariate)
 */
public record TrueScalar(String label, String kind, double value) {
}
