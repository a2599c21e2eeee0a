package org.phasewright.model;

import org.phasewright.series.Series;

/**
 * The rows a design is evaluated on: a sample time and, for covariate terms, the covariate values.
 * Row indices are those of the underlying record.
 */
public interface Rows {
    int size();

    /** Time of row {@code i} in seconds from the record's time zero. */
    double time(int i);

    /** Value of covariate {@code name} at row {@code i}; NaN when missing. */
    double covariate(String name, int i);

    /** The rows of a series. */
    static Rows of(Series s) {
        return new Rows() {
            @Override
            public int size() {
                return s.size();
            }

            @Override
            public double time(int i) {
                return s.timeAt(i);
            }

            @Override
            public double covariate(String name, int i) {
                return s.covariateAt(name, i);
            }
        };
    }

    /** Rows at bare times, without covariates (for prediction and plotting). */
    static Rows atTimes(double[] times) {
        return new Rows() {
            @Override
            public int size() {
                return times.length;
            }

            @Override
            public double time(int i) {
                return times[i];
            }

            @Override
            public double covariate(String name, int i) {
                throw new ModelException("the model uses covariate '" + name
                        + "', so it can only be evaluated where that covariate is measured");
            }
        };
    }
}
