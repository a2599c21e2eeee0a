package org.phasewright.refine;

/**
 * One refined frequency, reported like any other estimate.
 *
 * @param label       label of the term in the refined model (e.g. "sinusoid 50.0213 Hz")
 * @param kind        "sinusoid" (its frequency) or "harmonic_series" (its fundamental)
 * @param startHz     the starting frequency
 * @param frequencyHz the least-squares estimate
 * @param stdErrorHz  standard error from the Jacobian, s sqrt([(J'J)^-1]_ff), J the Jacobian of the fitted
 *                    values in all parameters and s^2 = RSS / (n - p - q)
 * @param ciLowHz     lower end of the confidence interval f -/+ t* se, t* on n - p - q degrees of freedom
 * @param ciHighHz    upper end
 */
public record RefinedFrequency(String label, String kind, double startHz, double frequencyHz, double stdErrorHz,
                               double ciLowHz, double ciHighHz) {
}
