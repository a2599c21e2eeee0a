package org.phasewright.refine;

import java.util.ArrayList;
import java.util.List;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.FitResult;
import org.phasewright.model.Design;
import org.phasewright.model.GroupReport;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.ScalarReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.Term;
import org.phasewright.model.TermInference;
import org.phasewright.model.TermReport;
import org.phasewright.series.Series;
import org.phasewright.stats.Distributions;

/**
 * The linear coefficients' covariance once the frequencies are estimated too: the linear block of
 * s^2 (G'WG)^-1, G = [X, D] the Jacobian of the fitted values in the linear coefficients (X, the design)
 * and the frequencies (D_j = sum over the parameter's harmonics h of 2 pi h t (-a_h sin + b_h cos), t from
 * the record's time zero, as the phases are reported). By the block inverse it is
 * s^2 (C + B S^-1 B'), C = (X'WX)^-1, B = C X'WD, S = D'W P_perp D the projected (Kaufman) normal matrix,
 * s^2 = RSS / (n - p - q) (Seber and Wild 1989, Nonlinear Regression, ch. 2). A phase referred to a time
 * far from the record's middle inherits 2 pi h t_mid times the frequency's error; amplitudes barely move.
 * Cost O(n p q + p^2 q).
 */
final class JointInference {

    record Result(List<CoefficientEstimate> coefficients, double[][] covariance, List<TermReport> terms) {
    }

    private JointInference() {
    }

    static Result of(FitResult fit, Series series, FrequencyRefiner.Problem pb, double[] theta, double[][] sInverse,
                     double rss, int dof) {
        Design design = fit.design();
        int p = design.p();
        int q = theta.length;
        double s2fit = fit.residualSd() * fit.residualSd();
        double s2 = rss / dof;
        double[] beta = fit.beta();
        double[][] c = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                // a noise-free fit has s = 0: nothing to add, and no error to report beyond zero
                c[i][j] = s2fit > 0 ? fit.covariance()[i][j] / s2fit : 0;
            }
        }
        double[] all = new double[series.size() * p];
        design.fillRows(series, 0, series.size(), all);
        double[][] xtd = new double[p][q];
        double[] d = new double[q];
        for (int i = 0; i < series.size(); i++) {
            if (!design.isIncluded(i)) {
                continue;
            }
            double w = series.weightAt(i);
            double t = series.timeAt(i);
            int row = i * p;
            for (int j = 0; j < q; j++) {
                int col = design.offset(pb.termIndex(j));
                double s = 0;
                for (int h : pb.harmonics(j)) {
                    s += 2 * Math.PI * h * t * (-beta[col] * all[row + col + 1] + beta[col + 1] * all[row + col]);
                    col += 2;
                }
                d[j] = s;
            }
            for (int a = 0; a < p; a++) {
                double xa = all[row + a] * w;
                for (int j = 0; j < q; j++) {
                    xtd[a][j] += xa * d[j];
                }
            }
        }
        double[][] b = new double[p][q];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < q; j++) {
                double s = 0;
                for (int k = 0; k < p; k++) {
                    s += c[i][k] * xtd[k][j];
                }
                b[i][j] = s;
            }
        }
        double[][] joint = new double[p][p];
        double[][] cov = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double s = c[i][j];
                for (int k = 0; k < q; k++) {
                    for (int m = 0; m < q; m++) {
                        s += b[i][k] * sInverse[k][m] * b[j][m];
                    }
                }
                joint[i][j] = s;
                cov[i][j] = s2 * s;
            }
        }
        double tc = Distributions.studentTQuantile(0.5 + fit.level() / 2, dof);
        List<CoefficientEstimate> coefs = new ArrayList<>();
        for (int j = 0; j < p; j++) {
            CoefficientEstimate plain = fit.coefficients().get(j);
            double se = Math.sqrt(cov[j][j]);
            double tStat = beta[j] / se;
            coefs.add(new CoefficientEstimate(plain.name(), plain.term(), beta[j], se, tStat,
                    Double.isNaN(tStat) ? Double.NaN : Distributions.studentTTwoSidedP(tStat, dof), beta[j] - tc * se,
                    beta[j] + tc * se));
        }
        TermInference inf = new TermInference(beta, joint, s2, dof, tc, Double.NaN);
        List<TermReport> terms = new ArrayList<>();
        for (int k = 0; k < design.terms().size(); k++) {
            Term term = design.terms().get(k);
            TermReport r = term.report(inf.slice(design.offset(k), design.offset(k) + term.columns()));
            terms.add(withShare(r, fit.terms().get(k)));
        }
        return new Result(coefs, cov, terms);
    }

    /** {@code r} with the variance share(s) of the linear fit: a share is a property of the fitted curve. */
    private static TermReport withShare(TermReport r, TermReport plain) {
        if (r instanceof SinusoidReport s) {
            return share(s, plain.varianceShare());
        }
        if (r instanceof HarmonicSeriesReport h) {
            HarmonicSeriesReport ph = (HarmonicSeriesReport) plain;
            List<SinusoidReport> parts = new ArrayList<>();
            for (int i = 0; i < h.harmonics().size(); i++) {
                parts.add(share(h.harmonics().get(i), ph.harmonics().get(i).varianceShare()));
            }
            return new HarmonicSeriesReport(h.label(), h.fundamentalHz(), parts, h.fStat(), h.df1(), h.pValue(),
                    ph.varianceShare());
        }
        if (r instanceof GroupReport g) {
            return new GroupReport(g.label(), g.kind(), g.columns(), g.fStat(), g.df1(), g.pValue(), plain.varianceShare());
        }
        ScalarReport s = (ScalarReport) r;
        return new ScalarReport(s.label(), s.kind(), s.estimate(), s.stdError(), s.ciLow(), s.ciHigh(), s.t(), s.fStat(),
                s.pValue(), plain.varianceShare());
    }

    private static SinusoidReport share(SinusoidReport s, double share) {
        return new SinusoidReport(s.label(), s.frequencyHz(), s.harmonic(), s.amplitude(), s.amplitudeSe(),
                s.amplitudeCiLow(), s.amplitudeCiHigh(), s.phaseDeg(), s.phaseSeDeg(), s.cosCoefficient(),
                s.sinCoefficient(), s.fStat(), s.pValue(), share);
    }
}
