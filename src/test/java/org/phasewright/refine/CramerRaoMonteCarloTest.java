package org.phasewright.refine;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.phasewright.series.Series;

/**
 * Seeded Monte Carlo check of the frequency estimate and its reported standard error against the
 * Cramer-Rao bound, for the IEEE 1057 four-parameter sine fit started from the FFT.
 *
 * <p>Bound: Rife and Boorstyn (1974), IEEE Trans. Inf. Theory 20, 591, give
 * var(f) >= 12 sigma^2 / ((2 pi)^2 b^2 N (N^2 - 1)) cycles^2/sample^2 for a complex tone of amplitude b
 * in complex noise; for a real tone A cos(2 pi f n + phi) in real white noise of variance sigma^2 the
 * same bound holds with b^2 = A^2 / 2, i.e. var(f) >= 24 sigma^2 / ((2 pi)^2 A^2 N (N^2 - 1)) (Kay 1993,
 * Fundamentals of Statistical Signal Processing: Estimation Theory, eq. 3.41, with SNR = A^2 / (2 sigma^2)).
 * The real-signal form is the one a real least-squares estimator can attain and is the one checked.
 *
 * <p>Replications: 400 per SNR. The sample SD of 400 nearly normal estimates has relative standard
 * error 1/sqrt(800) = 3.5%, so the 15% band is about 4 standard errors wide each side; the mean reported
 * SE varies far less. Runs in about a second.
 */
class CramerRaoMonteCarloTest {

    private static final int N = 256;
    private static final int REPLICATIONS = 400;

    @ParameterizedTest
    @ValueSource(doubles = {10, 20, 30})
    void empiricalSdAndReportedSeAreWithinFifteenPercentOfTheBound(double snrDb) {
        double amplitude = 1;
        double sigma2 = amplitude * amplitude / 2 / Math.pow(10, snrDb / 10);
        double sigma = Math.sqrt(sigma2);
        double f = 0.1234; // cycles per sample (rate 1 Hz)
        Random rnd = new Random(1057 + (long) snrDb);
        double sum = 0;
        double sumSq = 0;
        double seSum = 0;
        for (int r = 0; r < REPLICATIONS; r++) {
            double phase = 2 * Math.PI * rnd.nextDouble();
            double[] y = new double[N];
            for (int i = 0; i < N; i++) {
                y[i] = 0.2 + amplitude * Math.cos(2 * Math.PI * f * i + phase) + sigma * rnd.nextGaussian();
            }
            Refinement fit = SineFit.fourParameter(Series.uniform(0, 1, y));
            assertThat(fit.converged()).isTrue();
            double est = fit.frequencies().get(0).frequencyHz() - f;
            sum += est;
            sumSq += est * est;
            seSum += fit.frequencies().get(0).stdErrorHz();
        }
        double mean = sum / REPLICATIONS;
        double sd = Math.sqrt((sumSq - REPLICATIONS * mean * mean) / (REPLICATIONS - 1));
        double meanSe = seSum / REPLICATIONS;
        double bound = Math.sqrt(24 * sigma2 / (4 * Math.PI * Math.PI * amplitude * amplitude * N * ((double) N * N - 1)));
        double literal = bound / Math.sqrt(2); // 12 sigma^2 / ((2 pi)^2 A^2 N (N^2-1)) read with A the peak amplitude
        System.out.printf(java.util.Locale.ROOT,
                "CRLB check SNR %.0f dB, N=%d, %d runs: empirical SD / bound = %.3f, mean reported SE / bound = %.3f"
                        + " (against 12 sigma^2/((2 pi)^2 A^2 N(N^2-1)) with A the peak amplitude: %.3f, %.3f)%n",
                snrDb, N, REPLICATIONS, sd / bound, meanSe / bound, sd / literal, meanSe / literal);
        assertThat(sd / bound).isBetween(0.85, 1.15);
        assertThat(meanSe / bound).isBetween(0.85, 1.15);
        assertThat(Math.abs(mean)).isLessThan(4 * sd / Math.sqrt(REPLICATIONS));
    }
}
