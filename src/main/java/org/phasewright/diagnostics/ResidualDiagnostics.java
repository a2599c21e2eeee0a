package org.phasewright.diagnostics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.stats.Distributions;

/**
 * Tests on the residuals of a fit, in record order (a NaN residual is a gap):
 * <ul>
 *   <li>Durbin-Watson statistic (Durbin and Watson 1950, Biometrika 37, 409), over consecutive
 *       observed pairs;</li>
 *   <li>sample autocorrelation r_k = sum (e_t - m)(e_{t+k} - m) / sum (e_t - m)^2 with products only
 *       where both samples are observed, scaled by (n - k) / m_k for the m_k pairs present at lag k (the
 *       pair-count normalisation of amplitude-modulated series, Parzen 1963; without gaps m_k = n - k and
 *       r_k is the usual estimator);</li>
 *   <li>Ljung-Box Q (Ljung and Box 1978, Biometrika 65, 297) against chi-square with h degrees of
 *       freedom (no ARMA parameters are fitted to regression residuals); across gaps each lag's term is
 *       weighted by m_k / (n - k), the share of its pairs present, and lags without pairs are left out of
 *       the sum and of the degrees of freedom;</li>
 *   <li>Jarque-Bera (Jarque and Bera 1987, Int. Stat. Rev. 55, 163) against chi-square with 2.</li>
 * </ul>
 * Residuals are treated as equally spaced in index; for uneven sampling the lags are in samples,
 * not seconds. Cost O(n h) for h lags.
 */
public final class ResidualDiagnostics {

    /** Code of the warning that residuals are autocorrelated (Ljung-Box p below 0.01). */
    public static final String AUTOCORRELATED = "autocorrelated_residuals";
    /** Code of the warning that residuals are not normal (Jarque-Bera p below 0.01). */
    public static final String NON_NORMAL = "non_normal_residuals";
    private static final double WARN_P = 0.01;

    private ResidualDiagnostics() {
    }

    /** Diagnostics of a fit's residuals with the default number of lags {@link #defaultLags(int)}. */
    public static ResidualReport of(FitResult fit) {
        double[] r = fit.components().residual();
        return of(r, defaultLags(count(r)));
    }

    /** Diagnostics of a fit's residuals up to {@code maxLag}. */
    public static ResidualReport of(FitResult fit, int maxLag) {
        return of(fit.components().residual(), maxLag);
    }

    /**
     * Diagnostics of residuals in record order (NaN = gap) with the default number of lags
     * {@link #defaultLags(int)} of the observed ones: for fits that are not a {@link FitResult}, such
     * as the residual component of a robust fit.
     */
    public static ResidualReport of(double[] residual) {
        return of(residual, defaultLags(count(residual)));
    }

    /** min(10, n / 5), at least 1: a common choice of portmanteau lag (common practice). */
    public static int defaultLags(int n) {
        return Math.max(1, Math.min(10, n / 5));
    }

    /** Diagnostics of residuals in record order (NaN = gap) up to {@code maxLag}. */
    public static ResidualReport of(double[] residual, int maxLag) {
        int n = count(residual);
        if (n < 8) {
            throw new IllegalArgumentException("residual diagnostics need at least 8 observed residuals, got " + n);
        }
        if (maxLag < 1 || maxLag >= n) {
            throw new IllegalArgumentException("the number of lags must be between 1 and " + (n - 1) + ", got " + maxLag);
        }
        double dw = durbinWatson(residual);
        double[] acf = autocorrelation(residual, maxLag);
        LjungBox lb = ljungBox(acf, n, pairCounts(residual, maxLag));
        JarqueBera jb = jarqueBera(residual);
        List<FitWarning> warnings = new ArrayList<>();
        if (lb.pValue() < WARN_P) {
            warnings.add(new FitWarning(AUTOCORRELATED, String.format(Locale.ROOT,
                    "the residuals are autocorrelated (Ljung-Box p %s over %d lags, lag-1 autocorrelation %.2f):"
                            + " the plain standard errors are likely too small; use a correction for correlated noise",
                    probability(lb.pValue()), maxLag, acf[0])));
        }
        if (jb.pValue() < WARN_P) {
            warnings.add(new FitWarning(NON_NORMAL, String.format(Locale.ROOT,
                    "the residuals are not normal (Jarque-Bera p %s, skewness %.2f, kurtosis %.2f): look for spikes"
                            + " or dropouts, and consider the robust fit", probability(jb.pValue()), jb.skewness(),
                    jb.kurtosis())));
        }
        return new ResidualReport(n, dw, acf, 1.96 / Math.sqrt(n), lb, jb, warnings);
    }

    /** "= 0.032", "= 3.1e-09" or "< 1e-16" (a p-value that underflows double precision). */
    static String probability(double p) {
        if (p < 1e-16) {
            return "< 1e-16";
        }
        return String.format(Locale.ROOT, p < 1e-3 ? "= %.2g" : "= %.3f", p).replace("e-0", "e-");
    }

    static int count(double[] r) {
        int n = 0;
        for (double v : r) {
            if (!Double.isNaN(v)) {
                n++;
            }
        }
        return n;
    }

    /** sum over consecutive observed pairs of (e_t - e_{t-1})^2, over sum of observed e_t^2. */
    public static double durbinWatson(double[] e) {
        double num = 0;
        double den = 0;
        for (int i = 0; i < e.length; i++) {
            if (Double.isNaN(e[i])) {
                continue;
            }
            den += e[i] * e[i];
            if (i > 0 && !Double.isNaN(e[i - 1])) {
                double d = e[i] - e[i - 1];
                num += d * d;
            }
        }
        return num / den;
    }

    /** r_1..r_maxLag about the mean of the observed residuals. */
    public static double[] autocorrelation(double[] e, int maxLag) {
        double mean = 0;
        int n = 0;
        for (double v : e) {
            if (!Double.isNaN(v)) {
                mean += v;
                n++;
            }
        }
        mean /= n;
        double c0 = 0;
        for (double v : e) {
            if (!Double.isNaN(v)) {
                c0 += (v - mean) * (v - mean);
            }
        }
        double[] r = new double[maxLag];
        for (int k = 1; k <= maxLag; k++) {
            double s = 0;
            int pairs = 0;
            for (int i = 0; i + k < e.length; i++) {
                if (!Double.isNaN(e[i]) && !Double.isNaN(e[i + k])) {
                    s += (e[i] - mean) * (e[i + k] - mean);
                    pairs++;
                }
            }
            r[k - 1] = pairs == 0 ? Double.NaN : s / c0 * ((n - k) / (double) pairs);
        }
        return r;
    }

    /** m_1..m_maxLag: the pairs of observed residuals k samples apart. */
    static int[] pairCounts(double[] e, int maxLag) {
        int[] m = new int[maxLag];
        for (int k = 1; k <= maxLag; k++) {
            for (int i = 0; i + k < e.length; i++) {
                if (!Double.isNaN(e[i]) && !Double.isNaN(e[i + k])) {
                    m[k - 1]++;
                }
            }
        }
        return m;
    }

    /** Ljung-Box Q from r_1..r_h of n residuals. */
    public static LjungBox ljungBox(double[] acf, int n) {
        int h = acf.length;
        double q = 0;
        for (int k = 1; k <= h; k++) {
            q += acf[k - 1] * acf[k - 1] / (n - k);
        }
        q *= n * (n + 2.0);
        return new LjungBox(q, h, h, Distributions.chiSquareSurvival(q, h));
    }

    /**
     * Ljung-Box Q across gaps: Q = n (n + 2) sum (m_k / (n - k)) r_k^2 / (n - k) over the lags with pairs
     * (m_k of them), on as many degrees of freedom. Under white noise r_k has variance near
     * (n - k)^2 / (n^2 m_k), so each term stays near 1; without gaps this is {@link #ljungBox(double[], int)}.
     */
    static LjungBox ljungBox(double[] acf, int n, int[] pairs) {
        int h = acf.length;
        double q = 0;
        int used = 0;
        for (int k = 1; k <= h; k++) {
            if (pairs[k - 1] == 0) {
                continue;
            }
            double nk = n - k;
            q += pairs[k - 1] / nk * acf[k - 1] * acf[k - 1] / nk;
            used++;
        }
        q *= n * (n + 2.0);
        return new LjungBox(q, h, used, used > 0 ? Distributions.chiSquareSurvival(q, used) : Double.NaN);
    }

    /** Jarque-Bera from the moment skewness and kurtosis of the observed residuals. */
    public static JarqueBera jarqueBera(double[] e) {
        double mean = 0;
        int n = 0;
        for (double v : e) {
            if (!Double.isNaN(v)) {
                mean += v;
                n++;
            }
        }
        mean /= n;
        double m2 = 0;
        double m3 = 0;
        double m4 = 0;
        for (double v : e) {
            if (!Double.isNaN(v)) {
                double d = v - mean;
                double d2 = d * d;
                m2 += d2;
                m3 += d2 * d;
                m4 += d2 * d2;
            }
        }
        m2 /= n;
        m3 /= n;
        m4 /= n;
        double s = m3 / Math.pow(m2, 1.5);
        double k = m4 / (m2 * m2);
        double jb = n / 6.0 * (s * s + (k - 3) * (k - 3) / 4);
        return new JarqueBera(jb, s, k, Distributions.chiSquareSurvival(jb, 2));
    }
}
