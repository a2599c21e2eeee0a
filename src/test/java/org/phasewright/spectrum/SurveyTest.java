package org.phasewright.spectrum;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.series.Series;

class SurveyTest {

    private static Series signal(double rate, int n, double sigma, long seed, double[][] tones) {
        Random rnd = new Random(seed);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            double v = sigma * rnd.nextGaussian();
            for (double[] tone : tones) {
                v += tone[1] * Math.cos(2 * Math.PI * tone[0] * t + (tone.length > 2 ? tone[2] : 0));
            }
            y[i] = v;
        }
        return Series.uniform(0, rate, y);
    }

    @Test
    void findsTonesWithoutSideLobesAndReadsTheirAmplitudes() {
        double[][] tones = {{50.3, 1.0}, {121.7, 0.3}, {333.3, 0.1}};
        Series s = signal(1000, 4000, 0.05, 1, tones);
        for (Window w : Window.values()) {
            SurveyResult r = Survey.of(s, SurveyOptions.defaults().withPeriodogram(PeriodogramOptions.defaults().withWindow(w)));
            assertThat(r.peaks()).as("window %s", w).hasSize(3);
            for (int i = 0; i < 3; i++) {
                Peak p = r.peaks().get(i);
                assertThat(p.frequencyHz()).isCloseTo(tones[i][0], within(0.02));
                assertThat(p.amplitude()).isCloseTo(tones[i][1], within(0.01 + 0.02 * tones[i][1]));
            }
        }
    }

    @Test
    void noiseLevelAndSnrFollowTheWhiteNoiseFormula() {
        // White noise sigma through a Hann window: E[A^2] = 4 sigma^2 ENBW / N per grid point (common practice).
        double sigma = 0.2;
        int n = 8192;
        Series s = signal(1000, n, sigma, 4, new double[][] {{200.1, 0.05}});
        SurveyResult r = Survey.of(s);
        Peak p = r.peaks().get(0);
        double expected = Math.sqrt(4 * sigma * sigma * 1.5 / n);
        assertThat(p.noiseAmplitude()).isCloseTo(expected, within(0.15 * expected));
        assertThat(p.snrDb()).isCloseTo(20 * Math.log10(0.05 / expected), within(1.5));
    }

    @Test
    void findsTheFundamentalOfAHarmonicSeriesAndLeavesAStrayPeakUnexplained() {
        double f0 = 49.8;
        double[][] tones = {{f0, 1.0}, {2 * f0, 0.5}, {3 * f0, 0.3}, {5 * f0, 0.2}, {7 * f0, 0.1}, {173.0, 0.15}};
        SurveyResult r = Survey.of(signal(2000, 8000, 0.02, 2, tones));
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(f0, within(0.01));
        assertThat(c.harmonicNumbers()).containsExactly(1, 2, 3, 5, 7);
        assertThat(c.unexplained()).extracting(Peak::frequencyHz).singleElement()
                .satisfies(f -> assertThat(f).isCloseTo(173.0, within(0.05)));
        assertThat(c.explainedPowerFraction()).isGreaterThan(0.95);
    }

    @Test
    void findsAMissingFundamentalFromItsHarmonics() {
        double f0 = 40;
        SurveyResult r = Survey.of(signal(1000, 4000, 0.01, 3, new double[][] {{80, 1}, {120, 0.8}, {160, 0.6}}));
        FundamentalCandidate c = r.fundamental().orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(f0, within(0.01));
        assertThat(c.harmonicNumbers()).containsExactly(2, 3, 4);
    }

    @Test
    void gappyRecordsUseLombScargleAndReportTheFalseAlarmProbability() {
        Random rnd = new Random(9);
        int n = 600;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / 10.0;
            y[i] = (i % 100 < 30) ? Double.NaN : 0.8 * Math.sin(2 * Math.PI * 0.37 * t) + 0.3 * rnd.nextGaussian();
        }
        SurveyResult r = Survey.of(Series.uniform(0, 10, y));
        assertThat(r.spectrum().method()).isEqualTo("lomb_scargle");
        assertThat(r.notes()).extracting(SpectrumNote::code).contains("method_lomb_scargle");
        assertThat(r.topPeakFalseAlarmProbability()).isPresent();
        assertThat(r.topPeakFalseAlarmProbability().getAsDouble()).isLessThan(1e-6);
        List<Peak> peaks = r.peaks();
        assertThat(peaks.get(0).frequencyHz()).isCloseTo(0.37, within(0.005));
        assertThat(peaks.get(0).amplitude()).isCloseTo(0.8, within(0.08));
        // the gap pattern repeats every 10 s: its 0.1 Hz aliases of the tone are screened as leakage
        assertThat(peaks).noneMatch(p -> Math.abs(p.frequencyHz() - 0.27) < 0.01 || Math.abs(p.frequencyHz() - 0.47) < 0.01);
    }

    @Test
    void pureNoiseGivesNoFundamental() {
        SurveyResult r = Survey.of(signal(100, 1000, 1, 5, new double[0][]));
        assertThat(r.fundamental()).isEmpty();
    }
}
