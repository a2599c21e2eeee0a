package org.phasewright.model;

/**
 * Report of a one-column term (intercept, step, covariate): the coefficient with its standard
 * error, confidence interval, t statistic, the equivalent F statistic (F = t^2 on 1 and n - p
 * degrees of freedom, so every term carries an F) and the two-sided p-value.
 */
public record ScalarReport(String label, String kind, double estimate, double stdError, double ciLow,
                           double ciHigh, double t, double fStat, double pValue, double varianceShare)
        implements TermReport {
}
