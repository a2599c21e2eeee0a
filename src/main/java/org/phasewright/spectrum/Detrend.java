package org.phasewright.spectrum;

import org.phasewright.series.Series;

/**
 * Removes a low-order polynomial trend before a periodogram, so that a slow drift (a seasonal level,
 * a sensor offset creeping) does not leak into the lowest bins and show up as spurious peaks.
 *
 * <p>Method: weighted least squares on the Legendre polynomials P_0..P_d of u = 2 (t - t_first) /
 * (t_last - t_first) - 1 over the observed samples (gaps skipped, series weights used), by the normal
 * equations (well conditioned: the Legendre polynomials are nearly orthogonal on any sampling that
 * covers the record) solved by Gaussian elimination with partial pivoting; the fitted polynomial is
 * subtracted from every observed sample. Removing degree d also removes about d + 1 resolution bins'
 * worth of very slow oscillation, which is why peaks below 2/T are not reported after it
 * (see {@link PeakOptions#minCycles()}). Common practice.
 *
 * <p>Cost: O(n d^2) time, one copy of the values.
 */
final class Detrend {

    private Detrend() {
    }

    /** The series with its least-squares polynomial of degree {@code degree} removed; the series itself when degree < 0. */
    static Series polynomial(Series s, int degree) {
        if (degree < 0) {
            return s;
        }
        int n = s.size();
        double t0 = Double.NaN;
        double t1 = Double.NaN;
        for (int i = 0; i < n; i++) {
            if (!s.isMissing(i) && s.weightAt(i) > 0) {
                if (Double.isNaN(t0)) {
                    t0 = s.timeAt(i);
                }
                t1 = s.timeAt(i);
            }
        }
        if (Double.isNaN(t0) || !(t1 > t0)) {
            return s;
        }
        int p = degree + 1;
        double[][] a = new double[p][p + 1];
        double[] basis = new double[p];
        for (int i = 0; i < n; i++) {
            if (s.isMissing(i) || !(s.weightAt(i) > 0)) {
                continue;
            }
            legendre(2 * (s.timeAt(i) - t0) / (t1 - t0) - 1, basis);
            double w = s.weightAt(i);
            double y = s.valueAt(i);
            for (int j = 0; j < p; j++) {
                for (int k = 0; k < p; k++) {
                    a[j][k] += w * basis[j] * basis[k];
                }
                a[j][p] += w * basis[j] * y;
            }
        }
        double[] c = solve(a);
        if (c == null) {
            return s;
        }
        double[] v = s.values();
        for (int i = 0; i < n; i++) {
            if (Double.isNaN(v[i])) {
                continue;
            }
            legendre(2 * (s.timeAt(i) - t0) / (t1 - t0) - 1, basis);
            double trend = 0;
            for (int j = 0; j < p; j++) {
                trend += c[j] * basis[j];
            }
            v[i] -= trend;
        }
        return s.withValues(v);
    }

    /** P_0(u)..P_{d}(u) by Bonnet's recurrence (k+1) P_{k+1} = (2k+1) u P_k - k P_{k-1}. */
    static void legendre(double u, double[] out) {
        out[0] = 1;
        if (out.length > 1) {
            out[1] = u;
        }
        for (int k = 1; k + 1 < out.length; k++) {
            out[k + 1] = ((2 * k + 1) * u * out[k] - k * out[k - 1]) / (k + 1);
        }
    }

    /**
     * Solves the augmented system {@code a} (p rows, p + 1 columns) in place by Gaussian elimination with
     * partial pivoting; null when a pivot is below 1e-12 of the largest diagonal (singular).
     */
    static double[] solve(double[][] a) {
        int p = a.length;
        double scale = 0;
        for (int j = 0; j < p; j++) {
            scale = Math.max(scale, Math.abs(a[j][j]));
        }
        for (int col = 0; col < p; col++) {
            int piv = col;
            for (int r = col + 1; r < p; r++) {
                if (Math.abs(a[r][col]) > Math.abs(a[piv][col])) {
                    piv = r;
                }
            }
            if (!(Math.abs(a[piv][col]) > 1e-12 * scale)) {
                return null;
            }
            double[] tmp = a[col];
            a[col] = a[piv];
            a[piv] = tmp;
            for (int r = col + 1; r < p; r++) {
                double f = a[r][col] / a[col][col];
                if (f != 0) {
                    for (int k = col; k <= p; k++) {
                        a[r][k] -= f * a[col][k];
                    }
                }
            }
        }
        double[] x = new double[p];
        for (int r = p - 1; r >= 0; r--) {
            double v = a[r][p];
            for (int k = r + 1; k < p; k++) {
                v -= a[r][k] * x[k];
            }
            x[r] = v / a[r][r];
        }
        return x;
    }
}
