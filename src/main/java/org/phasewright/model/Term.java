package org.phasewright.model;

import java.util.List;

/**
 * A bound model term. It owns its mathematics: how many columns it adds and their names, how to
 * evaluate them on a block of rows, and how to turn its slice of the coefficients and covariance
 * into what a user reads ({@link #report}). Adding a new kind of term means one new {@link TermSpec}
 * record and its {@code Term}.
 */
public interface Term {

    TermSpec spec();

    default String label() {
        return spec().label();
    }

    default String kind() {
        return spec().kind();
    }

    List<String> columnNames();

    default int columns() {
        return columnNames().size();
    }

    /** Covariate channels this term reads; rows where any is missing are left out of the fit. */
    default List<String> covariatesUsed() {
        return List.of();
    }

    /** Frequencies in hertz that this term models (for resolution and aliasing checks). */
    default double[] frequencies() {
        return new double[0];
    }

    /**
     * Writes this term's columns for rows {@code from..to-1} into {@code out}, a row-major block
     * with {@code stride} values per row, starting at column {@code offset} of block row 0.
     */
    void fill(Rows rows, int from, int to, double[] out, int stride, int offset);

    /** What the user reads about this term, from its coefficients and their covariance. */
    TermReport report(TermInference inference);
}
