package org.phasewright.diagnostics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.stat.descriptive.moment.Kurtosis;
import org.apache.commons.math3.stat.descriptive.moment.Skewness;
import org.junit.jupiter.api.Test;

class ResidualDiagnosticsTest {

    @Test
    void durbinWatsonAndAutocorrelationByHand() {
        // Hand computation (common practice): e = 1, -1, 2, 0, -2, 1, 0, -1 (mean 0).
        double[] e = {1, -1, 2, 0, -2, 1, 0, -1};
        // differences: -2, 3, -2, -2, 3, -1, -1 -> squares 4+9+4+4+9+1+1 = 32; sum e^2 = 12
        assertThat(ResidualDiagnostics.durbinWatson(e)).isCloseTo(32.0 / 12, within(1e-15));
        double[] r = ResidualDiagnostics.autocorrelation(e, 2);
        // lag 1 products: -1 -2 0 0 -2 0 0 = -5; lag 2: 2 0 -4 0 0 -1 = -3
        assertThat(r[0]).isCloseTo(-5.0 / 12, within(1e-15));
        assertThat(r[1]).isCloseTo(-3.0 / 12, within(1e-15));
        // Ljung-Box by hand: Q = 8 * 10 * (r1^2/7 + r2^2/6)
        LjungBox lb = ResidualDiagnostics.ljungBox(r, 8);
        double q = 80 * (r[0] * r[0] / 7 + r[1] * r[1] / 6);
        assertThat(lb.statistic()).isCloseTo(q, within(1e-12));
        // p-value against Commons Math 3's chi-square distribution
        assertThat(lb.pValue()).isCloseTo(1 - new ChiSquaredDistribution(2).cumulativeProbability(q), within(1e-12));
    }

    @Test
    void gapsBreakPairsButKeepAlignment() {
        double[] e = {1, -1, Double.NaN, 0, -2, 1, 0, -1, 2, 0};
        // DW pairs: (1,-1), (0,-2), (-2,1), (1,0), (0,-1), (-1,2), (2,0): 4+4+9+1+1+9+4 = 32; sum e^2 = 12
        assertThat(ResidualDiagnostics.durbinWatson(e)).isCloseTo(32.0 / 12, within(1e-15));
    }

    @Test
    void jarqueBeraMomentsMatchCommonsMath() {
        // Reference: Commons Math 3 Skewness and Kurtosis (bias-corrected G1, G2) converted back to the moment forms.
        Random rnd = new Random(1);
        int n = 500;
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = Math.exp(0.5 * rnd.nextGaussian());
        }
        JarqueBera jb = ResidualDiagnostics.jarqueBera(e);
        double g1 = new Skewness().evaluate(e) * (n - 2) / Math.sqrt(n * (n - 1.0));
        double bigG2 = new Kurtosis().evaluate(e);
        double g2 = (bigG2 * (n - 2.0) * (n - 3.0) / (n - 1.0) - 6) / (n + 1.0);
        assertThat(jb.skewness()).isCloseTo(g1, within(1e-10));
        assertThat(jb.kurtosis() - 3).isCloseTo(g2, within(1e-10));
        double stat = n / 6.0 * (g1 * g1 + g2 * g2 / 4);
        assertThat(jb.statistic()).isCloseTo(stat, within(1e-8));
        assertThat(jb.pValue()).isCloseTo(1 - new ChiSquaredDistribution(2).cumulativeProbability(stat), within(1e-12));
        assertThat(jb.pValue()).isLessThan(1e-6); // log-normal: clearly not normal
    }

    @Test
    void whiteNoisePassesAndAr1IsFlagged() {
        Random rnd = new Random(7);
        int n = 1000;
        double[] white = new double[n];
        double[] ar = new double[n];
        double prev = 0;
        for (int i = 0; i < n; i++) {
            white[i] = rnd.nextGaussian();
            prev = 0.6 * prev + rnd.nextGaussian();
            ar[i] = prev;
        }
        ResidualReport w = ResidualDiagnostics.of(white, 10);
        assertThat(w.durbinWatson()).isCloseTo(2, within(0.15));
        assertThat(w.warnings()).isEmpty();
        ResidualReport a = ResidualDiagnostics.of(ar, 10);
        // DW is about 2 (1 - phi) for AR(1) residuals (Durbin and Watson 1950)
        assertThat(a.durbinWatson()).isCloseTo(2 * (1 - 0.6), within(0.12));
        assertThat(a.autocorrelation()[0]).isCloseTo(0.6, within(0.06));
        assertThat(a.ljungBox().pValue()).isLessThan(1e-10);
        assertThat(a.warnings()).extracting(f -> f.code()).containsExactly(ResidualDiagnostics.AUTOCORRELATED);
    }

    @Test
    void ljungBoxHasItsNominalSizeUnderWhiteNoise() {
        // Ljung and Box (1978): Q is close to chi-square(h) under white noise even for n = 200.
        // Monte Carlo: 600 white-noise records of 200; the 5% test should reject about 5% of the time
        // (binomial SD 0.9%; the band [2%, 8%] is more than 3 SD each side).
        Random rnd = new Random(99);
        int rejections = 0;
        int records = 600;
        for (int r = 0; r < records; r++) {
            double[] e = new double[200];
            for (int i = 0; i < e.length; i++) {
                e[i] = rnd.nextGaussian();
            }
            if (ResidualDiagnostics.of(e, 10).ljungBox().pValue() < 0.05) {
                rejections++;
            }
        }
        assertThat(rejections / (double) records).isBetween(0.02, 0.08);
    }

    @Test
    void refusesTooFewResiduals() {
        assertThatThrownBy(() -> ResidualDiagnostics.of(new double[] {1, 2, 3}, 1)).hasMessageContaining("at least 8");
        assertThatThrownBy(() -> ResidualDiagnostics.of(new double[20], 25)).hasMessageContaining("between 1 and 19");
    }

    private static double[] everyThirdMissing(double[] e) {
        double[] g = e.clone();
        for (int i = 2; i < g.length; i += 3) {
            g[i] = Double.NaN;
        }
        return g;
    }

    @Test
    void autocorrelationAcrossGapsIsNormalisedByThePairsPresent() {
        // Parzen (1963), spectral analysis with missing observations: the lag-k autocovariance of an
        // amplitude-modulated series is the sum of the products present over the number of pairs present. With
        // every third sample missing only half the lag-1 pairs exist, so dividing by all n halves r_1.
        // AR(1) phi = 0.6, 3000 samples: r_1 has SD about 0.02 (Bartlett); band +-0.06.
        Random rnd = new Random(31);
        double[] ar = new double[3000];
        double prev = 0;
        for (int i = 0; i < ar.length; i++) {
            prev = 0.6 * prev + rnd.nextGaussian();
            ar[i] = prev;
        }
        double[] r = ResidualDiagnostics.autocorrelation(everyThirdMissing(ar), 3);
        assertThat(r[0]).isCloseTo(0.6, within(0.06));
        assertThat(r[1]).isCloseTo(0.36, within(0.06));
        assertThat(r[2]).isCloseTo(0.216, within(0.06));
    }

    @Test
    void ljungBoxKeepsItsSizeAcrossGaps() {
        // White noise with every third sample missing, 600 records of 300 (200 observed), 10 lags: the 5% test
        // should reject about 5% of the time (chi-square reference of Ljung and Box 1978 with the lag-k terms
        // weighted by the pairs present; binomial SD 0.9%, band [2%, 8%]).
        Random rnd = new Random(77);
        int rejections = 0;
        int records = 600;
        for (int r = 0; r < records; r++) {
            double[] e = new double[300];
            for (int i = 0; i < e.length; i++) {
                e[i] = rnd.nextGaussian();
            }
            ResidualReport report = ResidualDiagnostics.of(everyThirdMissing(e), 10);
            assertThat(report.n()).isEqualTo(200);
            if (report.ljungBox().pValue() < 0.05) {
                rejections++;
            }
        }
        assertThat(rejections / (double) records).isBetween(0.02, 0.08);
    }
}
