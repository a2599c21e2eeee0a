package org.phasewright.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

class CleaningTest {

    @Test
    void removingTheHumLeavesTheToneAndTheNoise() {
        double rate = 8000;
        int n = 8000;
        Random rnd = new Random(1);
        double[] y = new double[n];
        double[] wanted = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            wanted[i] = 0.3 * Math.cos(2 * Math.PI * 440 * t) + 0.001 * rnd.nextGaussian();
            y[i] = wanted[i] + 0.2 * Math.cos(2 * Math.PI * 50 * t + 0.4) + 0.05 * Math.cos(2 * Math.PI * 150 * t);
        }
        y[100] = Double.NaN;
        Series s = Series.uniform(0, rate, y);
        FitResult fit = Fitter.fit(s, ModelSpec.of(new Intercept(), new HarmonicSeries(50, 5), new Sinusoid(440)));
        Series cleaned = Cleaning.remove(s, fit, List.of("harmonics of 50 Hz"));
        assertThat(cleaned.isMissing(100)).isTrue();
        for (int i = 0; i < n; i += 97) {
            if (i != 100) {
                assertThat(cleaned.valueAt(i)).isCloseTo(wanted[i], within(1e-4));
            }
        }
        Series noCycles = Cleaning.removePeriodic(s, fit);
        assertThat(noCycles.valueAt(5)).isCloseTo(wanted[5] - 0.3 * Math.cos(2 * Math.PI * 440 * 5 / rate), within(1e-4));
        assertThatThrownBy(() -> Cleaning.remove(s, fit, List.of("hum"))).hasMessageContaining("'hum'")
                .hasMessageContaining("harmonics of 50 Hz");
    }
}
