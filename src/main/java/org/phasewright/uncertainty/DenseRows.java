package org.phasewright.uncertainty;

import org.phasewright.model.Design;
import org.phasewright.series.Series;

/**
 * The included rows of a design held densely: grid index and time of each row, the rows of
 * sqrt(w) X and sqrt(w) y. Memory n p doubles; built by one pass of {@link Design#fillRows}.
 */
final class DenseRows {
    final int n;
    final int p;
    final int[] index;
    final double[] time;
    final double[] x;
    final double[] y;

    private DenseRows(int n, int p, int[] index, double[] time, double[] x, double[] y) {
        this.n = n;
        this.p = p;
        this.index = index;
        this.time = time;
        this.x = x;
        this.y = y;
    }

    static DenseRows of(Design design, Series series) {
        int p = design.p();
        int n = design.includedCount();
        double[] all = new double[series.size() * p];
        design.fillRows(series, 0, series.size(), all);
        int[] idx = new int[n];
        double[] t = new double[n];
        double[] x = new double[n * p];
        double[] y = new double[n];
        for (int i = 0, j = 0; i < series.size(); i++) {
            if (design.isIncluded(i)) {
                double sw = Math.sqrt(series.weightAt(i));
                idx[j] = i;
                t[j] = series.timeAt(i);
                y[j] = series.valueAt(i) * sw;
                for (int c = 0; c < p; c++) {
                    x[j * p + c] = all[i * p + c] * sw;
                }
                j++;
            }
        }
        return new DenseRows(n, p, idx, t, x, y);
    }

    /** sqrt(w) times the residuals of coefficients {@code beta}. */
    double[] residuals(double[] beta) {
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            double f = 0;
            for (int c = 0; c < p; c++) {
                f += x[i * p + c] * beta[c];
            }
            e[i] = y[i] - f;
        }
        return e;
    }

    /** C M C for symmetric p x p matrices. */
    static double[][] sandwich(double[][] c, double[][] m) {
        int p = c.length;
        double[][] cm = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double s = 0;
                for (int k = 0; k < p; k++) {
                    s += c[i][k] * m[k][j];
                }
                cm[i][j] = s;
            }
        }
        double[][] out = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double s = 0;
                for (int k = 0; k < p; k++) {
                    s += cm[i][k] * c[k][j];
                }
                out[i][j] = s;
            }
        }
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < i; j++) {
                double a = 0.5 * (out[i][j] + out[j][i]);
                out[i][j] = a;
                out[j][i] = a;
            }
        }
        return out;
    }
}
