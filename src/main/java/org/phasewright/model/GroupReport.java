package org.phasewright.model;

/**
 * Report of a multi-column term whose coefficients mean little one by one (polynomial and spline
 * trends): the joint F-test and the share of variance. The trend curve itself is in the fit's
 * components.
 */
public record GroupReport(String label, String kind, int columns, double fStat, int df1, double pValue,
                          double varianceShare) implements TermReport {
}
