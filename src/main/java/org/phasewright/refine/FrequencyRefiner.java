package org.phasewright.refine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.QRDecomposition;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.fit.Fitter;
import org.phasewright.model.Design;
import org.phasewright.model.FrequencyLimits;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.TermSpec;
import org.phasewright.series.Series;
import org.phasewright.stats.Distributions;

/**
 * Refines the frequencies of a model's {@link Sinusoid} terms and the fundamentals of its
 * {@link HarmonicSeries} terms by nonlinear least squares, the amplitudes (and every other linear
 * term: intercept, trends, steps, covariates) solved linearly at each step: variable projection
 * (Golub and Pereyra 1973, SIAM J. Numer. Anal. 10, 413) with Kaufman's (1975, BIT 15, 49)
 * simplified Jacobian {@code J = -P_perp (dPhi/dtheta) c}, minimised by Levenberg-Marquardt
 * (Marquardt 1963) with a diagonal scaling. A harmonic series shares one fundamental: harmonic k's
 * columns move with k times the fundamental.
 *
 * <p>The IEEE Std 1057 four-parameter sine fit (offset, cos, sin amplitudes and frequency) is the
 * special case of an intercept and one sinusoid ({@link SineFit}).
 *
 * <p>Standard errors: {@code s^2 [(J'J)^-1]} for the frequencies, which by the Schur complement equals
 * the frequency block of {@code s^2 (G'G)^-1} with G the Jacobian in all parameters (linear and
 * nonlinear), s^2 = RSS / (n - p - q) — the usual asymptotic covariance of nonlinear least squares
 * (e.g. Seber and Wild 1989, Nonlinear Regression, ch. 2). The linear block of the same matrix gives the
 * amplitudes and phases with the frequencies' uncertainty included ({@link JointInference}). Columns are evaluated internally in time
 * measured from the record's midpoint, which spans the same space and leaves the projected residual
 * and the frequency errors unchanged while keeping the Jacobian well conditioned.
 *
 * <p>Cost per iteration: a QR factorisation of the n x p linear design (2 n p^2 flops) and O(n p q)
 * for the projections; memory n (p + q) doubles for the included rows.
 */
public final class FrequencyRefiner {

    private FrequencyRefiner() {
    }

    public static Refinement refine(Series series, ModelSpec start) {
        return refine(series, start, RefineOptions.defaults());
    }

    /**
     * Refines every frequency of {@code start}.
     *
     * @throws ModelException if the model has no sinusoid or harmonic series, the design is rank
     *                        deficient, or there are too few samples
     */
    public static Refinement refine(Series series, ModelSpec start, RefineOptions options) {
        Problem pb = Problem.of(series, start);
        double record = series.duration();
        double[] theta = pb.startFrequencies();
        double[] lower = new double[theta.length];
        double[] upper = new double[theta.length];
        for (int j = 0; j < theta.length; j++) {
            lower[j] = 0.25 / record / pb.multiplier(j);
            upper[j] = series.isUniform() ? series.rate().getAsDouble() / 2 / pb.topHarmonic(j) * (1 - 1e-9)
                    : Double.MAX_VALUE;
        }
        Step cur = pb.evaluate(theta);
        double lambda = 1e-3;
        boolean converged = false;
        int it = 0;
        double stepTol = options.tolerance() / record;
        while (it < options.maxIterations()) {
            it++;
            int q = theta.length;
            double[][] a = cur.jtj;
            double[] g = cur.jtr;
            boolean improved = false;
            double[] next = null;
            Step trial = null;
            for (int tries = 0; tries < 30; tries++) {
                double[][] m = new double[q][q];
                for (int i = 0; i < q; i++) {
                    System.arraycopy(a[i], 0, m[i], 0, q);
                    m[i][i] += lambda * Math.max(a[i][i], 1e-300);
                }
                double[] delta = solveSymmetric(m, g);
                next = new double[q];
                for (int j = 0; j < q; j++) {
                    next[j] = Math.min(upper[j], Math.max(lower[j], theta[j] - delta[j]));
                }
                trial = pb.evaluate(next);
                if (trial.rss <= cur.rss) {
                    improved = true;
                    break;
                }
                lambda *= 10;
            }
            if (!improved) {
                converged = true; // no descent direction left at machine precision
                break;
            }
            double maxStep = 0;
            for (int j = 0; j < q; j++) {
                maxStep = Math.max(maxStep, Math.abs(next[j] - theta[j]) * pb.multiplier(j));
            }
            double drop = (cur.rss - trial.rss) / Math.max(trial.rss, 1e-300);
            theta = next;
            cur = trial;
            lambda = Math.max(lambda / 10, 1e-12);
            if (maxStep < stepTol || drop < options.tolerance() * 1e-3) {
                converged = true;
                break;
            }
        }
        int dof = pb.n - pb.p - theta.length;
        if (dof <= 0) {
            throw new ModelException("refining " + theta.length + " frequencies with " + pb.p + " linear columns needs more than "
                    + (pb.p + theta.length) + " usable samples; the record has " + pb.n);
        }
        double s2 = cur.rss / dof;
        double[][] inv = invertSymmetric(cur.jtj);
        double tc = Distributions.studentTQuantile(0.5 + options.fit().level() / 2, dof);
        ModelSpec refined = pb.withFrequencies(theta);
        List<RefinedFrequency> out = new ArrayList<>();
        List<FitWarning> warnings = new ArrayList<>();
        List<TermSpec> terms = refined.terms();
        for (int j = 0; j < theta.length; j++) {
            double se = Math.sqrt(s2 * inv[j][j]);
            TermSpec t = terms.get(pb.termIndex(j));
            out.add(new RefinedFrequency(t.label(), t.kind(), pb.startFrequencies()[j], theta[j], se,
                    theta[j] - tc * se, theta[j] + tc * se));
            double moved = Math.abs(theta[j] - pb.startFrequencies()[j]) * record * pb.multiplier(j);
            if (moved > 2) {
                warnings.add(new FitWarning("frequency_moved", String.format(Locale.ROOT,
                        "the %s started at %.6g Hz and moved %.3g resolution bins (1/T) to %.6g Hz: the start was far"
                                + " off, or the refinement locked onto a different peak", t.label(), pb.startFrequencies()[j],
                        moved, theta[j])));
            }
            if (series.isUniform()) {
                double nyq = series.rate().getAsDouble() / 2;
                if (theta[j] * pb.topHarmonic(j) >= nyq * (1 - 1e-6)) {
                    throw new ModelException("the refined " + t.label() + " reached the Nyquist frequency "
                            + TermSpec.hertz(nyq) + "; it cannot be told apart from its alias at "
                            + TermSpec.hertz(FrequencyLimits.alias(theta[j] * pb.topHarmonic(j), 2 * nyq)));
                }
            }
        }
        if (!converged) {
            warnings.add(new FitWarning("not_converged", "the frequency refinement did not converge in "
                    + options.maxIterations() + " iterations; the frequencies reported are the last iterate"));
        }
        FitResult fit = Fitter.fit(series, refined, options.fit());
        warnings.addAll(fit.warnings());
        JointInference.Result joint = JointInference.of(fit, series, pb, theta, inv, cur.rss, dof);
        return new Refinement(refined, out, fit, it, converged, cur.rss, dof, warnings, joint.coefficients(),
                joint.covariance(), joint.terms());
    }

    /** Residual sum of squares and the Kaufman normal equations at one set of frequencies. */
    record Step(double rss, double[][] jtj, double[] jtr) {
    }

    /** The fixed columns and the frequency-dependent terms of a model on the included rows. */
    static final class Problem {
        final int n;
        final int p;
        private final double[] tau;
        private final double[] sqrtW;
        private final double[] y;
        private final double[] fixed; // n x pf row-major, already weighted
        private final int pf;
        private final ModelSpec spec;
        private final int[] termIndex;
        private final int[][] harmonics; // per nonlinear parameter: harmonic numbers of its columns (1 for a sinusoid)
        private final double[] start;

        private Problem(int n, int p, double[] tau, double[] sqrtW, double[] y, double[] fixed, int pf, ModelSpec spec,
                        int[] termIndex, int[][] harmonics, double[] start) {
            this.n = n;
            this.p = p;
            this.tau = tau;
            this.sqrtW = sqrtW;
            this.y = y;
            this.fixed = fixed;
            this.pf = pf;
            this.spec = spec;
            this.termIndex = termIndex;
            this.harmonics = harmonics;
            this.start = start;
        }

        static Problem of(Series series, ModelSpec spec) {
            Design full = Design.bind(spec, series);
            List<TermSpec> fixedTerms = new ArrayList<>();
            List<Integer> idx = new ArrayList<>();
            List<int[]> harm = new ArrayList<>();
            List<Double> f = new ArrayList<>();
            for (int k = 0; k < spec.terms().size(); k++) {
                TermSpec t = spec.terms().get(k);
                if (t instanceof Sinusoid s) {
                    idx.add(k);
                    harm.add(new int[] {1});
                    f.add(s.frequencyHz());
                } else if (t instanceof HarmonicSeries h) {
                    idx.add(k);
                    harm.add(h.keptHarmonics());
                    f.add(h.fundamentalHz());
                } else {
                    fixedTerms.add(t);
                }
            }
            if (idx.isEmpty()) {
                throw new ModelException("the model has no sinusoid or harmonic series whose frequency could be refined");
            }
            int n = full.includedCount();
            double[] tau = new double[n];
            double[] sw = new double[n];
            double[] y = new double[n];
            int[] rowOf = new int[n];
            for (int i = 0, j = 0; i < series.size(); i++) {
                if (full.isIncluded(i)) {
                    rowOf[j] = i;
                    tau[j] = series.timeAt(i);
                    sw[j] = Math.sqrt(series.weightAt(i));
                    y[j] = series.valueAt(i) * sw[j];
                    j++;
                }
            }
            double mid = n > 0 ? 0.5 * (tau[0] + tau[n - 1]) : 0;
            for (int j = 0; j < n; j++) {
                tau[j] -= mid;
            }
            int pf = 0;
            double[] fixedRows = new double[0];
            if (!fixedTerms.isEmpty()) {
                Design fd = Design.bind(new ModelSpec(fixedTerms), series);
                pf = fd.p();
                double[] all = new double[series.size() * pf];
                fd.fillRows(series, 0, series.size(), all);
                fixedRows = new double[n * pf];
                for (int j = 0; j < n; j++) {
                    for (int c = 0; c < pf; c++) {
                        fixedRows[j * pf + c] = all[rowOf[j] * pf + c] * sw[j];
                    }
                }
            }
            int[] ti = idx.stream().mapToInt(Integer::intValue).toArray();
            double[] st = f.stream().mapToDouble(Double::doubleValue).toArray();
            return new Problem(n, full.p(), tau, sw, y, fixedRows, pf, spec, ti, harm.toArray(new int[0][]), st);
        }

        double[] startFrequencies() {
            return start.clone();
        }

        int termIndex(int j) {
            return termIndex[j];
        }

        /** Harmonic numbers of parameter j's cos/sin pairs, in column order (1 for a sinusoid). */
        int[] harmonics(int j) {
            return harmonics[j];
        }

        /** Highest harmonic multiplying parameter j. */
        int topHarmonic(int j) {
            return harmonics[j][harmonics[j].length - 1];
        }

        /** Typical multiplier of parameter j (its highest harmonic), used to scale step tolerances. */
        double multiplier(int j) {
            return topHarmonic(j);
        }

        ModelSpec withFrequencies(double[] theta) {
            List<TermSpec> t = new ArrayList<>(spec.terms());
            for (int j = 0; j < theta.length; j++) {
                TermSpec old = t.get(termIndex[j]);
                if (old instanceof Sinusoid) {
                    t.set(termIndex[j], new Sinusoid(theta[j]));
                } else {
                    HarmonicSeries h = (HarmonicSeries) old;
                    t.set(termIndex[j], new HarmonicSeries(theta[j], h.harmonics(), h.skip()));
                }
            }
            return new ModelSpec(t);
        }

        /** Solves the linear problem at theta and forms J'J and J'r of the projected residual. */
        Step evaluate(double[] theta) {
            int q = theta.length;
            DMatrixRMaj phi = new DMatrixRMaj(n, p);
            double[] pd = phi.data;
            for (int i = 0; i < n; i++) {
                System.arraycopy(fixed, i * pf, pd, i * p, pf);
            }
            int col = pf;
            int[] firstCol = new int[q];
            for (int j = 0; j < q; j++) {
                firstCol[j] = col;
                for (int h : harmonics[j]) {
                    double f = h * theta[j];
                    for (int i = 0; i < n; i++) {
                        double cycles = f * tau[i];
                        double ang = 2 * Math.PI * (cycles - Math.floor(cycles));
                        pd[i * p + col] = Math.cos(ang) * sqrtW[i];
                        pd[i * p + col + 1] = Math.sin(ang) * sqrtW[i];
                    }
                    col += 2;
                }
            }
            if (n <= p) {
                throw new ModelException("the model has " + p + " columns but only " + n + " usable samples");
            }
            QRDecomposition<DMatrixRMaj> qr = DecompositionFactory_DDRM.qr(n, p);
            if (!qr.decompose(phi.copy())) {
                throw new ModelException("the QR factorisation of the design failed");
            }
            DMatrixRMaj qm = qr.getQ(null, true);
            DMatrixRMaj rm = qr.getR(null, true);
            double[] qd = qm.data;
            double rmax = 0;
            for (int k = 0; k < p; k++) {
                rmax = Math.max(rmax, Math.abs(rm.get(k, k)));
            }
            for (int k = 0; k < p; k++) {
                if (Math.abs(rm.get(k, k)) <= 1e-11 * rmax) {
                    throw new ModelException("the design becomes rank deficient at frequencies " + java.util.Arrays.toString(theta)
                            + " Hz (two terms at the same frequency, or a frequency at zero)");
                }
            }
            // c = R^-1 Q'y, residual r = y - Q Q'y
            double[] qty = new double[p];
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < p; k++) {
                    qty[k] += qd[i * p + k] * y[i];
                }
            }
            double[] c = new double[p];
            for (int k = p - 1; k >= 0; k--) {
                double s = qty[k];
                for (int m = k + 1; m < p; m++) {
                    s -= rm.get(k, m) * c[m];
                }
                c[k] = s / rm.get(k, k);
            }
            double[] r = new double[n];
            double rss = 0;
            for (int i = 0; i < n; i++) {
                double fitted = 0;
                for (int k = 0; k < p; k++) {
                    fitted += qd[i * p + k] * qty[k];
                }
                r[i] = y[i] - fitted;
                rss += r[i] * r[i];
            }
            // derivative columns d_j = sum over the parameter's columns of (d column / d theta_j) c
            double[][] d = new double[q][n];
            for (int j = 0; j < q; j++) {
                int cc = firstCol[j];
                for (int h : harmonics[j]) {
                    double a = c[cc];
                    double b = c[cc + 1];
                    for (int i = 0; i < n; i++) {
                        double cosv = pd[i * p + cc];
                        double sinv = pd[i * p + cc + 1];
                        d[j][i] += 2 * Math.PI * h * tau[i] * (-a * sinv + b * cosv);
                    }
                    cc += 2;
                }
            }
            // J_j = -P_perp d_j
            double[][] jac = new double[q][n];
            for (int j = 0; j < q; j++) {
                double[] qtd = new double[p];
                for (int i = 0; i < n; i++) {
                    for (int k = 0; k < p; k++) {
                        qtd[k] += qd[i * p + k] * d[j][i];
                    }
                }
                for (int i = 0; i < n; i++) {
                    double proj = 0;
                    for (int k = 0; k < p; k++) {
                        proj += qd[i * p + k] * qtd[k];
                    }
                    jac[j][i] = -(d[j][i] - proj);
                }
            }
            double[][] jtj = new double[q][q];
            double[] jtr = new double[q];
            for (int a = 0; a < q; a++) {
                for (int b = a; b < q; b++) {
                    double s = 0;
                    for (int i = 0; i < n; i++) {
                        s += jac[a][i] * jac[b][i];
                    }
                    jtj[a][b] = s;
                    jtj[b][a] = s;
                }
                double s = 0;
                for (int i = 0; i < n; i++) {
                    s += jac[a][i] * r[i];
                }
                jtr[a] = s;
            }
            return new Step(rss, jtj, jtr);
        }
    }

    /** Solves A x = b for symmetric positive definite A by Cholesky. */
    static double[] solveSymmetric(double[][] a, double[] b) {
        int q = b.length;
        double[][] l = cholesky(a);
        double[] z = new double[q];
        for (int i = 0; i < q; i++) {
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= l[i][k] * z[k];
            }
            z[i] = s / l[i][i];
        }
        double[] x = new double[q];
        for (int i = q - 1; i >= 0; i--) {
            double s = z[i];
            for (int k = i + 1; k < q; k++) {
                s -= l[k][i] * x[k];
            }
            x[i] = s / l[i][i];
        }
        return x;
    }

    static double[][] invertSymmetric(double[][] a) {
        int q = a.length;
        double[][] inv = new double[q][q];
        for (int j = 0; j < q; j++) {
            double[] e = new double[q];
            e[j] = 1;
            double[] x = solveSymmetric(a, e);
            for (int i = 0; i < q; i++) {
                inv[i][j] = x[i];
            }
        }
        return inv;
    }

    private static double[][] cholesky(double[][] a) {
        int q = a.length;
        double[][] l = new double[q][q];
        for (int j = 0; j < q; j++) {
            double d = a[j][j];
            for (int k = 0; k < j; k++) {
                d -= l[j][k] * l[j][k];
            }
            if (!(d > 0)) {
                throw new ModelException("the frequencies cannot be separated: their Jacobian is singular"
                        + " (two frequencies coincide, or a sinusoid has zero amplitude)");
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
        return l;
    }
}
