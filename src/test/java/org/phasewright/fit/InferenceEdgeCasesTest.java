package org.phasewright.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.SinusoidReport;
import org.phasewright.series.Series;

/** Numerical traps and degenerate cases of the inference: large offsets, zero amplitude. */
class InferenceEdgeCasesTest {

    @Test
    void rSquaredSurvivesALargeOffset() {
        // A logger that records an absolute level (offset 1e8 units) with small variation: the one-pass
        // sum(w y^2) - (sum w y)^2 / sum w loses every digit of the total sum of squares to cancellation.
        // Reference: Commons Math 3 OLSMultipleLinearRegression.calculateRSquared (which centres with a
        // numerically stable second moment), on the same design.
        Random rnd = new Random(11);
        int n = 1000;
        double[] y = new double[n];
        double[][] x = new double[n][2];
        for (int i = 0; i < n; i++) {
            x[i][0] = Math.cos(2 * Math.PI * 0.05 * i);
            x[i][1] = Math.sin(2 * Math.PI * 0.05 * i);
            y[i] = 1e8 + x[i][0] + 0.1 * rnd.nextGaussian();
        }
        FitResult fit = Fitter.fit(Series.uniform(0, 1, y), ModelSpec.of(new Intercept(), new Sinusoid(0.05)));
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.newSampleData(y, x);
        double r2 = ols.calculateRSquared();
        assertThat(fit.centredRSquared()).isTrue();
        assertThat(fit.rSquared()).isCloseTo(r2, within(1e-6));
        double f = (r2 / 2) / ((1 - r2) / (n - 3)); // overall F from R^2 (textbook identity)
        assertThat(fit.overallF()).isCloseTo(f, within(1e-4 * f));
        SinusoidReport s = (SinusoidReport) fit.terms().get(1);
        assertThat(s.varianceShare()).isCloseTo(r2, within(1e-6)); // the only term besides the constant
    }

    @Test
    void weightedRSquaredSurvivesALargeOffset() {
        // Same trap with weights: the weighted centred TSS is sum w (y - ybar_w)^2 (common practice),
        // computed here directly in two passes as the reference.
        Random rnd = new Random(12);
        int n = 800;
        double[] t = new double[n];
        double[] y = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i;
            w[i] = 0.5 + rnd.nextDouble();
            y[i] = 5e7 + Math.cos(2 * Math.PI * 0.07 * i) + 0.2 * rnd.nextGaussian() / Math.sqrt(w[i]);
        }
        FitResult fit = Fitter.fit(Series.builder().times(t).values(y).weights(w).build(),
                ModelSpec.of(new Intercept(), new Sinusoid(0.07)));
        double sw = 0;
        double swy = 0;
        for (int i = 0; i < n; i++) {
            sw += w[i];
            swy += w[i] * (y[i] - 5e7);
        }
        double mean = swy / sw;
        double tss = 0;
        for (int i = 0; i < n; i++) {
            double d = y[i] - 5e7 - mean;
            tss += w[i] * d * d;
        }
        assertThat(fit.rSquared()).isCloseTo(1 - fit.rss() / tss, within(1e-6));
    }

    @Test
    void zeroAmplitudeHasNoPhase() {
        // A = 0: phi = atan2(0, 0) is arbitrary and the delta-method errors divide by A (common practice: the
        // phase of a zero vector is undefined). The engine must say so (NaN), not report 0 or 180 degrees.
        double[] zero = new double[40];
        FitResult z = Fitter.fit(Series.uniform(0, 1, zero), ModelSpec.of(new Intercept(), new Sinusoid(0.1)));
        SinusoidReport r = (SinusoidReport) z.terms().get(1);
        assertThat(r.amplitude()).isZero();
        assertThat(r.phaseDeg()).isNaN();
        assertThat(r.phaseSeDeg()).isNaN();
        assertThat(r.amplitudeSe()).isNaN();
    }

    @Test
    void weightedLeveragesAndLogLikelihoodFollowTheScaledProblem() {
        // Weighted least squares is ordinary least squares on sqrt(w) y and sqrt(w) X (textbook). Reference for the
        // leverages: Commons Math 3 OLSMultipleLinearRegression.calculateHat on the row-scaled design; for the
        // log-likelihood the Gaussian density with variances sigma^2 / w_i at sigma^2 = RSS_w / n (textbook).
        Random rnd = new Random(13);
        int n = 150;
        double[] t = new double[n];
        double[] y = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i;
            w[i] = 0.2 + 3 * rnd.nextDouble();
            y[i] = 1 + Math.cos(2 * Math.PI * 0.09 * i) + rnd.nextGaussian() / Math.sqrt(w[i]);
        }
        Series s = Series.builder().times(t).values(y).weights(w).build();
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new Sinusoid(0.09)), FitOptions.defaults().withLeverages(true));
        double[] rows = fit.design().rowsAt(t);
        double[][] xs = new double[n][fit.p()];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < fit.p(); j++) {
                xs[i][j] = Math.sqrt(w[i]) * rows[i * fit.p() + j];
            }
            ys[i] = Math.sqrt(w[i]) * y[i];
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression(0);
        ols.setNoIntercept(true);
        ols.newSampleData(ys, xs);
        double[] h = fit.leverages().orElseThrow();
        for (int i = 0; i < n; i++) {
            assertThat(h[i]).isCloseTo(ols.calculateHat().getEntry(i, i), within(1e-12));
        }
        double rss = ols.calculateResidualSumOfSquares();
        double sigma2 = rss / n;
        double logL = 0;
        double[] e = ols.estimateResiduals();
        for (int i = 0; i < n; i++) {
            double var = sigma2 / w[i];
            double r = e[i] / Math.sqrt(w[i]);
            logL += -0.5 * Math.log(2 * Math.PI * var) - r * r / (2 * var);
        }
        assertThat(fit.logLikelihood()).isCloseTo(logL, within(1e-9 * Math.abs(logL)));
        assertThat(fit.rss()).isCloseTo(rss, within(1e-10 * rss));
    }
}
