package org.phasewright.spectrum;

import java.util.Arrays;
import org.phasewright.series.Series;
import org.phasewright.stats.Distributions;

/**
 * The generalised (floating-mean, weighted) Lomb-Scargle periodogram for uneven or gappy sampling:
 * at each trial frequency the weighted least-squares fit of {@code c + a cos(wt) + b sin(wt)} is
 * computed from sums over the samples, following Zechmeister and Kürster (2009), "The generalised
 * Lomb-Scargle periodogram", A&amp;A 496, 577 (eqs. 4-15); with a fixed mean this reduces to the
 * classical periodogram of Lomb (1976), Ap&amp;SS 39, 447 and Scargle (1982), ApJ 263, 835.
 * Gap samples (NaN) are skipped; series weights are taken as inverse variances (weight 0 drops a
 * sample).
 *
 * <p>Grid: {@code f_k = k df}, {@code df = 1 / (oversampling T)} with T the record length
 * ({@link Series#duration()} for uniform records, so the grid matches the FFT's; last minus first
 * observed time otherwise), up to the maximum frequency
 * (default: the pseudo-Nyquist frequency 1/(2 median spacing)).
 *
 * <p>False-alarm probability of the top peak: Baluev (2008), "Assessing the statistical significance
 * of periodogram peaks", MNRAS 385, 1279 — the single-frequency tail {@code (1-z)^((N-3)/2)} combined
 * with the Davies-bound term {@code tau(z) = gamma W (1-z)^((N-4)/2) sqrt(N_H z / 2)}, with
 * {@code N_H = N - 1}, {@code gamma = sqrt(2/N_H) Gamma(N_H/2) / Gamma((N_H-1)/2)},
 * {@code W = f_max T_eff}, {@code T_eff = sqrt(4 pi var_w(t))}: FAP = 1 - (1 - tail) exp(-tau).
 * It assumes white Gaussian noise and is an upper bound that is tight for small FAP (below ~0.1).
 *
 * <p>Frequencies where cos and sin are nearly collinear on the sample times (condition number of
 * their 2x2 normal matrix above about 100, as within a few bins of the Nyquist frequency of a
 * uniform grid) get amplitude and power 0: no sinusoid of free phase is identifiable there.
 *
 * <p>Cost: O(n K) for n samples and K grid frequencies (trigonometric recurrences, exact reset every
 * 256 steps), 7K doubles of memory.
 */
public final class LombScargle {

    /**
     * det / trace^2 of the 2x2 cos/sin normal matrix below which a frequency is not identifiable:
     * 0.01 means a condition number above about 100 (amplitude noise amplified more than 10 times).
     */
    private static final double WELL_POSED = 0.01;

    private LombScargle() {
    }

    /** The periodogram of a series' observed samples. */
    public static UnevenPeriodogram of(Series series, LombScargleOptions options) {
        Samples d = Samples.of(series);
        double span = series.isUniform() ? series.duration() : d.t[d.n - 1] - d.t[0];
        double df = 1.0 / (options.oversampling() * span);
        double fmax = Double.isNaN(options.maxFrequencyHz()) ? pseudoNyquist(d.t) : options.maxFrequencyHz();
        int k = (int) Math.floor(fmax / df + 1e-9);
        if (k < 1) {
            throw new IllegalArgumentException("maximum frequency " + fmax + " Hz is below the grid step " + df + " Hz");
        }
        if ((long) k * d.n > 4_000_000_000L) {
            throw new IllegalArgumentException("Lomb-Scargle grid of " + k + " frequencies over " + d.n
                    + " samples is too costly; lower the maximum frequency or the oversampling");
        }
        double[] c = new double[k];
        double[] s = new double[k];
        double[] yc = new double[k];
        double[] ys = new double[k];
        double[] cc = new double[k];
        double[] cs = new double[k];
        double ybar = 0;
        double yy = 0;
        for (int i = 0; i < d.n; i++) {
            ybar += d.w[i] * d.y[i];
        }
        for (int i = 0; i < d.n; i++) {
            double dy = d.y[i] - ybar;
            yy += d.w[i] * dy * dy;
        }
        for (int i = 0; i < d.n; i++) {
            double wi = d.w[i];
            double wy = wi * (d.y[i] - ybar);
            double step = 2 * Math.PI * df * (d.t[i] - d.t[0]);
            double cd = Math.cos(step);
            double sd = Math.sin(step);
            double co = cd;
            double si = sd;
            for (int j = 0; j < k; j++) {
                if ((j & 255) == 255) {
                    double ang = step * (j + 1);
                    co = Math.cos(ang);
                    si = Math.sin(ang);
                }
                c[j] += wi * co;
                s[j] += wi * si;
                yc[j] += wy * co;
                ys[j] += wy * si;
                cc[j] += wi * co * co;
                cs[j] += wi * co * si;
                double co2 = co * cd - si * sd;
                si = si * cd + co * sd;
                co = co2;
            }
        }
        double[] freq = new double[k];
        double[] amp = new double[k];
        double[] pow = new double[k];
        int top = 0;
        for (int j = 0; j < k; j++) {
            freq[j] = (j + 1) * df;
            double ccH = cc[j] - c[j] * c[j];
            double ssH = (1 - cc[j]) - s[j] * s[j];
            double csH = cs[j] - c[j] * s[j];
            double det = ccH * ssH - csH * csH;
            if (!(det > WELL_POSED * (ccH + ssH) * (ccH + ssH)) || yy <= 0) {
                amp[j] = 0;
                pow[j] = 0;
                continue;
            }
            double a = (yc[j] * ssH - ys[j] * csH) / det;
            double b = (ys[j] * ccH - yc[j] * csH) / det;
            amp[j] = Math.hypot(a, b);
            pow[j] = (ssH * yc[j] * yc[j] + ccH * ys[j] * ys[j] - 2 * csH * yc[j] * ys[j]) / (yy * det);
            if (pow[j] > pow[top]) {
                top = j;
            }
        }
        Spectrum spectrum = new Spectrum("lomb_scargle", Window.RECTANGULAR, freq, amp, df, 1.0 / span, 1.0, d.n, span);
        double fap = falseAlarmProbability(pow[top], d.n, freq[k - 1], d.weightedTimeVariance());
        return new UnevenPeriodogram(spectrum, pow, freq[top], pow[top], fap);
    }

    /**
     * Baluev (2008) false-alarm probability of a normalised power {@code z} being the maximum over a
     * grid up to {@code fMaxHz}, for {@code n} samples with weighted time variance {@code timeVariance}.
     */
    public static double falseAlarmProbability(double z, int n, double fMaxHz, double timeVariance) {
        if (n < 5) {
            return 1.0;
        }
        if (!(z > 0)) {
            return 1.0;
        }
        if (z >= 1) {
            return 0.0;
        }
        double nH = n - 1.0;
        double nK = n - 3.0;
        double single = Math.exp(0.5 * nK * Math.log1p(-z));
        double logGammaRatio = Distributions.logGamma(nH / 2) - Distributions.logGamma((nH - 1) / 2);
        double gamma = Math.sqrt(2 / nH) * Math.exp(logGammaRatio);
        double w = fMaxHz * Math.sqrt(4 * Math.PI * timeVariance);
        double tau = gamma * w * Math.exp(0.5 * (nK - 1) * Math.log1p(-z)) * Math.sqrt(nH * z / 2);
        double fap = 1 - (1 - single) * Math.exp(-tau);
        return Math.max(0, Math.min(1, fap));
    }

    /**
     * A probe giving the floating-mean weighted least-squares sinusoid amplitude at any frequency,
     * on the same scale as the periodogram's amplitudes. O(n) per call.
     */
    public static ToneProbe probe(Series series) {
        Samples d = Samples.of(series);
        return f -> d.amplitudeAt(f);
    }

    /**
     * Spectral window of the sampling, |sum_i w_i exp(-i 2 pi f t_i)| / sum_i w_i: the fraction of a
     * tone's amplitude that leaks to an offset of {@code f} hertz. O(n) per call.
     */
    public static java.util.function.DoubleUnaryOperator spectralWindow(Series series) {
        Samples d = Samples.of(series);
        return f -> {
            double re = 0;
            double im = 0;
            for (int i = 0; i < d.n; i++) {
                double ang = 2 * Math.PI * f * (d.t[i] - d.t[0]);
                re += d.w[i] * Math.cos(ang);
                im += d.w[i] * Math.sin(ang);
            }
            return Math.hypot(re, im);
        };
    }

    /** 1 / (2 median spacing) of strictly increasing times. */
    static double pseudoNyquist(double[] t) {
        double[] dt = new double[t.length - 1];
        for (int i = 1; i < t.length; i++) {
            dt[i - 1] = t[i] - t[i - 1];
        }
        Arrays.sort(dt);
        double med = dt.length % 2 == 1 ? dt[dt.length / 2] : 0.5 * (dt[dt.length / 2 - 1] + dt[dt.length / 2]);
        return 0.5 / med;
    }

    /** Observed samples with weights normalised to sum 1. */
    static final class Samples {
        final int n;
        final double[] t;
        final double[] y;
        final double[] w;

        private Samples(double[] t, double[] y, double[] w) {
            this.n = t.length;
            this.t = t;
            this.y = y;
            this.w = w;
        }

        static Samples of(Series series) {
            int m = 0;
            for (int i = 0; i < series.size(); i++) {
                if (!series.isMissing(i) && series.weightAt(i) > 0) {
                    m++;
                }
            }
            if (m < 5) {
                throw new IllegalArgumentException("series '" + series.name() + "' has " + m
                        + " usable samples; the Lomb-Scargle periodogram needs at least 5");
            }
            double[] t = new double[m];
            double[] y = new double[m];
            double[] w = new double[m];
            double sw = 0;
            int j = 0;
            for (int i = 0; i < series.size(); i++) {
                if (!series.isMissing(i) && series.weightAt(i) > 0) {
                    t[j] = series.timeAt(i);
                    y[j] = series.valueAt(i);
                    w[j] = series.weightAt(i);
                    sw += w[j];
                    j++;
                }
            }
            for (int i = 0; i < m; i++) {
                w[i] /= sw;
            }
            return new Samples(t, y, w);
        }

        double weightedTimeVariance() {
            double mt = 0;
            for (int i = 0; i < n; i++) {
                mt += w[i] * t[i];
            }
            double v = 0;
            for (int i = 0; i < n; i++) {
                v += w[i] * (t[i] - mt) * (t[i] - mt);
            }
            return v;
        }

        double amplitudeAt(double f) {
            ToneSums sums = new ToneSums();
            for (int i = 0; i < n; i++) {
                double ang = 2 * Math.PI * f * (t[i] - t[0]);
                sums.add(w[i], y[i], Math.cos(ang), Math.sin(ang));
            }
            // the weights are normalised to sum to one
            return sums.amplitude(1.0, WELL_POSED);
        }
    }
}
