package org.phasewright.spectrum;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.series.Series;

/** Discovery on synthetic records whose truth is known: which fundamental, or none. */
class SurveyDiscoveryTest {

    private static final double DAY = 86400;

    /** Tones {frequency, amplitude, phase} plus white noise at the given times; NaN where {@code gap} says. */
    private static double[] values(double[] t, double sigma, long seed, double[][] tones) {
        Random rnd = new Random(seed);
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            double v = sigma * rnd.nextGaussian();
            for (double[] tone : tones) {
                v += tone[1] * Math.cos(2 * Math.PI * tone[0] * t[i] - tone[2]);
            }
            y[i] = v;
        }
        return y;
    }

    private static double[] grid(int n, double rate) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i / rate;
        }
        return t;
    }

    @Test
    void oddHarmonicHumAndAnUnrelatedToneGiveTheHumAndLeaveTheTone() {
        double rate = 4000;
        double[] t = grid(8000, rate);
        double[] y = values(t, 0.003, 21, new double[][] {{60, 0.05, 0.3}, {180, 0.02, 2.0}, {300, 0.01, -1.0},
            {437.3, 0.3, 0.7}});
        SurveyResult r = Survey.of(Series.uniform(0, rate, y));
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(60, within(0.01));
        assertThat(c.harmonicNumbers()).containsExactly(1, 3, 5);
        assertThat(c.unexplained()).extracting(Peak::frequencyHz).singleElement()
                .satisfies(f -> assertThat(f).isCloseTo(437.3, within(0.01)));
        assertThat(r.otherSeries()).isEmpty();
        assertThat(r.notes()).extracting(SpectrumNote::code).contains("fundamental");
    }

    @Test
    void unrelatedTonesHaveNoCommonFundamental() {
        double rate = 1000;
        double[] t = grid(4000, rate);
        double[] y = values(t, 0.02, 22, new double[][] {{37.3, 1, 0}, {101.9, 0.6, 1}, {163.1, 0.5, 2},
            {271.7, 0.3, 3}, {389.9, 0.2, 4}});
        SurveyResult r = Survey.of(Series.uniform(0, rate, y));
        assertThat(r.peaks()).hasSize(5);
        assertThat(r.fundamental()).isEmpty();
        assertThat(r.notes()).extracting(SpectrumNote::code).contains("no_fundamental");
    }

    @Test
    void tidalConstituentsAreNotOneHarmonicSeries() {
        // Speeds of M2, S2, N2, K1, O1 in degrees per hour (standard tidal constituent speeds, from memory):
        // lines near 1 and 2 cycles per day that are not whole multiples of one frequency
        double[] speeds = {28.9841042, 30.0, 28.4397295, 15.0410686, 13.9430356};
        double[] amps = {0.9, 0.3, 0.2, 0.3, 0.2};
        int n = 62 * 24;
        double[] t = grid(n, 1 / 3600.0);
        double[][] tones = new double[5][];
        for (int k = 0; k < 5; k++) {
            tones[k] = new double[] {speeds[k] / 360 / 3600, amps[k], 0.9 * k - 1};
        }
        double[] y = values(t, 0.03, 23, tones);
        for (int i = 0; i < n; i++) {
            double u = t[i] / t[n - 1];
            y[i] += 1.5 - 0.1 * u + 0.06 * u * u;
            if ((i >= 300 && i < 330) || (i >= 900 && i < 941) || i % 97 == 5) {
                y[i] = Double.NaN;
            }
        }
        SurveyResult r = Survey.of(Series.uniform(0, 1 / 3600.0, y));
        assertThat(r.fundamental()).isEmpty();
        double res = r.spectrum().resolutionHz();
        for (double[] tone : tones) {
            assertThat(r.peaks()).as("constituent at %s Hz", tone[0])
                    .anySatisfy(p -> assertThat(p.frequencyHz()).isCloseTo(tone[0], within(0.1 * res)));
        }
    }

    @Test
    void unevenDailyLoggerGivesOneCyclePerDayWithItsSecondHarmonic() {
        Random rnd = new Random(24);
        List<Double> times = new ArrayList<>();
        for (double at = 0; at < 10 * DAY; at += 900) {
            if (rnd.nextDouble() > 0.05) {
                times.add(at + 180 * (rnd.nextDouble() - 0.5));
            }
        }
        double[] t = times.stream().mapToDouble(Double::doubleValue).toArray();
        double[] y = values(t, 0.2, 25, new double[][] {{1 / DAY, 2.0, 1.0}, {2 / DAY, 0.6, -2.0}});
        for (int i = 0; i < t.length; i++) {
            y[i] += 12 + 0.8 * t[i] / (10 * DAY);
        }
        SurveyResult r = Survey.of(Series.at(t, y));
        assertThat(r.spectrum().method()).isEqualTo("lomb_scargle");
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(1 / DAY, within(0.05 * r.spectrum().resolutionHz()));
        assertThat(c.harmonicNumbers()).containsExactly(1, 2);
    }

    @Test
    void aStrongDriftNeitherMakesPeaksNorHidesTheSeries() {
        double rate = 100;
        int n = 2000;
        double[] t = grid(n, rate);
        double[] y = values(t, 0.05, 26, new double[][] {{1.7, 0.5, 0}, {3.4, 0.2, 1}});
        for (int i = 0; i < n; i++) {
            double u = t[i] / 20;
            y[i] += 5 * u * u - 3 * u;
        }
        SurveyResult r = Survey.of(Series.uniform(0, rate, y));
        assertThat(r.peaks()).extracting(Peak::frequencyHz).hasSize(2)
                .allSatisfy(f -> assertThat(f).isGreaterThanOrEqualTo(2 / 20.0));
        assertThat(r.fundamental()).hasValueSatisfying(c -> {
            assertThat(c.frequencyHz()).isCloseTo(1.7, within(0.005));
            assertThat(c.harmonicNumbers()).containsExactly(1, 2);
        });
        assertThat(r.notes()).extracting(SpectrumNote::code).contains("detrended", "peaks_refined");
    }

    @Test
    void jointFrequencyErrorsMatchTheCramerRaoBound() {
        // Single real tone in white noise: var(f) >= 6 sigma^2 / (pi^2 A^2 N T^2) (S. M. Kay 1993, Fundamentals of
        // Statistical Signal Processing: Estimation Theory, example 3.14, from memory). The jointly refined frequency
        // should reach it and its reported standard error should state it. 120 seeded records: the sample SD of
        // the estimates is within about 3 x 6.5 % of the truth, hence the 20 % band.
        double rate = 1000;
        int n = 2000;
        double sigma = 0.5;
        double amplitude = 0.2;
        double bound = Math.sqrt(6 * sigma * sigma / (Math.PI * Math.PI * amplitude * amplitude * n * 4.0));
        double[] t = grid(n, rate);
        int runs = 120;
        double sum = 0;
        double sum2 = 0;
        double reported = 0;
        for (int s = 0; s < runs; s++) {
            double[] y = values(t, sigma, 1000 + s, new double[][] {{123.4, amplitude, 0.1 * s}, {171.1, 1.0, 0.3 * s}});
            Peak p = Survey.of(Series.uniform(0, rate, y)).peaks().stream()
                    .filter(q -> Math.abs(q.frequencyHz() - 123.4) < 0.3).findFirst().orElseThrow();
            double e = p.frequencyHz() - 123.4;
            sum += e;
            sum2 += e * e;
            reported += p.frequencyStdErrorHz();
        }
        double sd = Math.sqrt(sum2 / runs - (sum / runs) * (sum / runs));
        System.out.printf("frequency SD / CRLB = %.3f, mean reported SE / CRLB = %.3f%n", sd / bound, reported / runs / bound);
        assertThat(sd / bound).isBetween(0.8, 1.2);
        assertThat(reported / runs / bound).isBetween(0.85, 1.15);
    }
}
