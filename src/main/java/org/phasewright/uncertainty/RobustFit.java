package org.phasewright.uncertainty;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.phasewright.fit.Component;
import org.phasewright.fit.Components;
import org.phasewright.fit.FitOptions;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.Design;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Rows;
import org.phasewright.model.Term;
import org.phasewright.series.Series;

/**
 * Robust fitting for spikes and dropouts: M-estimation by iteratively reweighted least squares
 * (Holland and Welsch 1977, Commun. Statist. A6, 813), starting from ordinary least squares; the
 * scale is re-estimated every iteration as MAD / 0.6745 of the residuals (median absolute residual,
 * consistent for the normal SD). Bisquare, whose objective is not convex, starts from the Huber
 * solution. Series weights multiply the robustness weights.
 *
 * <p>Covariance (Huber 1981, Robust Statistics, sec. 7.6, eq. 6.5 with the correction factor K):
 * {@code V = K^2 [sum psi(r_i)^2 / (n - p)] / [sum psi'(r_i) / n]^2 s^2 (X'WX)^-1}, r_i = e_i / s,
 * {@code K = 1 + (p / n) var(psi') / mean(psi')^2}; intervals and tests use t on n - p degrees of
 * freedom. Cost per iteration: one weighted QR solve, 2 n p^2 flops.
 *
 * <p>The result carries what a least-squares fit carries: term reports and coefficients from the robust
 * estimates, the robust fit laid out along the record ({@link Components}: observed, fitted, residual,
 * one part per term), the final robustness weight of every sample and the residual scale behind the
 * standard errors; plus one O(n p) pass for the components.
 */
public final class RobustFit {

    private static final int MAX_ITERATIONS = 100;
    private static final double TOLERANCE = 1e-9;
    private static final int BLOCK = 2048;

    private RobustFit() {
    }

    public static RobustResult fit(Series series, ModelSpec spec, RobustLoss loss) {
        return fit(series, spec, loss, loss.defaultTuning(), FitOptions.defaults());
    }

    public static RobustResult fit(Series series, ModelSpec spec, RobustLoss loss, double tuning, FitOptions options) {
        if (!(tuning > 0)) {
            throw new IllegalArgumentException("robust tuning constant must be positive, got " + tuning);
        }
        FitResult plain = Fitter.fit(series, spec, options);
        DenseRows rows = DenseRows.of(plain.design(), series);
        int n = rows.n;
        int p = rows.p;
        if (n - p < 3) {
            throw new ModelException("a robust fit needs at least 3 residual degrees of freedom; the model leaves " + (n - p));
        }
        double[] beta = plain.beta();
        int iterations = 0;
        boolean converged = false;
        double[] w = new double[n];
        for (RobustLoss stage : loss == RobustLoss.BISQUARE ? new RobustLoss[] {RobustLoss.HUBER, RobustLoss.BISQUARE}
                : new RobustLoss[] {RobustLoss.HUBER}) {
            double c = stage == loss ? tuning : stage.defaultTuning();
            converged = false;
            for (int it = 0; it < MAX_ITERATIONS; it++) {
                iterations++;
                double[] e = rows.residuals(beta);
                double s = scale(e);
                if (!(s > 0)) {
                    converged = true; // exact fit of the majority: nothing left to reweight
                    break;
                }
                for (int i = 0; i < n; i++) {
                    w[i] = stage.weight(e[i] / s, c);
                }
                double[] next = weightedSolve(rows, w);
                double change = 0;
                double size = 0;
                for (int j = 0; j < p; j++) {
                    change = Math.max(change, Math.abs(next[j] - beta[j]));
                    size = Math.max(size, Math.abs(next[j]));
                }
                beta = next;
                if (change <= TOLERANCE * Math.max(size, 1e-300)) {
                    converged = true;
                    break;
                }
            }
        }
        double[] e = rows.residuals(beta);
        double s = scale(e);
        double sumPsi2 = 0;
        double sumD = 0;
        double sumD2 = 0;
        double[] weightsOut = new double[series.size()];
        Arrays.fill(weightsOut, Double.NaN);
        int down = 0;
        for (int i = 0; i < n; i++) {
            double r = s > 0 ? e[i] / s : 0;
            double psi = loss.psi(r, tuning);
            double d = loss.psiPrime(r, tuning);
            sumPsi2 += psi * psi;
            sumD += d;
            sumD2 += d * d;
            double wi = loss.weight(r, tuning);
            weightsOut[rows.index[i]] = Math.max(0.0, wi); // psi(r) / r is -0.0 for a rejected negative residual
            if (wi < 0.5) {
                down++;
            }
        }
        double meanD = sumD / n;
        if (!(meanD > 0)) {
            throw new ModelException("the robust fit rejected every sample; the tuning constant " + tuning + " is too small");
        }
        double varD = sumD2 / n - meanD * meanD;
        double k = 1 + (p / (double) n) * varD / (meanD * meanD);
        double factor = k * k * (sumPsi2 / (n - p)) / (meanD * meanD) * s * s;
        double s2plain = plain.residualSd() * plain.residualSd();
        double[][] cov = plain.covariance();
        for (double[] row : cov) {
            for (int j = 0; j < p; j++) {
                row[j] = row[j] / s2plain * factor;
            }
        }
        int dof = n - p;
        return new RobustResult(loss, tuning, s, n, p, dof, plain.level(),
                Reports.coefficients(plain.design(), beta, cov, dof, plain.level()), cov, Reports.terms(plain, beta, cov, dof),
                components(plain.design(), series, beta), weightsOut, down, iterations, converged, plain);
    }

    /**
     * The robust fit along the record, as {@link Fitter} lays out a least-squares fit: each term's part
     * (its columns times its robust coefficients, by {@link Design#fillRows} in blocks), their sum as the
     * fitted value wherever the design can be evaluated (gaps too), and observed minus fitted at the
     * samples that entered the fit (NaN elsewhere). One O(n p) pass.
     */
    static Components components(Design design, Series series, double[] beta) {
        int size = series.size();
        int p = design.p();
        List<Term> terms = design.terms();
        double[][] parts = new double[terms.size()][size];
        double[] fitted = new double[size];
        double[] residual = new double[size];
        double[] observed = series.values();
        double[] block = new double[BLOCK * p];
        Rows rows = Rows.of(series);
        for (int from = 0; from < size; from += BLOCK) {
            int to = Math.min(size, from + BLOCK);
            design.fillRows(rows, from, to, block);
            for (int i = from; i < to; i++) {
                int off = (i - from) * p;
                double total = 0;
                for (int k = 0; k < terms.size(); k++) {
                    double part = 0;
                    for (int j = design.offset(k); j < design.offset(k + 1); j++) {
                        part += block[off + j] * beta[j];
                    }
                    parts[k][i] = part;
                    total += part;
                }
                fitted[i] = total;
                residual[i] = design.isIncluded(i) ? observed[i] - total : Double.NaN;
            }
        }
        List<Component> list = new ArrayList<>();
        for (int k = 0; k < terms.size(); k++) {
            list.add(new Component(terms.get(k).label(), terms.get(k).kind(), parts[k]));
        }
        return new Components(series.times(), observed, fitted, residual, list);
    }

    /** MAD / 0.6745: the median absolute residual scaled to the normal SD. */
    static double scale(double[] e) {
        double[] a = new double[e.length];
        for (int i = 0; i < e.length; i++) {
            a[i] = Math.abs(e[i]);
        }
        Arrays.sort(a);
        int m = a.length;
        double med = m % 2 == 1 ? a[m / 2] : 0.5 * (a[m / 2 - 1] + a[m / 2]);
        return med / 0.6744897501960817;
    }

    private static double[] weightedSolve(DenseRows rows, double[] w) {
        int n = rows.n;
        int p = rows.p;
        DMatrixRMaj a = new DMatrixRMaj(n, p);
        DMatrixRMaj b = new DMatrixRMaj(n, 1);
        for (int i = 0; i < n; i++) {
            double sw = Math.sqrt(w[i]);
            for (int j = 0; j < p; j++) {
                a.data[i * p + j] = rows.x[i * p + j] * sw;
            }
            b.data[i] = rows.y[i] * sw;
        }
        LinearSolverDense<DMatrixRMaj> solver = LinearSolverFactory_DDRM.qr(n, p);
        if (!solver.setA(a)) {
            throw new ModelException("the robust fit rejected so many samples that the design became singular");
        }
        DMatrixRMaj x = new DMatrixRMaj(p, 1);
        solver.solve(b, x);
        return x.data;
    }
}
