package org.phasewright.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.Component;
import org.phasewright.fit.Components;
import org.phasewright.fit.FitResult;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

/**
 * What a robust fit carries besides its estimates: its components along the record, the final weight
 * of every sample and the counts behind its inference. The record is invented (a tone on a drift with
 * white noise of SD 0.2, 4 % spikes and dropouts, three gaps), so the truth at every sample is known.
 */
class RobustComponentsTest {

    private static final ModelSpec SPEC = ModelSpec.of(new Intercept(), new PolynomialTrend(1), new Sinusoid(0.05));
    private static final int N = 600;

    private final double[] truth = new double[N];
    private final List<Integer> spikes = new ArrayList<>();

    private Series record() {
        Random rnd = new Random(77);
        double[] y = new double[N];
        for (int i = 0; i < N; i++) {
            truth[i] = 2 + 0.001 * i + Math.cos(2 * Math.PI * 0.05 * i - 0.3);
            y[i] = truth[i] + 0.2 * rnd.nextGaussian();
            if (rnd.nextDouble() < 0.04) {
                y[i] += rnd.nextBoolean() ? 15 : -8;
                spikes.add(i);
            }
        }
        for (int gap : new int[] {40, 41, 333}) {
            y[gap] = Double.NaN;
            spikes.remove(Integer.valueOf(gap));
        }
        return Series.uniform(0, 1, y);
    }

    @Test
    void componentsAreTheRobustFitAlongTheRecord() {
        Series s = record();
        for (RobustLoss loss : RobustLoss.values()) {
            RobustResult r = RobustFit.fit(s, SPEC, loss);
            Components c = r.components();
            double[] beta = r.beta();
            // the model evaluated at bare times by the design, independently of the component pass
            double[] rows = r.plain().design().rowsAt(s.times());
            int p = beta.length;
            double worstRobust = 0;
            double worstPlain = 0;
            for (int i = 0; i < N; i++) {
                double model = 0;
                for (int j = 0; j < p; j++) {
                    model += rows[i * p + j] * beta[j];
                }
                assertThat(c.fitted()[i]).as("fitted at %d", i).isCloseTo(model, within(1e-12));
                double sum = 0;
                for (Component part : c.parts()) {
                    sum += part.values()[i];
                }
                assertThat(sum).isCloseTo(c.fitted()[i], within(1e-12));
                if (Double.isNaN(s.valueAt(i))) {
                    assertThat(c.observed()[i]).isNaN();
                    assertThat(c.residual()[i]).isNaN();
                    assertThat(c.fitted()[i]).isFinite(); // the model exists at a gap
                } else {
                    assertThat(c.observed()[i]).isEqualTo(s.valueAt(i));
                    assertThat(c.residual()[i]).isEqualTo(s.valueAt(i) - c.fitted()[i]);
                }
                worstRobust = Math.max(worstRobust, Math.abs(c.fitted()[i] - truth[i]));
                worstPlain = Math.max(worstPlain, Math.abs(r.plain().components().fitted()[i] - truth[i]));
            }
            // fitted SE is about 0.2 sqrt(p / n) = 0.016, so 0.08 is 5 of them; the spikes pull least squares off
            assertThat(worstRobust).as(loss.id()).isLessThan(0.08);
            assertThat(worstPlain).isGreaterThan(2 * worstRobust);
            assertThat(c.parts()).extracting(Component::label)
                    .containsExactly("intercept", "polynomial trend of degree 1", "sinusoid 0.05 Hz");
            assertThat(c.times()).containsExactly(s.times());
        }
    }

    @Test
    void weightsFollowTheResidualsAndRejectTheSpikes() {
        Series s = record();
        for (RobustLoss loss : RobustLoss.values()) {
            RobustResult r = RobustFit.fit(s, SPEC, loss);
            double[] w = r.weights();
            double[] e = r.components().residual();
            int low = 0;
            for (int i = 0; i < N; i++) {
                if (Double.isNaN(s.valueAt(i))) {
                    assertThat(w[i]).isNaN();
                    continue;
                }
                // the weight is the loss's psi(r)/r at the residual over the scale (unit series weights)
                assertThat(w[i]).as("weight at %d", i).isCloseTo(loss.weight(e[i] / r.scale(), r.tuning()), within(1e-9));
                assertThat(w[i]).isBetween(0.0, 1.0);
                if (w[i] < 0.5) {
                    low++;
                }
            }
            assertThat(low).isEqualTo(r.downweighted());
            for (int i : spikes) {
                assertThat(w[i]).as("%s weight of the spike at %d", loss.id(), i).isLessThan(0.1);
            }
            assertThat(r.n()).isEqualTo(N - 3).isEqualTo(r.plain().n());
            assertThat(r.p()).isEqualTo(4);
            assertThat(r.dof()).isEqualTo(r.n() - r.p());
            assertThat(r.level()).isEqualTo(r.plain().level());
            assertThat(r.scale()).isCloseTo(0.2, within(0.03));
        }
    }

    @Test
    void onCleanDataTheRobustComponentsAreNearTheLeastSquaresOnes() {
        Random rnd = new Random(3);
        double[] y = new double[400];
        for (int i = 0; i < y.length; i++) {
            y[i] = 1 + Math.cos(2 * Math.PI * 0.05 * i) + 0.2 * rnd.nextGaussian();
        }
        Series s = Series.uniform(0, 1, y);
        RobustResult r = RobustFit.fit(s, SPEC, RobustLoss.HUBER);
        FitResult plain = r.plain();
        for (int i = 0; i < y.length; i++) {
            // both estimate the same line within a fraction of its 0.02 standard error (95 % efficiency, Huber 1964)
            assertThat(r.components().fitted()[i]).isCloseTo(plain.components().fitted()[i], within(0.02));
        }
    }
}
