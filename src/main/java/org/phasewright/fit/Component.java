package org.phasewright.fit;

/**
 * The time series one term contributes to the fitted signal (its columns times its coefficients),
 * at every sample of the record; NaN where the term cannot be evaluated (a missing covariate).
 */
public record Component(String label, String kind, double[] values) {
}
