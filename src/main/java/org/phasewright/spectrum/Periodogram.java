package org.phasewright.spectrum;

import org.jtransforms.fft.DoubleFFT_1D;
import org.phasewright.series.Series;

/**
 * Amplitude periodogram of uniformly sampled data by FFT (JTransforms {@link DoubleFFT_1D}).
 *
 * <p>Method: optional mean removal, multiplication by the {@link Window}, zero padding to
 * {@code M >= zeroPad * n} points (M even), a real forward FFT, and the scaling
 * {@code A_k = c_k |X_k| / sum(w)} with c_k = 2 except at 0 and M/2 (c = 1). With this scaling a
 * tone {@code A cos(2 pi f t + phi)} on a bin reads exactly A; off the bin it reads A times the
 * window's scalloping response (at most 3.9 dB low for rectangular, 1.4 dB Hann, under 0.01 dB
 * flat top). The grid runs from 0 to the Nyquist frequency in steps of rate/M.
 *
 * <p>Peak interpolation ({@link #interpolatePeak(Spectrum, int)}): the parabola through the natural
 * logarithms of the three amplitudes around a local maximum (the "quadratic interpolation on the
 * dB magnitude" of J. O. Smith and X. Serra, 1987, PARSHL, Proc. ICMC; exact for a Gaussian main lobe,
 * a good fit to Hann and Blackman-Harris lobes). The amplitude at the interpolated frequency is then
 * read by direct evaluation of the windowed discrete-time Fourier transform
 * ({@link #probe(Series, PeriodogramOptions)}), so scalloping loss does not bias it.
 *
 * <p>Cost: O(M log M) time and 2M doubles of memory for the spectrum; O(n) per probe.
 */
public final class Periodogram {

    private Periodogram() {
    }

    /**
     * The periodogram of a uniform series without gaps.
     *
     * @throws IllegalArgumentException if the series is uneven, has gaps or fewer than 4 samples
     */
    public static Spectrum of(Series series, PeriodogramOptions options) {
        requireUniformComplete(series);
        return of(series.values(), series.rate().getAsDouble(), options);
    }

    /** The periodogram of samples taken at {@code rateHz} (no NaN allowed). */
    public static Spectrum of(double[] values, double rateHz, PeriodogramOptions options) {
        int n = values.length;
        if (n < 4) {
            throw new IllegalArgumentException("a periodogram needs at least 4 samples, got " + n);
        }
        double[] w = options.window().weights(n);
        double mean = options.removeMean() ? mean(values) : 0;
        int m = paddedLength(n, options.zeroPad());
        double[] buf = new double[m];
        double sumW = 0;
        for (int i = 0; i < n; i++) {
            buf[i] = (values[i] - mean) * w[i];
            sumW += w[i];
        }
        new DoubleFFT_1D(m).realForward(buf);
        int bins = m / 2 + 1;
        double[] freq = new double[bins];
        double[] amp = new double[bins];
        freq[0] = 0;
        amp[0] = Math.abs(buf[0]) / sumW;
        for (int k = 1; k < m / 2; k++) {
            freq[k] = k * rateHz / m;
            amp[k] = 2 * Math.hypot(buf[2 * k], buf[2 * k + 1]) / sumW;
        }
        freq[m / 2] = rateHz / 2;
        amp[m / 2] = Math.abs(buf[1]) / sumW;
        return new Spectrum("fft", options.window(), freq, amp, rateHz / m, rateHz / n,
                options.window().noiseBandwidthBins(), n, n / rateHz);
    }

    /** FFT length used for n samples and a padding factor: the smallest even M >= factor * n. */
    static int paddedLength(int n, int factor) {
        long m = (long) n * factor;
        if (m % 2 == 1) {
            m++;
        }
        if (m > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("padded FFT length " + m + " is too large; lower the zero padding");
        }
        return (int) m;
    }

    /**
     * Frequency of the peak near grid index {@code k} by the log-parabola through k-1, k, k+1;
     * returns the grid frequency when k is at an end of the grid or a neighbour is zero.
     */
    public static double interpolatePeak(Spectrum s, int k) {
        if (k <= 0 || k >= s.size() - 1) {
            return s.frequencyAt(k);
        }
        double a = s.amplitudeAt(k - 1);
        double b = s.amplitudeAt(k);
        double c = s.amplitudeAt(k + 1);
        if (!(a > 0 && b > 0 && c > 0)) {
            return s.frequencyAt(k);
        }
        double la = Math.log(a);
        double lb = Math.log(b);
        double lc = Math.log(c);
        double den = la - 2 * lb + lc;
        if (!(den < 0)) {
            return s.frequencyAt(k);
        }
        double delta = 0.5 * (la - lc) / den;
        delta = Math.max(-0.5, Math.min(0.5, delta));
        return s.frequencyAt(k) + delta * s.gridStepHz();
    }

    /**
     * A probe that evaluates the windowed DTFT amplitude {@code 2 |sum w_n (x_n - mean) e^{-i 2 pi f n / rate}| / sum w}
     * at any frequency; the contribution of the tone's negative-frequency image is ignored, which
     * matters only within a few resolution bins of 0 Hz or Nyquist.
     */
    public static ToneProbe probe(Series series, PeriodogramOptions options) {
        requireUniformComplete(series);
        return probe(series.values(), series.rate().getAsDouble(), options);
    }

    /** As {@link #probe(Series, PeriodogramOptions)} for raw samples at {@code rateHz}. */
    public static ToneProbe probe(double[] values, double rateHz, PeriodogramOptions options) {
        int n = values.length;
        double[] w = options.window().weights(n);
        double mean = options.removeMean() ? mean(values) : 0;
        double[] xw = new double[n];
        double sw = 0;
        for (int i = 0; i < n; i++) {
            xw[i] = (values[i] - mean) * w[i];
            sw += w[i];
        }
        final double sumW = sw;
        return f -> {
            double[] z = dtft(xw, f / rateHz);
            double scale = (f == 0 || Math.abs(f - rateHz / 2) < 1e-12 * rateHz) ? 1 : 2;
            return scale * Math.hypot(z[0], z[1]) / sumW;
        };
    }

    /** sum_n x_n exp(-i 2 pi nu n) for nu in cycles per sample, by a rotation recurrence reset every 512 steps. */
    static double[] dtft(double[] x, double nu) {
        double re = 0;
        double im = 0;
        double step = 2 * Math.PI * nu;
        double cd = Math.cos(step);
        double sd = Math.sin(step);
        double c = 1;
        double s = 0;
        for (int i = 0; i < x.length; i++) {
            if ((i & 511) == 0) {
                double ang = step * i;
                c = Math.cos(ang);
                s = Math.sin(ang);
            }
            re += x[i] * c;
            im -= x[i] * s;
            double c2 = c * cd - s * sd;
            s = s * cd + c * sd;
            c = c2;
        }
        return new double[] {re, im};
    }

    static void requireUniformComplete(Series series) {
        if (!series.isUniform()) {
            throw new IllegalArgumentException("series '" + series.name()
                    + "' is unevenly sampled; the FFT periodogram needs a uniform grid (use the Lomb-Scargle periodogram)");
        }
        int gaps = series.missingCount();
        if (gaps > 0) {
            throw new IllegalArgumentException("series '" + series.name() + "' has " + gaps
                    + " missing samples; the FFT periodogram needs a complete record (use the Lomb-Scargle periodogram)");
        }
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }
}
