package org.phasewright.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.FitResult;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.SinusoidReport;
import org.phasewright.series.Series;

class RobustFitTest {

    private static final ModelSpec SPEC = ModelSpec.of(new Intercept(), new Sinusoid(0.05));

    private static Series record(Random rnd, int n, double spikeRate) {
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 2 + 1.0 * Math.cos(2 * Math.PI * 0.05 * i - 0.3) + 0.2 * rnd.nextGaussian();
            if (rnd.nextDouble() < spikeRate) {
                y[i] += rnd.nextBoolean() ? 15 : -8; // spikes and dropouts
            }
        }
        return Series.uniform(0, 1, y);
    }

    @Test
    void spikesAreRejectedAndTheAmplitudeRecovered() {
        Random rnd = new Random(31);
        Series s = record(rnd, 500, 0.04);
        for (RobustLoss loss : RobustLoss.values()) {
            RobustResult r = RobustFit.fit(s, SPEC, loss);
            SinusoidReport robust = (SinusoidReport) r.terms().get(1);
            SinusoidReport ols = (SinusoidReport) r.plain().terms().get(1);
            assertThat(robust.amplitude()).as(loss.id()).isCloseTo(1.0, within(4 * robust.amplitudeSe()));
            assertThat(robust.amplitudeSe()).isLessThan(0.3 * ols.amplitudeSe());
            assertThat(r.scale()).isCloseTo(0.2, within(0.03));
            assertThat(r.downweighted()).isBetween(15, 35);
            assertThat(r.converged()).isTrue();
        }
    }

    @Test
    void onCleanGaussianDataTheRobustErrorsAreNearThePlainOnes() {
        // 95% normal efficiency of both tunings (Huber 1964; Beaton and Tukey 1974): se ratio about 1/sqrt(0.95) = 1.026
        Series s = record(new Random(5), 2000, 0);
        for (RobustLoss loss : RobustLoss.values()) {
            RobustResult r = RobustFit.fit(s, SPEC, loss);
            FitResult plain = r.plain();
            double ratio = ((SinusoidReport) r.terms().get(1)).amplitudeSe() / ((SinusoidReport) plain.terms().get(1)).amplitudeSe();
            assertThat(ratio).as(loss.id()).isBetween(0.98, 1.10);
        }
    }

    @Test
    void robustIntervalsCoverUnderContamination() {
        // 400 contaminated records: binomial SD of a 95% rate is 1.1%, so [0.91, 0.985] is over 3 SD each side
        Random rnd = new Random(2718);
        int hit = 0;
        int runs = 400;
        for (int r = 0; r < runs; r++) {
            SinusoidReport a = (SinusoidReport) RobustFit.fit(record(rnd, 300, 0.05), SPEC, RobustLoss.HUBER).terms().get(1);
            if (a.amplitudeCiLow() <= 1.0 && 1.0 <= a.amplitudeCiHigh()) {
                hit++;
            }
        }
        double coverage = hit / (double) runs;
        System.out.printf(java.util.Locale.ROOT, "robust (Huber) amplitude coverage with 5%% spikes: %.3f (%d runs)%n", coverage, runs);
        assertThat(coverage).isBetween(0.91, 0.985);
    }
}
