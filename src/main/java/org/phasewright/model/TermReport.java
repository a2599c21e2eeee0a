package org.phasewright.model;

/**
 * What a user reads about one term of a fit. Every report has a label, a kind and the share of
 * variance the term alone explains (its extra sum of squares over the total sum of squares).
 */
public sealed interface TermReport permits SinusoidReport, HarmonicSeriesReport, GroupReport, ScalarReport {
    String label();

    String kind();

    double varianceShare();
}
