package org.phasewright.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.phasewright.model.Design;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Rows;
import org.phasewright.model.Term;
import org.phasewright.model.TermInference;
import org.phasewright.model.TermReport;
import org.phasewright.series.Series;
import org.phasewright.stats.Distributions;

/**
 * Fits a {@link ModelSpec} to a {@link Series} by (weighted) least squares and computes the full
 * inference: coefficients, covariance s^2 (X'WX)^-1, standard errors, t statistics and two-sided
 * p-values (Student t on n - p degrees of freedom), confidence intervals, per-term reports, R^2,
 * adjusted R^2, the overall F-test, log-likelihood, AIC, BIC, the condition number, the components
 * along the record, leverages on request and warnings.
 *
 * <p>The solver is chosen here, in one place: today every problem goes to the dense Householder QR
 * ({@link DenseQrSolver}); a streaming solver for records too large for memory will be chosen by
 * problem size and return the same {@link LeastSquaresSolution}.
 *
 * <p>Cost: the solver's (2 n p^2 flops for QR) plus two O(n p) passes over the design (components
 * and, when asked, leverages).
 */
public final class Fitter {
    private static final int BLOCK = 2048;

    private Fitter() {
    }

    public static FitResult fit(Series series, ModelSpec spec) {
        return fit(series, spec, FitOptions.defaults());
    }

    public static FitResult fit(Series series, ModelSpec spec, FitOptions options) {
        Design design = Design.bind(spec, series);
        LeastSquaresSolution sol = DenseQrSolver.solve(design, series);
        return assemble(design, series, sol, options);
    }

    static FitResult assemble(Design design, Series series, LeastSquaresSolution sol, FitOptions options) {
        int n = sol.n();
        int p = design.p();
        int dof = n - p;
        double[] beta = sol.beta();
        double[][] c = sol.xtxInverse();
        double sigma2 = dof > 0 ? sol.rss() / dof : Double.NaN;
        double tc = dof > 0 ? Distributions.studentTQuantile(0.5 + options.level() / 2, dof) : Double.NaN;

        boolean centred = sol.constantInSpan();
        double tss = centred ? sol.centredTss() : sol.weightedSumY2();
        double r2 = 1 - sol.rss() / tss;
        int k0 = centred ? 1 : 0;
        double adjR2 = dof > 0 ? 1 - (1 - r2) * (n - k0) / dof : Double.NaN;
        int df1 = p - k0;
        double overallF = Double.NaN;
        double overallP = Double.NaN;
        if (df1 > 0 && dof > 0) {
            overallF = ((tss - sol.rss()) / df1) / sigma2;
            overallP = Distributions.fSurvival(overallF, df1, dof);
        }
        double logL = -0.5 * n * (Math.log(2 * Math.PI) + Math.log(sol.rss() / n) + 1) + 0.5 * sol.sumLogWeights();
        double aic = -2 * logL + 2 * (p + 1);
        double bic = -2 * logL + Math.log(n) * (p + 1);

        double[][] cov = new double[p][p];
        List<CoefficientEstimate> coefs = new ArrayList<>();
        for (int j = 0; j < p; j++) {
            for (int k = 0; k < p; k++) {
                cov[j][k] = dof > 0 ? sigma2 * c[j][k] : Double.NaN;
            }
            double se = Math.sqrt(cov[j][j]);
            double t = beta[j] / se;
            double pv = dof > 0 ? Distributions.studentTTwoSidedP(t, dof) : Double.NaN;
            coefs.add(new CoefficientEstimate(design.columnNames().get(j),
                    design.terms().get(design.termOfColumn(j)).label(), beta[j], se, t, pv, beta[j] - tc * se,
                    beta[j] + tc * se));
        }
        TermInference all = new TermInference(beta, c, sigma2, dof, tc, tss);
        List<TermReport> reports = new ArrayList<>();
        for (int k = 0; k < design.terms().size(); k++) {
            Term term = design.terms().get(k);
            reports.add(term.report(all.slice(design.offset(k), design.offset(k) + term.columns())));
        }

        double[] leverages = options.leverages() ? new double[series.size()] : null;
        Components components = components(design, series, beta, c, leverages);

        List<FitWarning> warnings = new ArrayList<>();
        if (dof == 0) {
            warnings.add(new FitWarning(FitWarning.EXACT_FIT, "the model has as many columns as usable samples ("
                    + n + "): it interpolates the data exactly, and no standard errors, intervals or tests exist"));
        } else if (dof < 5) {
            warnings.add(new FitWarning(FitWarning.FEW_RESIDUAL_DOF, "only " + dof
                    + " residual degrees of freedom remain: the noise level, and every interval, rests on very few samples"));
        }
        double meanSquare = sol.weightedSumY2() / sol.sumWeights();
        if (dof > 0 && sol.rss() / sol.sumWeights() <= 1e-24 * meanSquare) {
            warnings.add(new FitWarning(FitWarning.ROUNDING_LEVEL_RESIDUALS, "the model reproduces the data to rounding"
                    + " error (residual RMS below 1e-12 of the signal's RMS): the data look noise-free, so standard errors,"
                    + " intervals and tests measure only floating-point rounding"));
        }
        if (sol.conditionNumber() > 1e10) {
            warnings.add(new FitWarning(FitWarning.ILL_CONDITIONED, String.format(Locale.ROOT,
                    "the design is ill-conditioned (condition number %.3g after column scaling): about %d of 16 digits"
                            + " of the coefficients may be lost, and terms may be nearly collinear",
                    sol.conditionNumber(), (int) Math.round(Math.log10(sol.conditionNumber())))));
        }
        warnings.addAll(FrequencyChecks.check(design, series.duration()));

        return new FitResult(n, p, dof, options.level(), Math.sqrt(sigma2), sol.rss(), r2, centred, adjR2, overallF,
                df1, dof, overallP, logL, aic, bic, sol.conditionNumber(), coefs, cov, reports, components, warnings,
                Optional.ofNullable(leverages), design);
    }

    /**
     * One pass over the record: the fitted value and each term's part at every sample where the
     * design can be evaluated, the residual at included samples, and optionally the leverages
     * h_ii = w_i x_i' C x_i.
     */
    private static Components components(Design design, Series series, double[] beta, double[][] c,
                                         double[] leverages) {
        int n = series.size();
        int p = design.p();
        List<Term> terms = design.terms();
        double[][] parts = new double[terms.size()][n];
        double[] fitted = new double[n];
        double[] residual = new double[n];
        double[] observed = series.values();
        double[] block = new double[BLOCK * p];
        Rows rows = Rows.of(series);
        for (int from = 0; from < n; from += BLOCK) {
            int to = Math.min(n, from + BLOCK);
            // rows with a missing covariate evaluate to NaN: the model is undefined there
            design.fillRows(rows, from, to, block);
            for (int i = from; i < to; i++) {
                int off = (i - from) * p;
                double total = 0;
                for (int k = 0; k < terms.size(); k++) {
                    double s = 0;
                    for (int j = design.offset(k); j < design.offset(k + 1); j++) {
                        s += block[off + j] * beta[j];
                    }
                    parts[k][i] = s;
                    total += s;
                }
                fitted[i] = total;
                residual[i] = design.isIncluded(i) ? observed[i] - total : Double.NaN;
                if (leverages != null) {
                    if (design.isIncluded(i)) {
                        double h = 0;
                        for (int j = 0; j < p; j++) {
                            double s = 0;
                            for (int k = 0; k < p; k++) {
                                s += c[j][k] * block[off + k];
                            }
                            h += block[off + j] * s;
                        }
                        leverages[i] = series.weightAt(i) * h;
                    } else {
                        leverages[i] = Double.NaN;
                    }
                }
            }
        }
        List<Component> list = new ArrayList<>();
        for (int k = 0; k < terms.size(); k++) {
            list.add(new Component(terms.get(k).label(), terms.get(k).kind(), parts[k]));
        }
        return new Components(series.times(), observed, fitted, residual, list);
    }
}
