package org.phasewright.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

/** Known signals recovered exactly without noise, and with the right uncertainty with noise. */
class RecoveryTest {

    @Test
    void noiseFreeTonesAndTrendAreRecovered() {
        double rate = 1000;
        int n = 3217; // not a whole number of cycles of anything
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            double u = 2 * t / ((n - 1) / rate) - 1;
            y[i] = 4.0 + 0.5 * u + 0.2 * (1.5 * u * u - 0.5)
                    + 1.2 * Math.cos(2 * Math.PI * 49.7 * t - Math.toRadians(30))
                    + 0.4 * Math.cos(2 * Math.PI * 3 * 49.7 * t - Math.toRadians(-75))
                    + 0.05 * Math.cos(2 * Math.PI * 123.4 * t - Math.toRadians(170));
        }
        FitResult fit = Fitter.fit(Series.uniform(0, rate, y), ModelSpec.of(new Intercept(), new PolynomialTrend(2),
                new HarmonicSeries(49.7, 3), new Sinusoid(123.4)));
        assertThat(fit.coefficients().get(0).estimate()).isCloseTo(4.0, within(1e-9));
        assertThat(fit.coefficients().get(1).estimate()).isCloseTo(0.5, within(1e-9));
        assertThat(fit.coefficients().get(2).estimate()).isCloseTo(0.2, within(1e-9));
        HarmonicSeriesReport h = (HarmonicSeriesReport) fit.terms().get(2);
        assertThat(h.harmonics().get(0).amplitude()).isCloseTo(1.2, within(1e-9));
        assertThat(h.harmonics().get(0).phaseDeg()).isCloseTo(30, within(1e-7));
        assertThat(h.harmonics().get(1).amplitude()).isCloseTo(0, within(1e-9));
        assertThat(h.harmonics().get(2).amplitude()).isCloseTo(0.4, within(1e-9));
        assertThat(h.harmonics().get(2).phaseDeg()).isCloseTo(-75, within(1e-7));
        SinusoidReport s = (SinusoidReport) fit.terms().get(3);
        assertThat(s.amplitude()).isCloseTo(0.05, within(1e-9));
        assertThat(s.phaseDeg()).isCloseTo(170, within(1e-6));
        assertThat(fit.residualSd()).isLessThan(1e-10);
        assertThat(fit.warnings()).extracting(FitWarning::code).contains(FitWarning.ROUNDING_LEVEL_RESIDUALS);
    }

    /**
     * White noise of SD sigma on a uniform record: a well-resolved tone's amplitude SE is close to
     * sigma sqrt(2/N) (standard result: the cos and sin columns each have squared norm N/2), and
     * the spread of the estimates over seeded repetitions agrees with the reported SE within 10%.
     */
    @Test
    void amplitudeStandardErrorMatchesTheoryAndMonteCarlo() {
        double rate = 200;
        int n = 2000;
        double sigma = 0.5;
        int reps = 400;
        double[] clean = TestSignals.tones(rate, n, new double[][] {{1.0, 13.3, 60}, {0.4, 41.1, 0}}, 2);
        Random rnd = new Random(20261202);
        double sum = 0;
        double sum2 = 0;
        double seSum = 0;
        ModelSpec spec = ModelSpec.of(new Intercept(), new Sinusoid(13.3), new Sinusoid(41.1));
        for (int r = 0; r < reps; r++) {
            FitResult fit = Fitter.fit(Series.uniform(0, rate, TestSignals.addNoise(clean, sigma, rnd)), spec);
            SinusoidReport s = (SinusoidReport) fit.terms().get(1);
            sum += s.amplitude();
            sum2 += s.amplitude() * s.amplitude();
            seSum += s.amplitudeSe();
        }
        double mean = sum / reps;
        double sd = Math.sqrt((sum2 - reps * mean * mean) / (reps - 1));
        double meanSe = seSum / reps;
        double theory = sigma * Math.sqrt(2.0 / n);
        System.out.printf(java.util.Locale.ROOT, "amplitude SE: mean reported / sigma sqrt(2/N) = %.4f, Monte Carlo SD /"
                + " mean reported SE = %.4f (%d runs)%n", meanSe / theory, sd / meanSe, reps);
        assertThat(meanSe / theory).isCloseTo(1.0, within(0.02));
        // with 400 repetitions the SD's own relative error is about 1/sqrt(2*400) = 3.5%
        assertThat(sd / meanSe).isCloseTo(1.0, within(0.10));
        assertThat(mean).isCloseTo(1.0, within(4 * meanSe / Math.sqrt(reps) + 1e-3));
    }
}
