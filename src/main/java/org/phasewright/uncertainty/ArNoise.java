package org.phasewright.uncertainty;

/**
 * An autoregressive model of the residual noise, fitted by Yule-Walker equations solved with the
 * Levinson-Durbin recursion (Brockwell and Davis 1991, Time Series: Theory and Methods, sec. 8.2),
 * the order chosen by AIC, n ln(sigma_p^2) + 2p. Autocovariances use only pairs of samples that are
 * both observed on the uniform grid. Cost O(n P) for P lags.
 *
 * @param phi    AR coefficients phi_1..phi_p (empty: white noise)
 * @param gamma0 noise variance
 */
record ArNoise(double[] phi, double gamma0, double[] rho) {

    /** Fits orders 0..maxOrder to residuals at grid indices {@code index} and keeps the AIC choice. */
    static ArNoise fit(double[] e, int[] index, int maxOrder) {
        int n = e.length;
        int span = index[n - 1] - index[0] + 1;
        double[] grid = new double[span];
        boolean[] has = new boolean[span];
        for (int i = 0; i < n; i++) {
            grid[index[i] - index[0]] = e[i];
            has[index[i] - index[0]] = true;
        }
        int order = Math.min(maxOrder, n / 10);
        double[] r = new double[order + 1];
        double c0 = 0;
        for (double v : e) {
            c0 += v * v;
        }
        c0 /= n;
        r[0] = 1;
        for (int k = 1; k <= order; k++) {
            double s = 0;
            for (int i = 0; i + k < span; i++) {
                if (has[i] && has[i + k]) {
                    s += grid[i] * grid[i + k];
                }
            }
            r[k] = s / n / c0;
        }
        // Levinson-Durbin
        double[] best = new double[0];
        double bestAic = n * Math.log(c0);
        double[] a = new double[0];
        double v = 1;
        for (int p = 1; p <= order; p++) {
            double num = r[p];
            for (int j = 1; j < p; j++) {
                num -= a[j - 1] * r[p - j];
            }
            double k = num / v;
            if (!(Math.abs(k) < 1)) {
                break;
            }
            double[] next = new double[p];
            for (int j = 1; j < p; j++) {
                next[j - 1] = a[j - 1] - k * a[p - j - 1];
            }
            next[p - 1] = k;
            a = next;
            v *= 1 - k * k;
            double aic = n * Math.log(c0 * v) + 2 * p;
            if (aic < bestAic) {
                bestAic = aic;
                best = a.clone();
            }
        }
        return new ArNoise(best, c0, java.util.Arrays.copyOf(r, best.length + 1));
    }

    /**
     * Model autocovariances gamma(0..maxLag): the sample values up to the order (which Yule-Walker
     * reproduces) and the AR recursion gamma(k) = sum phi_j gamma(k - j) beyond; stops early once
     * |gamma(k)| falls below 1e-10 gamma(0) for p consecutive lags.
     */
    double[] autocovariance(int maxLag) {
        int p = phi.length;
        double[] g = new double[maxLag + 1];
        int quiet = 0;
        for (int k = 0; k <= maxLag; k++) {
            if (k <= p) {
                g[k] = gamma0 * rho[k];
            } else {
                double s = 0;
                for (int j = 1; j <= p; j++) {
                    s += phi[j - 1] * g[k - j];
                }
                g[k] = s;
            }
            if (k > p) {
                quiet = Math.abs(g[k]) < 1e-10 * gamma0 ? quiet + 1 : 0;
                if (quiet > Math.max(1, p)) {
                    return java.util.Arrays.copyOf(g, k + 1);
                }
            }
        }
        return g;
    }
}
