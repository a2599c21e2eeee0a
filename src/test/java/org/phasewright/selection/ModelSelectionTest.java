package org.phasewright.selection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.FitOptions;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

class ModelSelectionTest {

    private static Series signal(int n, double[] harmonicAmps, long seed) {
        Random rnd = new Random(seed);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / 100.0;
            double v = 0.5 + 0.3 * rnd.nextGaussian();
            for (int k = 1; k <= harmonicAmps.length; k++) {
                v += harmonicAmps[k - 1] * Math.cos(2 * Math.PI * 2.1 * k * t + 0.3 * k);
            }
            y[i] = v;
        }
        return Series.uniform(0, 100, y);
    }

    @Test
    void nestedFTestsMatchCommonsMathRegressions() {
        // Reference: residual sums of squares of Commons Math 3 OLSMultipleLinearRegression for the nested
        // models {1, h1} and {1, h1, h2}; F and p from Commons Math's F distribution.
        Series s = signal(600, new double[] {1, 0.1}, 1);
        SelectionTable table = ModelSelection.nested(s, ModelSpec.of(new Intercept(), new HarmonicSeries(2.1, 3), new Sinusoid(7.7)),
                FitOptions.defaults());
        assertThat(table.steps()).extracting(SelectionStep::added).containsExactly("intercept", "harmonic 1 of 2.1 Hz",
                "harmonic 2 of 2.1 Hz", "harmonic 3 of 2.1 Hz", "sinusoid 7.7 Hz");
        double[] y = s.values();
        double rss1 = rss(y, 1);
        double rss2 = rss(y, 2);
        SelectionStep step = table.steps().get(2);
        assertThat(step.rss()).isCloseTo(rss2, within(1e-9 * rss2));
        double f = ((rss1 - rss2) / 2) / (rss2 / (600 - 5));
        assertThat(step.fStat()).isCloseTo(f, within(1e-8 * f));
        assertThat(step.df1()).isEqualTo(2);
        assertThat(step.pValue()).isCloseTo(1 - new FDistribution(2, 595).cumulativeProbability(f), within(1e-10));
        assertThat(table.steps().get(0).fStat()).isNaN();
        assertThat(table.steps().get(table.bestByBic()).deltaBic()).isZero();
        // harmonic 3 and the 7.7 Hz sinusoid are absent from the signal: BIC prefers the model with two harmonics
        assertThat(table.bestByBic()).isEqualTo(2);
    }

    private static double rss(double[] y, int harmonics) {
        double[][] x = new double[y.length][2 * harmonics];
        for (int i = 0; i < y.length; i++) {
            for (int k = 1; k <= harmonics; k++) {
                x[i][2 * k - 2] = Math.cos(2 * Math.PI * 2.1 * k * i / 100.0);
                x[i][2 * k - 1] = Math.sin(2 * Math.PI * 2.1 * k * i / 100.0);
            }
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.newSampleData(y, x);
        return ols.calculateResidualSumOfSquares();
    }

    @Test
    void harmonicsAreAddedWhileSignificant() {
        Series s = signal(2000, new double[] {1, 0.5, 0.3, 0.2}, 2);
        HarmonicGrowthResult g = ModelSelection.growHarmonics(s, ModelSpec.of(new Intercept()), 2.1, 0.01, 0, 30, FitOptions.defaults());
        // the invented signal holds harmonics 1..4, each at A / se(A) above 20 (se = 0.3 sqrt(2 / 2000)), so each
        // F-test rejects with certainty; harmonic 5 is absent (truth of the scenario)
        assertThat(g.kept()).containsExactly(1, 2, 3, 4);
        assertThat(g.stopReason()).contains("harmonic 5 is not significant");
        assertThat(g.table().steps()).hasSize(6);
        assertThat(g.model().terms()).hasSize(2);
    }

    @Test
    void patienceSkipsAMissingHarmonicAndNyquistStopsGrowth() {
        Series s = signal(2000, new double[] {1, 0.5, 0.3, 0.2, 0, 0.2}, 3);
        HarmonicGrowthResult g = ModelSelection.growHarmonics(s, ModelSpec.of(new Intercept(), new PolynomialTrend(1)), 2.1, 0.01, 1,
                30, FitOptions.defaults());
        assertThat(g.kept()).containsExactly(1, 2, 3, 4, 6);
        HarmonicSeries h = (HarmonicSeries) g.model().terms().get(2);
        assertThat(h.skip()).containsExactly(5);
        HarmonicGrowthResult all = ModelSelection.growHarmonics(signal(400, new double[] {1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1,
                1, 1, 1, 1, 1, 1, 1, 1, 1}, 4), ModelSpec.of(new Intercept()), 2.1, 0.01, 0, 40, FitOptions.defaults());
        assertThat(all.kept()).hasSize(23);
        assertThat(all.stopReason()).contains("Nyquist");
    }

    @Test
    void growthStopsBeforeAHarmonicThatLeavesNoResidualDegreesOfFreedom() {
        // 11 samples with f0 = 1/11 cycles/sample: intercept plus harmonics 1..5 make p = n = 11, an exact
        // interpolation where no F-test exists (F on (2, 0) degrees of freedom is undefined; textbook).
        Random rnd = new Random(11);
        double[] y = new double[11];
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.cos(2 * Math.PI * i / 11.0) + 0.3 * Math.cos(4 * Math.PI * i / 11.0) + 0.01 * rnd.nextGaussian();
        }
        HarmonicGrowthResult g = ModelSelection.growHarmonics(Series.uniform(0, 1, y), ModelSpec.of(new Intercept()), 1 / 11.0,
                0.9999, 10, 20, FitOptions.defaults());
        assertThat(g.kept()).containsExactly(1, 2, 3, 4);
        assertThat(g.stopReason()).contains("harmonic 5").contains("no residual degrees of freedom");
        assertThat(g.table().steps()).allSatisfy(step -> assertThat(step.dof()).isPositive());
    }
}
