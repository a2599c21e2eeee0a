package org.phasewright.spectrum;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.phasewright.series.Series;

/**
 * Re-estimates the frequencies and amplitudes of all peaks together by least squares, so that each
 * peak is no longer pulled by the leakage of its neighbours, of a trend or (for gappy and uneven
 * records) of the sampling's spectral window.
 *
 * <p>Method: the model is a Legendre polynomial of degree d in time plus one cos/sin pair per peak.
 * At fixed frequencies the coefficients are the weighted linear least-squares solution (normal
 * equations, Gaussian elimination with partial pivoting; the sinusoid columns use time from the
 * record's midpoint). Each frequency is then moved, in turn, to the maximum of the single-tone
 * least-squares amplitude of the data with every other fitted part removed (golden-section search
 * within half a resolution bin 1/T of where the peak was found); the linear fit is repeated and the
 * sweep ends when no frequency moves by more than 1e-4/T (at most {@value #MAX_SWEEPS} sweeps). This
 * is cyclic (relaxation) minimisation of the joint nonlinear least-squares criterion, the scheme of the
 * RELAX estimator (J. Li and P. Stoica, 1996, "Efficient mixed-spectrum estimation with applications
 * to target feature extraction", IEEE Trans. Signal Processing 44, 281), started from all peaks at once.
 * Two peaks that meet within half a bin are merged (the weaker is dropped).
 *
 * <p>Frequency standard error ({@link #frequencyStdError}): the Cramér-Rao bound of a single real tone
 * of amplitude A in white noise of variance sigma^2, {@code var(f) = sigma^2 / (2 pi^2 A^2 sum (t_i - tbar)^2)}
 * (S. M. Kay, 1993, Fundamentals of Statistical Signal Processing: Estimation Theory, example 3.14; for
 * uniform sampling it is {@code 6 sigma^2 / (pi^2 A^2 N T^2)}), with sigma^2 the local noise variance
 * read from the spectrum near the peak, {@code sigma^2 = N noise^2 / (4 ENBW)}, so that coloured noise is
 * accounted for where the peak lies.
 *
 * <p>Cost: per sweep O(n p^2) for the normal equations (p = d + 1 + 2 peaks) and O(n) per search step
 * (about 25 per peak); records longer than {@value #MAX_SAMPLES} samples are not re-estimated.
 */
final class JointPeakFit {

    static final int MAX_SWEEPS = 5;
    static final int MAX_SAMPLES = 2_000_000;
    private static final int SEARCH_STEPS = 25;

    private final int n;
    private final double[] t;
    private final double[] y;
    private final double[] w;
    private final double t0;
    private final double t1;
    private final double mid;
    private final int degree;
    /** Sample index in the original record of each observed sample (consecutive indices are one step apart on a uniform grid). */
    private final int[] index;
    private final double step;

    private JointPeakFit(double[] t, double[] y, double[] w, int degree, int[] index, double step) {
        this.index = index;
        this.step = step;
        this.n = t.length;
        this.t = t;
        this.y = y;
        this.w = w;
        this.t0 = t[0];
        this.t1 = t[n - 1];
        this.mid = 0.5 * (t0 + t1);
        this.degree = degree;
    }

    /**
     * The result: the peaks (strongest first), whether they were re-estimated, the number of sweeps, and the
     * residual of the joint fit aligned with the series (NaN at gaps; null when not re-estimated).
     */
    record Outcome(List<Peak> peaks, boolean refined, int sweeps, double[] residual) {
        Outcome(List<Peak> peaks, boolean refined, int sweeps) {
            this(peaks, refined, sweeps, null);
        }
    }

    /**
     * Jointly refined peaks, strongest first. Returns the input peaks, each with its frequency standard
     * error, and {@code refined = false} when the record is too long or the linear fit is singular.
     *
     * @param trendDegree degree of the polynomial fitted with the peaks (0 = a constant)
     * @param enbwBins    equivalent noise bandwidth of the spectrum's window in bins (1 for Lomb-Scargle)
     */
    static Outcome refine(Series s, List<Peak> peaks, int trendDegree, double resolutionHz, double enbwBins) {
        JointPeakFit fit = of(s, Math.max(0, trendDegree));
        if (fit == null || peaks.isEmpty()) {
            return new Outcome(withErrors(peaks, s, enbwBins), false, 0);
        }
        if (fit.n > MAX_SAMPLES || fit.n <= fit.degree + 1 + 2 * peaks.size()) {
            return new Outcome(withErrors(peaks, s, enbwBins), false, 0);
        }
        int k = peaks.size();
        double[] f = new double[k];
        double[] start = new double[k];
        for (int j = 0; j < k; j++) {
            f[j] = peaks.get(j).frequencyHz();
            start[j] = f[j];
        }
        double half = 0.5 * resolutionHz;
        double[] coef = fit.solve(f);
        if (coef == null) {
            return new Outcome(withErrors(peaks, s, enbwBins), false, 0);
        }
        int sweeps = 0;
        double[] r = new double[fit.n];
        double[] yj = new double[fit.n];
        while (sweeps < MAX_SWEEPS) {
            sweeps++;
            fit.residual(f, coef, r);
            double moved = 0;
            for (int j = 0; j < k; j++) {
                fit.addComponent(r, f[j], coef[fit.degree + 1 + 2 * j], coef[fit.degree + 2 + 2 * j], yj);
                double lo = Math.max(start[j] - half, f[j] - half);
                double hi = Math.min(start[j] + half, f[j] + half);
                double g = fit.maximise(yj, lo, hi, f[j]);
                moved = Math.max(moved, Math.abs(g - f[j]));
                f[j] = g;
            }
            double[] next = fit.solve(f);
            if (next == null) {
                return new Outcome(withErrors(peaks, s, enbwBins), false, sweeps);
            }
            coef = next;
            if (moved < 1e-4 * resolutionHz) {
                break;
            }
        }
        fit.residual(f, coef, r);
        double[] aligned = new double[s.size()];
        java.util.Arrays.fill(aligned, Double.NaN);
        for (int i = 0; i < fit.n; i++) {
            aligned[fit.index[i]] = r[i];
        }
        double sdTime = timeSpread(s);
        List<Peak> out = new ArrayList<>();
        for (int j = 0; j < k; j++) {
            Peak p = peaks.get(j);
            double a = Math.hypot(coef[fit.degree + 1 + 2 * j], coef[fit.degree + 2 + 2 * j]);
            double snr = p.noiseAmplitude() > 0 ? 20 * Math.log10(a / p.noiseAmplitude()) : p.snrDb();
            out.add(new Peak(f[j], a, snr, p.noiseAmplitude(), p.gridIndex(),
                    frequencyStdError(p.noiseAmplitude(), a, enbwBins, sdTime)));
        }
        out.sort(Comparator.comparingDouble(Peak::amplitude).reversed());
        List<Peak> kept = new ArrayList<>();
        for (Peak p : out) {
            if (kept.stream().noneMatch(q -> Math.abs(q.frequencyHz() - p.frequencyHz()) < half)) {
                kept.add(p);
            }
        }
        return new Outcome(List.copyOf(kept), true, sweeps, aligned);
    }

    /**
     * Standard error of a peak's frequency in hertz: {@code noise / (2 pi sqrt(2 ENBW) A sd(t))}, the
     * single-tone Cramér-Rao bound with the local noise variance {@code N noise^2 / (4 ENBW)} (see the class
     * comment); {@code sdTime} is the standard deviation of the observed sample times.
     */
    static double frequencyStdError(double noiseAmplitude, double amplitude, double enbwBins, double sdTime) {
        if (!(amplitude > 0) || !(sdTime > 0) || !(noiseAmplitude > 0)) {
            return Double.NaN;
        }
        return noiseAmplitude / (2 * Math.PI * Math.sqrt(2 * enbwBins) * amplitude * sdTime);
    }

    /** The peaks with their frequency standard errors, unchanged otherwise. */
    static List<Peak> withErrors(List<Peak> peaks, Series s, double enbwBins) {
        double sd = timeSpread(s);
        return peaks.stream().map(p -> new Peak(p.frequencyHz(), p.amplitude(), p.snrDb(), p.noiseAmplitude(),
                p.gridIndex(), frequencyStdError(p.noiseAmplitude(), p.amplitude(), enbwBins, sd))).toList();
    }

    /** Standard deviation of the observed sample times. */
    static double timeSpread(Series s) {
        double sum = 0;
        int m = 0;
        for (int i = 0; i < s.size(); i++) {
            if (!s.isMissing(i) && s.weightAt(i) > 0) {
                sum += s.timeAt(i);
                m++;
            }
        }
        if (m < 2) {
            return Double.NaN;
        }
        double mean = sum / m;
        double v = 0;
        for (int i = 0; i < s.size(); i++) {
            if (!s.isMissing(i) && s.weightAt(i) > 0) {
                v += (s.timeAt(i) - mean) * (s.timeAt(i) - mean);
            }
        }
        return Math.sqrt(v / m);
    }

    private static JointPeakFit of(Series s, int degree) {
        int m = 0;
        for (int i = 0; i < s.size(); i++) {
            if (!s.isMissing(i) && s.weightAt(i) > 0) {
                m++;
            }
        }
        if (m < 4) {
            return null;
        }
        double[] t = new double[m];
        double[] y = new double[m];
        double[] w = new double[m];
        int[] index = new int[m];
        int j = 0;
        for (int i = 0; i < s.size(); i++) {
            if (!s.isMissing(i) && s.weightAt(i) > 0) {
                index[j] = i;
                t[j] = s.timeAt(i);
                y[j] = s.valueAt(i);
                w[j] = s.weightAt(i);
                j++;
            }
        }
        if (!(t[m - 1] > t[0])) {
            return null;
        }
        double step = s.isUniform() ? 1 / s.rate().getAsDouble() : Double.NaN;
        return new JointPeakFit(t, y, w, degree, index, step);
    }

    /** Least-squares coefficients [trend 0..d, (cos, sin) per frequency], or null if singular. */
    private double[] solve(double[] f) {
        int k = f.length;
        int p = degree + 1 + 2 * k;
        double[][] a = new double[p][p + 1];
        double[] x = new double[p];
        double[] leg = new double[degree + 1];
        Rotor[] rot = rotors(f);
        for (int i = 0; i < n; i++) {
            Detrend.legendre(2 * (t[i] - t0) / (t1 - t0) - 1, leg);
            System.arraycopy(leg, 0, x, 0, degree + 1);
            for (int j = 0; j < k; j++) {
                rot[j].at(i);
                x[degree + 1 + 2 * j] = rot[j].c;
                x[degree + 2 + 2 * j] = rot[j].s;
            }
            double wi = w[i];
            for (int r = 0; r < p; r++) {
                double wx = wi * x[r];
                double[] row = a[r];
                for (int c = r; c < p; c++) {
                    row[c] += wx * x[c];
                }
                row[p] += wx * y[i];
            }
        }
        for (int r = 0; r < p; r++) {
            for (int c = 0; c < r; c++) {
                a[r][c] = a[c][r];
            }
        }
        return Detrend.solve(a);
    }

    private void residual(double[] f, double[] coef, double[] out) {
        double[] leg = new double[degree + 1];
        Rotor[] rot = rotors(f);
        for (int i = 0; i < n; i++) {
            Detrend.legendre(2 * (t[i] - t0) / (t1 - t0) - 1, leg);
            double v = y[i];
            for (int d = 0; d <= degree; d++) {
                v -= coef[d] * leg[d];
            }
            for (int j = 0; j < f.length; j++) {
                rot[j].at(i);
                v -= coef[degree + 1 + 2 * j] * rot[j].c + coef[degree + 2 + 2 * j] * rot[j].s;
            }
            out[i] = v;
        }
    }

    private void addComponent(double[] r, double f, double a, double b, double[] out) {
        Rotor rot = new Rotor(f);
        for (int i = 0; i < n; i++) {
            rot.at(i);
            out[i] = r[i] + a * rot.c + b * rot.s;
        }
    }

    /** Golden-section maximum of the single-tone amplitude of {@code v} on [lo, hi]; {@code at} if that is higher. */
    private double maximise(double[] v, double lo, double hi, double at) {
        return GoldenSection.maximise(f -> toneAmplitude(v, f), lo, hi, at, SEARCH_STEPS);
    }

    /**
     * Amplitude of the weighted least-squares fit of {@code c + a cos + b sin} at frequency f to v (a
     * floating-mean single tone); 0 where cos and sin are nearly collinear.
     */
    private double toneAmplitude(double[] v, double f) {
        ToneSums sums = new ToneSums();
        Rotor rot = new Rotor(f);
        for (int i = 0; i < n; i++) {
            rot.at(i);
            sums.add(w[i], v[i], rot.c, rot.s);
        }
        return sums.amplitude(sums.totalWeight(), 0.01);
    }

    private Rotor[] rotors(double[] f) {
        Rotor[] r = new Rotor[f.length];
        for (int j = 0; j < f.length; j++) {
            r[j] = new Rotor(f[j]);
        }
        return r;
    }

    /**
     * cos and sin of 2 pi f (t_i - mid) at successive observed samples: exact at the first sample, every
     * 256 samples and after a gap, otherwise one rotation by the angle of a sampling step (uniform records);
     * exact everywhere for uneven records.
     */
    private final class Rotor {
        private final double om;
        private final double cd;
        private final double sd;
        double c;
        double s;

        Rotor(double f) {
            om = 2 * Math.PI * f;
            cd = Math.cos(om * step);
            sd = Math.sin(om * step);
        }

        void at(int i) {
            if (Double.isNaN(step) || (i & 255) == 0 || index[i] - index[i - 1] != 1) {
                double ang = om * (t[i] - mid);
                c = Math.cos(ang);
                s = Math.sin(ang);
            } else {
                double c2 = c * cd - s * sd;
                s = s * cd + c * sd;
                c = c2;
            }
        }
    }
}
