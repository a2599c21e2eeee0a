package org.phasewright.uncertainty;

import java.util.ArrayList;
import java.util.List;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.FitOptions;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.Design;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.Term;
import org.phasewright.model.TermReport;
import org.phasewright.series.Series;

/**
 * Standard errors that stay honest when the residual noise is autocorrelated. The least-squares
 * estimates are kept (for polynomial and trigonometric regressors they are asymptotically as
 * efficient as generalised least squares: Grenander 1954, Ann. Math. Stat. 25, 252); only their
 * covariance changes. Methods ({@link SeMethod}):
 * <ul>
 *   <li>{@code ar} (recommended): fit an AR(p) model to the residuals (Yule-Walker, order by AIC up to
 *       {@code maxArOrder}), then {@code V = C (X' Gamma X) C}, C = (X'WX)^-1, Gamma the AR model's
 *       autocovariance matrix over the observed grid — the parametric sandwich of feasible GLS theory
 *       (e.g. Cochrane and Orcutt 1949; Prais and Winsten 1954 for the AR(1) case). Reference
 *       distribution t with n - p - (AR order) degrees of freedom, the order kept below n - p. Uniform records
 *       only (gaps allowed).
 *       Cost O(n K p^2), K the lag at which the AR autocovariance falls below 1e-10 of the variance.</li>
 *   <li>{@code hac}: Newey and West (1987, Econometrica 55, 703) with Bartlett weights 1 - k/(m+1) and
 *       m from the AR(1) plug-in rule of Andrews (1991, Econometrica 59, 817, eq. 6.4):
 *       m = 1.1447 (alpha(1) n)^(1/3), alpha(1) = sum 4 rho^2 s^4 / ((1-rho)^6 (1+rho)^2) /
 *       sum s^4 / (1-rho)^4 over the non-constant score series x_j e; scaled by n/(n-p). Cost O(n m p^2).</li>
 *   <li>{@code local_spectrum}: for each sinusoid, the plain covariance of its cos/sin pair is scaled by
 *       the ratio of the residual periodogram averaged over +-B resolution bins around its frequency
 *       (excluding the bin itself, where the fit removed the residual) to the residual variance RSS / (n - p): the
 *       large-sample variance of a least-squares sinusoid coefficient is 2 S(f) / n for noise of spectral
 *       density S (Hannan 1970, Multiple Time Series, ch. VII). Other terms keep plain errors. Works for
 *       uneven and gappy records (direct Fourier sums). Cost O(n B) per sinusoid.</li>
 * </ul>
 */
public final class SeCorrection {

    private SeCorrection() {
    }

    /** Fits {@code spec} and applies the correction. */
    public static CorrectedInference fit(Series series, ModelSpec spec, CorrectionOptions options, FitOptions fitOptions) {
        return apply(Fitter.fit(series, spec, fitOptions), series, options);
    }

    /** Applies the correction to a plain fit of {@code series}. */
    public static CorrectedInference apply(FitResult plain, Series series, CorrectionOptions options) {
        if (plain.dof() < 3) {
            throw new ModelException("a standard-error correction needs at least 3 residual degrees of freedom; the fit has "
                    + plain.dof());
        }
        return switch (options.method()) {
            case PLAIN -> new CorrectedInference(SeMethod.PLAIN, SeMethod.PLAIN.description(), plain.coefficients(),
                    plain.covariance(), plain.terms(), plain.dof(), new double[0], Double.NaN, List.of(), plain);
            case AR_NOISE -> arNoise(plain, series, options);
            case NEWEY_WEST -> neweyWest(plain, series);
            case LOCAL_SPECTRUM -> localSpectrum(plain, series, options);
        };
    }

    private static void requireUniform(Series series, SeMethod m) {
        if (!series.isUniform()) {
            throw new ModelException("the '" + m.id() + "' standard errors need a uniformly sampled record (lags in samples);"
                    + " this record is uneven: use local_spectrum instead");
        }
    }

    private static double[][] unscaled(FitResult plain) {
        double s2 = plain.residualSd() * plain.residualSd();
        double[][] cov = plain.covariance();
        double[][] c = new double[cov.length][cov.length];
        for (int i = 0; i < cov.length; i++) {
            for (int j = 0; j < cov.length; j++) {
                c[i][j] = cov[i][j] / s2;
            }
        }
        return c;
    }

    private static CorrectedInference arNoise(FitResult plain, Series series, CorrectionOptions options) {
        requireUniform(series, SeMethod.AR_NOISE);
        Design design = plain.design();
        DenseRows rows = DenseRows.of(design, series);
        double[] beta = plain.beta();
        double[] e = rows.residuals(beta);
        // each AR coefficient costs a degree of freedom of the t reference: keep at least one
        ArNoise ar = ArNoise.fit(e, rows.index, Math.min(options.maxArOrder(), plain.dof() - 1));
        int p = rows.p;
        // the residual variance understates the noise variance by (n - p) / n; rescale as s^2 does
        double scale = rows.n / (double) (rows.n - p);
        double[] gamma = ar.autocovariance(rows.index[rows.n - 1] - rows.index[0]);
        int maxLag = gamma.length - 1;
        double[][] m = new double[p][p];
        int first = rows.index[0];
        int span = rows.index[rows.n - 1] - first + 1;
        int[] rowAt = new int[span];
        java.util.Arrays.fill(rowAt, -1);
        for (int i = 0; i < rows.n; i++) {
            rowAt[rows.index[i] - first] = i;
        }
        double[] x = rows.x;
        for (int i = 0; i < rows.n; i++) {
            int gi = rows.index[i] - first;
            for (int k = 0; k <= maxLag && gi + k < span; k++) {
                int j = rowAt[gi + k];
                if (j < 0) {
                    continue;
                }
                double g = gamma[k] * scale;
                for (int a = 0; a < p; a++) {
                    double xa = x[i * p + a];
                    double xja = x[j * p + a];
                    for (int b = 0; b < p; b++) {
                        double v = xa * x[j * p + b];
                        if (k > 0) {
                            v += xja * x[i * p + b];
                        }
                        m[a][b] += g * v;
                    }
                }
            }
        }
        double[][] cov = DenseRows.sandwich(unscaled(plain), m);
        int dof = plain.dof() - ar.phi().length;
        String desc = ar.phi().length == 0
                ? "least-squares estimates; standard errors from a model of the residual noise, which the order"
                        + " selection found white (AR order 0), so they equal the plain ones"
                : SeMethod.AR_NOISE.description().replace("AR(p)", "AR(" + ar.phi().length + ")")
                        + " (coefficients " + format(ar.phi()) + ")";
        return new CorrectedInference(SeMethod.AR_NOISE, desc, Reports.coefficients(design, beta, cov, dof, plain.level()),
                cov, Reports.terms(plain, beta, cov, dof), dof, ar.phi(), Double.NaN, List.of(), plain);
    }

    private static CorrectedInference neweyWest(FitResult plain, Series series) {
        requireUniform(series, SeMethod.NEWEY_WEST);
        Design design = plain.design();
        DenseRows rows = DenseRows.of(design, series);
        double[] beta = plain.beta();
        double[] e = rows.residuals(beta);
        int n = rows.n;
        int p = rows.p;
        double[] v = new double[n * p];
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < p; a++) {
                v[i * p + a] = rows.x[i * p + a] * e[i];
            }
        }
        double num = 0;
        double den = 0;
        for (int a = 0; a < p; a++) {
            boolean constant = true;
            for (int i = 1; i < n && constant; i++) {
                constant = rows.x[i * p + a] == rows.x[a];
            }
            if (constant) {
                continue;
            }
            double sxx = 0;
            double sxy = 0;
            for (int i = 1; i < n; i++) {
                sxx += v[(i - 1) * p + a] * v[(i - 1) * p + a];
                sxy += v[(i - 1) * p + a] * v[i * p + a];
            }
            double rho = sxx > 0 ? sxy / sxx : 0;
            rho = Math.max(-0.97, Math.min(0.97, rho));
            double ss = 0;
            for (int i = 1; i < n; i++) {
                double u = v[i * p + a] - rho * v[(i - 1) * p + a];
                ss += u * u;
            }
            double s2 = ss / (n - 1);
            num += 4 * rho * rho * s2 * s2 / (Math.pow(1 - rho, 6) * Math.pow(1 + rho, 2));
            den += s2 * s2 / Math.pow(1 - rho, 4);
        }
        double alpha = den > 0 ? num / den : 0;
        double bw = 1.1447 * Math.cbrt(alpha * n);
        int m = (int) Math.min(n - 1, Math.floor(bw));
        double[][] s = new double[p][p];
        for (int k = 0; k <= m; k++) {
            double w = k == 0 ? 1 : 1 - k / (m + 1.0);
            for (int i = k; i < n; i++) {
                for (int a = 0; a < p; a++) {
                    double va = v[i * p + a];
                    double vka = v[(i - k) * p + a];
                    for (int b = 0; b < p; b++) {
                        double g = va * v[(i - k) * p + b];
                        if (k > 0) {
                            g += vka * v[i * p + b];
                        }
                        s[a][b] += w * g;
                    }
                }
            }
        }
        double adj = n / (double) (n - p);
        for (double[] row : s) {
            for (int b = 0; b < p; b++) {
                row[b] *= adj;
            }
        }
        double[][] cov = DenseRows.sandwich(unscaled(plain), s);
        int dof = plain.dof();
        String desc = SeMethod.NEWEY_WEST.description() + " (truncation lag " + m + ")";
        return new CorrectedInference(SeMethod.NEWEY_WEST, desc, Reports.coefficients(design, beta, cov, dof, plain.level()),
                cov, Reports.terms(plain, beta, cov, dof), dof, new double[0], m, List.of(), plain);
    }

    private static CorrectedInference localSpectrum(FitResult plain, Series series, CorrectionOptions options) {
        Design design = plain.design();
        DenseRows rows = DenseRows.of(design, series);
        double[] beta = plain.beta();
        double[] e = rows.residuals(beta);
        double var = 0;
        for (double v : e) {
            var += v * v;
        }
        // the unbiased residual variance, as in the plain s^2: white noise then gives ratios near 1 whatever p is
        var /= rows.n - rows.p;
        double record = series.duration();
        double[][] cov = new double[rows.p][];
        for (int i = 0; i < rows.p; i++) {
            cov[i] = plain.covariance()[i].clone(); // never scale the plain fit's own matrix
        }
        List<LocalNoise> notes = new ArrayList<>();
        for (int k = 0; k < design.terms().size(); k++) {
            Term term = design.terms().get(k);
            double[] fs = term.frequencies();
            TermReport plainReport = plain.terms().get(k);
            for (int h = 0; h < fs.length; h++) {
                String label = plainReport instanceof HarmonicSeriesReport hs ? hs.harmonics().get(h).label()
                        : ((SinusoidReport) plainReport).label();
                int[] used = new int[1];
                double ratio = bandPeriodogram(e, rows.time, fs[h], record, options.bandHalfWidthBins(), used) / var;
                notes.add(new LocalNoise(label, fs[h], ratio, used[0]));
                int c0 = design.offset(k) + 2 * h;
                for (int a = c0; a < c0 + 2; a++) {
                    for (int b = 0; b < cov.length; b++) {
                        double f = (b >= c0 && b < c0 + 2) ? ratio : Math.sqrt(ratio);
                        cov[a][b] *= f;
                        if (b < c0 || b >= c0 + 2) {
                            cov[b][a] *= f;
                        }
                    }
                }
            }
        }
        int dof = plain.dof();
        List<CoefficientEstimate> coefs = Reports.coefficients(design, beta, cov, dof, plain.level());
        return new CorrectedInference(SeMethod.LOCAL_SPECTRUM, SeMethod.LOCAL_SPECTRUM.description() + " (+-"
                + options.bandHalfWidthBins() + " bins)", coefs, cov, Reports.terms(plain, beta, cov, dof), dof, new double[0],
                Double.NaN, notes, plain);
    }

    /**
     * Mean of |sum e_t exp(-i 2 pi g t)|^2 / n over g = f + j / T for 2 <= |j| <= B (and g > 0).
     */
    static double bandPeriodogram(double[] e, double[] t, double f, double record, int halfWidth, int[] used) {
        double sum = 0;
        int count = 0;
        int n = e.length;
        for (int j = -halfWidth; j <= halfWidth; j++) {
            if (Math.abs(j) < 2) {
                continue;
            }
            double g = f + j / record;
            if (g <= 0.5 / record) {
                continue;
            }
            double re = 0;
            double im = 0;
            for (int i = 0; i < n; i++) {
                double cycles = g * t[i];
                double ang = 2 * Math.PI * (cycles - Math.floor(cycles));
                re += e[i] * Math.cos(ang);
                im += e[i] * Math.sin(ang);
            }
            sum += (re * re + im * im) / n;
            count++;
        }
        used[0] = count;
        if (count == 0) {
            throw new ModelException("no residual periodogram ordinates lie near " + f + " Hz; the record is too short");
        }
        return sum / count;
    }

    private static String format(double[] v) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < v.length; i++) {
            b.append(i == 0 ? "" : ", ").append(String.format(java.util.Locale.ROOT, "%.3f", v[i]));
        }
        return v.length == 0 ? "none: white" : b.toString();
    }
}
