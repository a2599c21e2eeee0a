package org.phasewright.fit;

/**
 * One regression coefficient with its standard error, t statistic, two-sided p-value (Student t on
 * n - p degrees of freedom) and confidence interval.
 *
 * @param name column name, e.g. {@code cos@50Hz}
 * @param term label of the term that owns the column
 */
public record CoefficientEstimate(String name, String term, double estimate, double stdError, double t,
                                  double pValue, double ciLow, double ciHigh) {
}
