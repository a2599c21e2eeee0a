package org.phasewright.uncertainty;

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
import org.phasewright.stats.Distributions;

/**
 * Turns estimates and a covariance into the engine's coefficient and term reports (each term's own
 * {@link Term#report}), keeping the plain fit's variance shares. Shared by the correction methods and
 * the robust fit. O(p^2) plus the terms' own costs.
 */
final class Reports {

    private Reports() {
    }

    static List<CoefficientEstimate> coefficients(Design design, double[] beta, double[][] cov, int dof, double level) {
        double tc = Distributions.studentTQuantile(0.5 + level / 2, dof);
        List<CoefficientEstimate> out = new ArrayList<>();
        for (int j = 0; j < beta.length; j++) {
            double se = Math.sqrt(cov[j][j]);
            double t = beta[j] / se;
            out.add(new CoefficientEstimate(design.columnNames().get(j), design.terms().get(design.termOfColumn(j)).label(),
                    beta[j], se, t, Distributions.studentTTwoSidedP(t, dof), beta[j] - tc * se, beta[j] + tc * se));
        }
        return out;
    }

    static List<TermReport> terms(FitResult plain, double[] beta, double[][] cov, int dof) {
        Design design = plain.design();
        double tc = Distributions.studentTQuantile(0.5 + plain.level() / 2, dof);
        TermInference all = new TermInference(beta, cov, 1.0, dof, tc, Double.NaN);
        List<TermReport> out = new ArrayList<>();
        for (int k = 0; k < design.terms().size(); k++) {
            Term term = design.terms().get(k);
            TermReport r = term.report(all.slice(design.offset(k), design.offset(k) + term.columns()));
            out.add(withShare(r, plain.terms().get(k)));
        }
        return out;
    }

    /** A copy of {@code r} carrying the variance share(s) of {@code plain}. */
    static TermReport withShare(TermReport r, TermReport plain) {
        if (r instanceof SinusoidReport s) {
            return share(s, plain.varianceShare());
        }
        if (r instanceof HarmonicSeriesReport h) {
            HarmonicSeriesReport p = (HarmonicSeriesReport) plain;
            List<SinusoidReport> parts = new ArrayList<>();
            for (int i = 0; i < h.harmonics().size(); i++) {
                parts.add(share(h.harmonics().get(i), p.harmonics().get(i).varianceShare()));
            }
            return new HarmonicSeriesReport(h.label(), h.fundamentalHz(), parts, h.fStat(), h.df1(), h.pValue(), p.varianceShare());
        }
        if (r instanceof GroupReport g) {
            return new GroupReport(g.label(), g.kind(), g.columns(), g.fStat(), g.df1(), g.pValue(), plain.varianceShare());
        }
        ScalarReport s = (ScalarReport) r;
        return new ScalarReport(s.label(), s.kind(), s.estimate(), s.stdError(), s.ciLow(), s.ciHigh(), s.t(), s.fStat(), s.pValue(),
                plain.varianceShare());
    }

    private static SinusoidReport share(SinusoidReport s, double share) {
        return new SinusoidReport(s.label(), s.frequencyHz(), s.harmonic(), s.amplitude(), s.amplitudeSe(), s.amplitudeCiLow(),
                s.amplitudeCiHigh(), s.phaseDeg(), s.phaseSeDeg(), s.cosCoefficient(), s.sinCoefficient(), s.fStat(), s.pValue(),
                share);
    }
}
