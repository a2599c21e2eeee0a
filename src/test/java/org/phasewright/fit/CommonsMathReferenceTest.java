package org.phasewright.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;
import org.phasewright.model.Covariate;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.Step;
import org.phasewright.series.Series;

/**
 * The engine against Apache Commons Math 3's OLSMultipleLinearRegression (a reference library that
 * solves by Householder QR): coefficients, standard errors, residual SD and the hat matrix agree on
 * random well-conditioned designs that mix sinusoid, harmonic, trend, step and covariate columns.
 */
class CommonsMathReferenceTest {

    private static int seedCounter = 0;

    private static double rel(double a, double b) {
        return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
    }

    @RepeatedTest(8)
    void coefficientsAndStandardErrorsAgree() {
        Random rnd = new Random(1000 + seedCounter++);
        int n = 200 + rnd.nextInt(300);
        double[] t = new double[n];
        double acc = 0;
        for (int i = 0; i < n; i++) {
            acc += 0.5 + rnd.nextDouble();
            t[i] = acc * 0.01; // uneven sampling
        }
        double[] load = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            load[i] = rnd.nextGaussian();
            y[i] = 3 + 0.7 * Math.cos(2 * Math.PI * 1.3 * t[i]) + 0.2 * Math.sin(2 * Math.PI * 2.6 * t[i])
                    + 0.4 * load[i] + 0.1 * t[i] + rnd.nextGaussian();
        }
        Series s = Series.builder().times(t).values(y).covariate("load", load).build();
        double tMid = t[n / 2];
        ModelSpec spec = ModelSpec.of(new Intercept(), new PolynomialTrend(2), new Sinusoid(1.3 + 0.2 * rnd.nextDouble()),
                new HarmonicSeries(2.6, 3), new Step(tMid), new Covariate("load"));
        FitResult fit = Fitter.fit(s, spec);

        OLSMultipleLinearRegression ref = reference(fit, s, y);
        double[] b = ref.estimateRegressionParameters();
        double[] se = ref.estimateRegressionParametersStandardErrors();
        for (int j = 0; j < fit.p(); j++) {
            CoefficientEstimate c = fit.coefficients().get(j);
            assertThat(rel(c.estimate(), b[j])).as("coefficient %s", c.name()).isLessThan(1e-10);
            assertThat(rel(c.stdError(), se[j])).as("std error %s", c.name()).isLessThan(1e-10);
        }
        assertThat(rel(fit.residualSd(), ref.estimateRegressionStandardError())).isLessThan(1e-12);
    }

    @Test
    void leveragesEqualTheHatMatrixDiagonal() {
        Random rnd = new Random(7);
        int n = 120;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = Math.sin(i * 0.3) + rnd.nextGaussian();
        }
        Series s = Series.uniform(0, 10, y);
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new PolynomialTrend(3), new Sinusoid(0.4)),
                FitOptions.defaults().withLeverages(true));
        OLSMultipleLinearRegression ref = reference(fit, s, y);
        RealMatrix hat = ref.calculateHat();
        double[] h = fit.leverages().orElseThrow();
        double sum = 0;
        for (int i = 0; i < n; i++) {
            assertThat(Math.abs(h[i] - hat.getEntry(i, i))).isLessThan(1e-12);
            sum += h[i];
        }
        // the leverages of a full-rank design sum to p (trace of the hat matrix; standard result)
        assertThat(sum).isCloseTo(fit.p(), org.assertj.core.api.Assertions.within(1e-9));
    }

    @Test
    void predictionIntervalsMatchTheCovarianceFromCommonsMath() {
        Random rnd = new Random(11);
        int n = 300;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 2 + 0.5 * Math.cos(2 * Math.PI * 0.8 * i / 20.0) + 0.3 * rnd.nextGaussian();
        }
        Series s = Series.uniform(0, 20, y);
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new PolynomialTrend(1), new Sinusoid(0.8)));
        OLSMultipleLinearRegression ref = reference(fit, s, y);
        double[][] v = ref.estimateRegressionParametersVariance();
        double s2 = ref.estimateErrorVariance();
        double[] times = {3.3, 7.77, 14.9};
        Prediction pr = fit.predict(times);
        double[] rows = fit.design().rowsAt(times);
        double tc = new org.apache.commons.math3.distribution.TDistribution(n - fit.p()).inverseCumulativeProbability(0.975);
        for (int i = 0; i < times.length; i++) {
            double q = 0;
            for (int j = 0; j < fit.p(); j++) {
                for (int k = 0; k < fit.p(); k++) {
                    q += rows[i * fit.p() + j] * v[j][k] * rows[i * fit.p() + k];
                }
            }
            double seMean = Math.sqrt(q * s2);
            double seNew = Math.sqrt(q * s2 + s2);
            assertThat(rel(pr.meanHigh()[i] - pr.mean()[i], tc * seMean)).isLessThan(1e-7);
            assertThat(rel(pr.newHigh()[i] - pr.mean()[i], tc * seNew)).isLessThan(1e-7);
        }
    }

    /** Commons Math's regression on exactly the engine's design matrix (no extra intercept). */
    private static OLSMultipleLinearRegression reference(FitResult fit, Series s, double[] y) {
        int n = s.size();
        double[] block = new double[n * fit.p()];
        fit.design().fillRows(s, 0, n, block);
        double[][] design = new double[n][fit.p()];
        for (int i = 0; i < n; i++) {
            System.arraycopy(block, i * fit.p(), design[i], 0, fit.p());
        }
        OLSMultipleLinearRegression ref = new OLSMultipleLinearRegression(0);
        ref.setNoIntercept(true);
        ref.newSampleData(y, design);
        return ref;
    }
}
