package org.phasewright.model;

import org.phasewright.stats.Distributions;

/**
 * A term's slice of a fit: its coefficients, the matching block C of (X'WX)^-1, the residual
 * variance s^2 = RSS / (n - p), the residual degrees of freedom, the critical t value for the
 * chosen confidence level and the total sum of squares. The covariance of the slice is s^2 C.
 *
 * <p>With zero residual degrees of freedom (an exact interpolation) no standard error exists:
 * every standard error, statistic and p-value derived here is NaN.
 */
public final class TermInference {
    private final double[] beta;
    private final double[][] c;
    private final double sigma2;
    private final int dof;
    private final double tCritical;
    private final double totalSumOfSquares;

    public TermInference(double[] beta, double[][] unscaledCovariance, double sigma2, int dof, double tCritical,
                         double totalSumOfSquares) {
        this.beta = beta;
        this.c = unscaledCovariance;
        this.sigma2 = dof > 0 ? sigma2 : Double.NaN;
        this.dof = dof;
        this.tCritical = tCritical;
        this.totalSumOfSquares = totalSumOfSquares;
    }

    public int size() {
        return beta.length;
    }

    public double estimate(int i) {
        return beta[i];
    }

    /** Covariance of coefficients i and j: s^2 C_ij. */
    public double covariance(int i, int j) {
        return sigma2 * c[i][j];
    }

    public double stdError(int i) {
        return Math.sqrt(covariance(i, i));
    }

    public int dof() {
        return dof;
    }

    public double tCritical() {
        return tCritical;
    }

    public double totalSumOfSquares() {
        return totalSumOfSquares;
    }

    /** Two-sided p-value of a t statistic on this fit's residual degrees of freedom. */
    public double twoSidedP(double t) {
        return dof > 0 && !Double.isNaN(t) ? Distributions.studentTTwoSidedP(t, dof) : Double.NaN;
    }

    /** The slice of coefficients {@code from..to-1} of this slice. */
    public TermInference slice(int from, int to) {
        int q = to - from;
        double[] b = new double[q];
        double[][] cc = new double[q][q];
        for (int i = 0; i < q; i++) {
            b[i] = beta[from + i];
            for (int j = 0; j < q; j++) {
                cc[i][j] = c[from + i][from + j];
            }
        }
        return new TermInference(b, cc, sigma2, dof, tCritical, totalSumOfSquares);
    }

    /**
     * The joint F-test that every coefficient of the slice is zero, F = b' C^-1 b / (q s^2) on
     * (q, n - p) degrees of freedom, and the slice's extra sum of squares b' C^-1 b: the rise in
     * residual sum of squares if the slice were dropped and the rest refitted (a standard result
     * for nested linear models). Cost O(q^3) by Cholesky factorization of C.
     */
    public GroupTest groupTest() {
        int q = beta.length;
        double ess = quadraticFormInverse(c, beta);
        double share = totalSumOfSquares > 0 ? ess / totalSumOfSquares : Double.NaN;
        if (dof <= 0) {
            return new GroupTest(Double.NaN, q, dof, Double.NaN, ess, share);
        }
        double f = ess / (q * sigma2);
        return new GroupTest(f, q, dof, Distributions.fSurvival(f, q, dof), ess, share);
    }

    /** b' A^-1 b for symmetric positive definite A, by Cholesky; NaN if A is not positive definite. */
    static double quadraticFormInverse(double[][] a, double[] b) {
        int q = b.length;
        double[][] l = new double[q][q];
        for (int j = 0; j < q; j++) {
            double d = a[j][j];
            for (int k = 0; k < j; k++) {
                d -= l[j][k] * l[j][k];
            }
            if (!(d > 0)) {
                return Double.NaN;
            }
            l[j][j] = Math.sqrt(d);
            for (int i = j + 1; i < q; i++) {
                double s = a[i][j];
                for (int k = 0; k < j; k++) {
                    s -= l[i][k] * l[j][k];
                }
                l[i][j] = s / l[j][j];
            }
        }
        double[] z = new double[q];
        double sum = 0;
        for (int i = 0; i < q; i++) {
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= l[i][k] * z[k];
            }
            z[i] = s / l[i][i];
            sum += z[i] * z[i];
        }
        return sum;
    }
}
