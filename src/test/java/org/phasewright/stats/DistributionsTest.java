package org.phasewright.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.junit.jupiter.api.Test;

/** Distribution functions checked against Apache Commons Math 3 (reference library). */
class DistributionsTest {

    /** Relative agreement, with an absolute floor of 1e-15 (Commons Math's own accuracy far in the tails). */
    private static void close(double actual, double expected, double rel) {
        assertThat(actual).isCloseTo(expected, within(rel * Math.abs(expected) + 1e-15));
    }

    @Test
    void studentTMatchesCommonsMath() {
        for (double dof : new double[] {1, 2, 3.5, 5, 10, 30, 100, 1000, 1e5}) {
            TDistribution ref = new TDistribution(null, dof, 1e-14);
            for (double t : new double[] {-30, -5, -2, -0.5, 0, 0.3, 1, 1.96, 4, 12}) {
                close(Distributions.studentTCdf(t, dof), ref.cumulativeProbability(t), 1e-9);
            }
            for (double p : new double[] {0.001, 0.025, 0.1, 0.5, 0.9, 0.975, 0.995}) {
                close(Distributions.studentTQuantile(p, dof), ref.inverseCumulativeProbability(p), 1e-8);
            }
            // two-sided p-value = 2 * (1 - F(|t|)), here computed without cancellation
            close(Distributions.studentTTwoSidedP(2.5, dof), 2 * ref.cumulativeProbability(-2.5), 1e-10);
        }
    }

    @Test
    void fMatchesCommonsMath() {
        double[][] dofs = {{1, 1}, {2, 10}, {2, 1000}, {5, 3}, {10, 50}, {30, 7}};
        for (double[] d : dofs) {
            FDistribution ref = new FDistribution(null, d[0], d[1], 1e-14);
            for (double f : new double[] {0.01, 0.5, 1, 2, 5, 20}) {
                close(Distributions.fCdf(f, d[0], d[1]), ref.cumulativeProbability(f), 1e-10);
                close(Distributions.fSurvival(f, d[0], d[1]), 1 - ref.cumulativeProbability(f), 1e-9);
            }
            close(Distributions.fQuantile(0.95, d[0], d[1]), ref.inverseCumulativeProbability(0.95), 1e-8);
        }
    }

    @Test
    void chiSquareAndNormalMatchCommonsMath() {
        for (double dof : new double[] {1, 2, 7, 20, 200}) {
            ChiSquaredDistribution ref = new ChiSquaredDistribution(null, dof, 1e-14);
            for (double x : new double[] {0.1, 1, 5, 20, 100, 300}) {
                close(Distributions.chiSquareCdf(x, dof), ref.cumulativeProbability(x), 1e-10);
            }
        }
        NormalDistribution n = new NormalDistribution(null, 0, 1, 1e-14);
        for (double z : new double[] {-8, -3, -1, 0, 0.5, 2, 6}) {
            close(Distributions.normalCdf(z), n.cumulativeProbability(z), 1e-12);
        }
        for (double p : new double[] {1e-10, 0.001, 0.05, 0.5, 0.8, 0.999}) {
            close(Distributions.normalQuantile(p), n.inverseCumulativeProbability(p), 1e-8);
        }
        // a familiar table value, from memory: the 97.5% normal quantile is 1.959963985
        assertThat(Distributions.normalQuantile(0.975)).isCloseTo(1.959963985, within(1e-9));
    }
}
