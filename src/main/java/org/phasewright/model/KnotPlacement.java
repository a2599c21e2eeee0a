package org.phasewright.model;

/** Where a spline trend's interior knots go. */
public enum KnotPlacement {
    /** Evenly spaced in time over the record. */
    EVEN,
    /** At quantiles of the observed sample times, so each knot interval holds as many samples. */
    QUANTILE
}
