package org.phasewright.model;

/**
 * Report of a one-column term (intercept, step, covariate): the coefficient with its standard
 * error, confidence interval, t statistic and two-sided p-value.
 */
public record ScalarReport(String label, String kind, double estimate, double stdError, double ciLow,
                           double ciHigh, double t, double pValue, double varianceShare) implements TermReport {
}
