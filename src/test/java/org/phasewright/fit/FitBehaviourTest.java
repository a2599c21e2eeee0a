package org.phasewright.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.model.Covariate;
import org.phasewright.model.GroupReport;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.KnotPlacement;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.ScalarReport;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.SplineTrend;
import org.phasewright.model.Step;
import org.phasewright.series.Series;

/** How the fit behaves at its edges: rank deficiency, p >= n, gaps, weights, steps, splines, warnings. */
class FitBehaviourTest {

    private static double[] noisy(int n, long seed) {
        Random rnd = new Random(seed);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = Math.cos(0.2 * i) + 0.1 * rnd.nextGaussian();
        }
        return y;
    }

    @Test
    void collinearTermsAreNamedAndNothingIsDropped() {
        Series s = Series.uniform(0, 100, noisy(500, 1));
        assertThatThrownBy(() -> Fitter.fit(s, ModelSpec.of(new Intercept(), new Sinusoid(5), new HarmonicSeries(5, 2))))
                .isInstanceOf(ModelException.class)
                .hasMessageContaining("rank deficient")
                .hasMessageContaining("sinusoid 5 Hz")
                .hasMessageContaining("harmonics of 5 Hz");
        assertThatThrownBy(() -> Fitter.fit(s, ModelSpec.of(new Intercept(), new PolynomialTrend(3), new SplineTrend(2))))
                .isInstanceOf(ModelException.class)
                .hasMessageContaining("polynomial trend of degree 3")
                .hasMessageContaining("spline trend");
    }

    @Test
    void moreColumnsThanSamplesIsAClearError() {
        Series s = Series.uniform(0, 1, new double[] {1, 2, 3});
        assertThatThrownBy(() -> Fitter.fit(s, ModelSpec.of(new Intercept(), new PolynomialTrend(3))))
                .isInstanceOf(ModelException.class)
                .hasMessageContaining("4 columns")
                .hasMessageContaining("only 3 usable samples");
    }

    @Test
    void asManyColumnsAsSamplesInterpolatesAndSaysNoStandardErrorsExist() {
        Series s = Series.uniform(0, 1, new double[] {1, 4, 2, 8});
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new PolynomialTrend(3)));
        assertThat(fit.dof()).isZero();
        for (double r : fit.components().residual()) {
            assertThat(Math.abs(r)).isLessThan(1e-12);
        }
        assertThat(fit.coefficients()).allSatisfy(c -> assertThat(c.stdError()).isNaN());
        assertThat(fit.warnings()).extracting(FitWarning::code).contains(FitWarning.EXACT_FIT);
    }

    @Test
    void gapsAreLeftOutOfTheFitButKeptAligned() {
        double[] y = noisy(300, 2);
        double[] withGaps = y.clone();
        for (int i = 100; i < 120; i++) {
            withGaps[i] = Double.NaN;
        }
        FitResult fit = Fitter.fit(Series.uniform(0, 10, withGaps), ModelSpec.of(new Intercept(), new Sinusoid(10 * 0.2 / (2 * Math.PI))));
        assertThat(fit.n()).isEqualTo(280);
        Components c = fit.components();
        assertThat(c.times()).hasSize(300);
        assertThat(c.observed()[110]).isNaN();
        assertThat(c.residual()[110]).isNaN();
        assertThat(c.fitted()[110]).isFinite();
        assertThat(c.residual()[50]).isCloseTo(y[50] - c.fitted()[50], within(1e-12));
        double sum = 0;
        for (Component part : c.parts()) {
            sum += part.values()[110];
        }
        assertThat(sum).isCloseTo(c.fitted()[110], within(1e-12));
    }

    @Test
    void aWeightOfTwoActsLikeTheSampleTwice() {
        double[] y = noisy(50, 3);
        double[] w = new double[50];
        java.util.Arrays.fill(w, 1);
        w[7] = 2;
        Series weighted = Series.builder().uniform(0, 1, y).weights(w).build();
        double[] t2 = new double[51];
        double[] y2 = new double[51];
        for (int i = 0, j = 0; i < 50; i++) {
            t2[j] = i;
            y2[j++] = y[i];
            if (i == 7) {
                t2[j] = i + 1e-9; // the same sample again, an instant later
                y2[j++] = y[i];
            }
        }
        ModelSpec spec = ModelSpec.of(new Intercept(), new Sinusoid(0.2 / (2 * Math.PI)));
        // common practice: an integer weight w counts the sample w times in the sum of squares
        FitResult a = Fitter.fit(weighted, spec);
        FitResult b = Fitter.fit(Series.at(t2, y2), spec);
        for (int j = 0; j < a.p(); j++) {
            assertThat(a.coefficients().get(j).estimate()).isCloseTo(b.coefficients().get(j).estimate(), within(1e-7));
        }
        assertThat(a.rss()).isCloseTo(b.rss(), within(1e-9));
    }

    @Test
    void aStepIsEstimatedAndOneOutsideTheRecordIsRefused() {
        double[] y = new double[200];
        for (int i = 0; i < 200; i++) {
            y[i] = (i >= 120 ? 1.5 : 0) + 0.01 * Math.sin(i);
        }
        FitResult fit = Fitter.fit(Series.uniform(0, 1, y), ModelSpec.of(new Intercept(), new Step(120)));
        ScalarReport step = (ScalarReport) fit.term("step at 120 s");
        assertThat(step.estimate()).isCloseTo(1.5, within(0.01));
        assertThat(step.ciLow()).isLessThan(step.estimate());
        assertThatThrownBy(() -> Fitter.fit(Series.uniform(0, 1, y), ModelSpec.of(new Intercept(), new Step(500))))
                .isInstanceOf(ModelException.class).hasMessageContaining("outside the observed record");
    }

    @Test
    void splinesReproduceFunctionsInTheirSpan() {
        int n = 400;
        double[] t = new double[n];
        double[] y = new double[n];
        double[] yLin = new double[n];
        Random rnd = new Random(5);
        double acc = 0;
        for (int i = 0; i < n; i++) {
            acc += rnd.nextDouble() + 0.1;
            t[i] = acc;
        }
        for (int i = 0; i < n; i++) {
            double u = 2 * (t[i] - t[0]) / (t[n - 1] - t[0]) - 1;
            y[i] = 1 - 2 * u + 0.7 * u * u * u; // a cubic lies in every cubic-spline space
            yLin[i] = 3 + 0.25 * u;
        }
        for (KnotPlacement place : KnotPlacement.values()) {
            FitResult fit = Fitter.fit(Series.at(t, y), ModelSpec.of(new Intercept(), new SplineTrend(5, place, false)));
            assertThat(fit.residualSd()).isLessThan(1e-10);
            GroupReport g = (GroupReport) fit.terms().get(1);
            assertThat(g.columns()).isEqualTo(5 + 3);
        }
        FitResult nat = Fitter.fit(Series.at(t, yLin), ModelSpec.of(new Intercept(), new SplineTrend(4, KnotPlacement.QUANTILE, true)));
        assertThat(nat.residualSd()).isLessThan(1e-10);
        // without an intercept the B-spline basis keeps all k + 4 functions; they sum to one, so R^2 is centred
        FitResult noIntercept = Fitter.fit(Series.at(t, y), ModelSpec.of(new SplineTrend(3)));
        assertThat(noIntercept.p()).isEqualTo(7);
        assertThat(noIntercept.centredRSquared()).isTrue();
    }

    @Test
    void harmonicRecurrenceMatchesDirectEvaluation() {
        double[] t = new double[500];
        Random rnd = new Random(9);
        for (int i = 0; i < t.length; i++) {
            t[i] = 1000 * rnd.nextDouble();
        }
        java.util.Arrays.sort(t);
        HarmonicSeries h = new HarmonicSeries(0.731, 40, List.of(2, 17));
        Series s = Series.at(t, new double[t.length]);
        org.phasewright.model.Design d = org.phasewright.model.Design.bind(ModelSpec.of(h), s);
        double[] rows = new double[t.length * d.p()];
        d.fillRows(s, 0, t.length, rows);
        int[] kept = h.keptHarmonics();
        for (int i = 0; i < t.length; i++) {
            for (int j = 0; j < kept.length; j++) {
                // up to 29,000 cycles: the phase k f0 t itself is only known to about eps * 29000 cycles,
                // 2e-11 radians, whichever way it is evaluated
                double cycles = kept[j] * 0.731 * t[i];
                double w = 2 * Math.PI * (cycles - Math.floor(cycles));
                assertThat(rows[i * d.p() + 2 * j]).isCloseTo(Math.cos(w), within(1e-10));
                assertThat(rows[i * d.p() + 2 * j + 1]).isCloseTo(Math.sin(w), within(1e-10));
            }
        }
    }

    @Test
    void warningsForResolutionCyclesAndNyquist() {
        double[] y = noisy(1000, 4);
        Series s = Series.uniform(0, 100, y); // T = 10 s, resolution 0.1 Hz
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new Sinusoid(5), new Sinusoid(5.05), new Sinusoid(0.15)));
        assertThat(fit.warnings()).extracting(FitWarning::code)
                .contains(FitWarning.CLOSE_FREQUENCIES, FitWarning.FEW_CYCLES)
                .doesNotContain(FitWarning.ROUNDING_LEVEL_RESIDUALS);
        assertThat(fit.warnings().get(0).message()).contains("sinusoid 5 Hz").contains("sinusoid 5.05 Hz");
        assertThatThrownBy(() -> Fitter.fit(s, ModelSpec.of(new Intercept(), new Sinusoid(60))))
                .isInstanceOf(ModelException.class).hasMessageContaining("Nyquist").hasMessageContaining("alias at 40 Hz");
    }

    @Test
    void covariatePowersAndMissingCovariates() {
        int n = 200;
        double[] x = new double[n];
        double[] y = new double[n];
        Random rnd = new Random(6);
        for (int i = 0; i < n; i++) {
            x[i] = rnd.nextDouble() * 4;
            y[i] = 1 + 2 * x[i] - 0.5 * x[i] * x[i] + 0.01 * rnd.nextGaussian();
        }
        x[10] = Double.NaN;
        Series s = Series.builder().uniform(0, 1, y).covariate("load", x).build();
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new Covariate("load", 1), new Covariate("load", 2)));
        assertThat(fit.n()).isEqualTo(n - 1);
        assertThat(fit.coefficients().get(2).estimate()).isCloseTo(-0.5, within(0.01));
        assertThat(fit.components().fitted()[10]).isNaN();
        assertThatThrownBy(() -> Fitter.fit(s, ModelSpec.of(new Intercept(), new Covariate("speed"))))
                .isInstanceOf(ModelException.class).hasMessageContaining("'speed'").hasMessageContaining("load");
    }

    @Test
    void varianceSharesOfOrthogonalTonesAddUpWithTheResidual() {
        int n = 1000;
        double rate = 100;
        double[] y = TestSignals.addNoise(TestSignals.tones(rate, n, new double[][] {{1, 5, 0}, {0.5, 12, 0}}, 0), 0.3,
                new Random(8));
        FitResult fit = Fitter.fit(Series.uniform(0, rate, y), ModelSpec.of(new Intercept(), new Sinusoid(5), new Sinusoid(12)));
        // textbook: for mutually orthogonal column groups the extra sums of squares partition the regression sum
        double a = ((SinusoidReport) fit.terms().get(1)).varianceShare();
        double b = ((SinusoidReport) fit.terms().get(2)).varianceShare();
        // on-grid tones are orthogonal, so their extra sums of squares add up to R^2 exactly
        assertThat(a + b).isCloseTo(fit.rSquared(), within(1e-10));
        assertThat(fit.aic()).isLessThan(Fitter.fit(Series.uniform(0, rate, y), ModelSpec.of(new Intercept(), new Sinusoid(5))).aic());
    }
}
