package org.phasewright.spectrum;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;
import org.phasewright.series.Series;

class LombScargleTest {

    private static double[] unevenTimes(int n, double meanStep, Random rnd) {
        double[] t = new double[n];
        double acc = 0;
        for (int i = 0; i < n; i++) {
            acc += meanStep * (0.2 + 1.6 * rnd.nextDouble());
            t[i] = acc;
        }
        return t;
    }

    @Test
    void powerIsTheVarianceShareOfAFloatingMeanSinusoidFit() {
        // Reference: Commons Math 3 OLSMultipleLinearRegression of y on (1, cos, sin) at a grid frequency.
        Random rnd = new Random(3);
        double[] t = unevenTimes(150, 0.1, rnd);
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            y[i] = 2 + 1.3 * Math.sin(2 * Math.PI * 0.8 * t[i] + 0.4) + 0.5 * rnd.nextGaussian();
        }
        UnevenPeriodogram p = LombScargle.of(Series.at(t, y), LombScargleOptions.defaults());
        double[] f = p.spectrum().frequencyHz();
        for (int j : new int[] {3, 40, p.spectrum().argMax(), 200}) {
            double[][] x = new double[t.length][2];
            for (int i = 0; i < t.length; i++) {
                x[i][0] = Math.cos(2 * Math.PI * f[j] * t[i]);
                x[i][1] = Math.sin(2 * Math.PI * f[j] * t[i]);
            }
            OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
            ols.newSampleData(y, x);
            double[] beta = ols.estimateRegressionParameters();
            assertThat(p.power()[j]).isCloseTo(ols.calculateRSquared(), within(1e-9));
            assertThat(p.spectrum().amplitudeAt(j)).isCloseTo(Math.hypot(beta[1], beta[2]), within(1e-9));
        }
        assertThat(p.topFrequencyHz()).isCloseTo(0.8, within(p.spectrum().gridStepHz()));
        assertThat(p.falseAlarmProbability()).isLessThan(1e-10);
    }

    @Test
    void exactToneOnUnevenTimesIsRecoveredByTheProbe() {
        Random rnd = new Random(5);
        double[] t = unevenTimes(80, 1.0, rnd);
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            y[i] = -1 + 0.9 * Math.cos(2 * Math.PI * 0.0731 * t[i] - 2.0);
        }
        assertThat(LombScargle.probe(Series.at(t, y)).amplitudeAt(0.0731)).isCloseTo(0.9, within(1e-12));
    }

    @Test
    void onUniformCompleteDataItAgreesWithTheRectangularFft() {
        // On-bin frequencies of a complete uniform record: the floating-mean fit is the DFT (common practice).
        int n = 128;
        double rate = 10;
        Random rnd = new Random(8);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = rnd.nextGaussian();
        }
        Series s = Series.uniform(0, rate, y);
        Spectrum fft = Periodogram.of(s, new PeriodogramOptions(Window.RECTANGULAR, 1, true));
        UnevenPeriodogram ls = LombScargle.of(s, new LombScargleOptions(1, rate / 2 - 1e-9));
        for (int k = 1; k < n / 2; k++) {
            assertThat(ls.spectrum().frequencyAt(k - 1)).isCloseTo(fft.frequencyAt(k), within(1e-9));
            assertThat(ls.spectrum().amplitudeAt(k - 1)).isCloseTo(fft.amplitudeAt(k), within(1e-9));
        }
    }

    @Test
    void baluevFalseAlarmProbabilityHoldsUnderWhiteNoise() {
        // Monte Carlo check of the Baluev (2008) approximation: under white noise the top-peak FAP is
        // below 0.05 in about 5% of records (the approximation is an upper bound, so fewer is allowed).
        // 400 records: binomial SD at 5% is 1.1%, so [1.5%, 8.5%] is more than 3 SD wide each side.
        Random rnd = new Random(2024);
        int trials = 400;
        int below = 0;
        int below20 = 0;
        for (int r = 0; r < trials; r++) {
            double[] t = unevenTimes(100, 1.0, rnd);
            double[] y = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                y[i] = rnd.nextGaussian();
            }
            double fap = LombScargle.of(Series.at(t, y), LombScargleOptions.defaults()).falseAlarmProbability();
            if (fap < 0.05) {
                below++;
            }
            if (fap < 0.2) {
                below20++;
            }
        }
        double rate = below / (double) trials;
        System.out.printf("Baluev FAP check: %.3f of white-noise records below 0.05, %.3f below 0.20%n",
                rate, below20 / (double) trials);
        assertThat(rate).isBetween(0.015, 0.085);
        assertThat(below20 / (double) trials).isBetween(0.10, 0.26);
    }
}
