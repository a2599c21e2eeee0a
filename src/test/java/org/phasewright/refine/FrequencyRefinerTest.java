package org.phasewright.refine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.junit.jupiter.api.Test;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.SinusoidReport;
import org.phasewright.series.Series;
import org.phasewright.spectrum.Survey;

class FrequencyRefinerTest {

    @Test
    void recoversSeveralIndependentTonesBesideATrendExactly() {
        double rate = 200;
        int n = 1000; // T = 5 s, resolution 0.2 Hz
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            y[i] = 0.5 + 0.1 * t + 2 * Math.cos(2 * Math.PI * 11.37 * t - 0.4) + 0.7 * Math.cos(2 * Math.PI * 23.91 * t + 1.0);
        }
        Series s = Series.uniform(0, rate, y);
        ModelSpec start = ModelSpec.of(new Intercept(), new PolynomialTrend(1), new Sinusoid(11.3), new Sinusoid(24.0));
        Refinement r = FrequencyRefiner.refine(s, start);
        // noise-free: the least-squares optimum is the generating signal itself (common practice)
        assertThat(r.converged()).isTrue();
        assertThat(r.frequencies()).extracting(RefinedFrequency::frequencyHz)
                .satisfiesExactly(f -> assertThat(f).isCloseTo(11.37, within(1e-9)), f -> assertThat(f).isCloseTo(23.91, within(1e-9)));
        SinusoidReport first = (SinusoidReport) r.fit().terms().get(2);
        assertThat(first.amplitude()).isCloseTo(2, within(1e-8));
        assertThat(first.phaseDeg()).isCloseTo(Math.toDegrees(0.4), within(1e-6));
        assertThat(r.warnings()).extracting(w -> w.code()).doesNotContain("not_converged");
    }

    @Test
    void refinesTheSharedFundamentalOfAHarmonicSeries() {
        double rate = 1000;
        int n = 2000;
        double f0 = 49.93;
        Random rnd = new Random(4);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            y[i] = 3 * Math.cos(2 * Math.PI * f0 * t) + 1 * Math.sin(2 * Math.PI * 3 * f0 * t + 0.2)
                    + 0.5 * Math.cos(2 * Math.PI * 5 * f0 * t + 2) + 0.01 * rnd.nextGaussian();
        }
        Series s = Series.uniform(0, rate, y);
        Refinement r = FrequencyRefiner.refine(s, ModelSpec.of(new Intercept(), new HarmonicSeries(50.0, 5, List.of(2, 4))));
        RefinedFrequency f = r.frequencies().get(0);
        assertThat(f.kind()).isEqualTo("harmonic_series");
        assertThat(f.frequencyHz()).isCloseTo(f0, within(5 * f.stdErrorHz()));
        // Cramer-Rao bound for a real harmonic series sharing f0 (Kay 1993, Fundamentals of Statistical Signal
        // Processing: Estimation Theory, eq. 3.41, extended by summing the harmonics' Fisher information
        // h^2 A_h^2): var f0 = 24 sigma^2 / ((2 pi)^2 N (N^2 - 1) sum h^2 A_h^2) in cycles per sample
        double info = 1 * 9 + 9 * 1 + 25 * 0.25;
        double crlb = Math.sqrt(24 * 1e-4 / (4 * Math.PI * Math.PI * n * ((double) n * n - 1) * info)) * rate;
        assertThat(f.stdErrorHz()).isCloseTo(crlb, within(0.05 * crlb));
        HarmonicSeriesReport h = (HarmonicSeriesReport) r.fit().terms().get(1);
        assertThat(h.harmonics()).extracting(SinusoidReport::harmonic).containsExactly(1, 3, 5);
        assertThat(h.harmonics().get(2).amplitude()).isCloseTo(0.5, within(1e-3));
    }

    @Test
    void fourParameterSineFitMatchesCommonsMathLevenbergMarquardt() {
        // Reference: Commons Math 3 LevenbergMarquardtOptimizer on y = C + A cos(2 pi f t) + B sin(2 pi f t),
        // its covariance (J'J)^-1 scaled by RSS / (n - 4) for the frequency's standard error.
        Random rnd = new Random(12);
        double rate = 100;
        int n = 400;
        double[] t = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i / rate;
            y[i] = 0.3 + 1.2 * Math.cos(2 * Math.PI * 7.123 * t[i] + 0.5) + 0.2 * rnd.nextGaussian();
        }
        Refinement ours = SineFit.fourParameter(Series.uniform(0, rate, y));
        MultivariateJacobianFunction model = point -> {
            double c = point.getEntry(0);
            double a = point.getEntry(1);
            double b = point.getEntry(2);
            double f = point.getEntry(3);
            RealVector v = new ArrayRealVector(n);
            RealMatrix j = new Array2DRowRealMatrix(n, 4);
            for (int i = 0; i < n; i++) {
                double w = 2 * Math.PI * f * t[i];
                v.setEntry(i, c + a * Math.cos(w) + b * Math.sin(w));
                j.setEntry(i, 0, 1);
                j.setEntry(i, 1, Math.cos(w));
                j.setEntry(i, 2, Math.sin(w));
                j.setEntry(i, 3, 2 * Math.PI * t[i] * (-a * Math.sin(w) + b * Math.cos(w)));
            }
            return new Pair<>(v, j);
        };
        LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                .model(model).target(y).start(new double[] {0, 1, 0, 7.12}).maxEvaluations(1000).maxIterations(1000).build());
        double fRef = opt.getPoint().getEntry(3);
        double rss = opt.getResiduals().dotProduct(opt.getResiduals());
        double seRef = Math.sqrt(opt.getCovariances(1e-14).getEntry(3, 3) * rss / (n - 4));
        RefinedFrequency f = ours.frequencies().get(0);
        assertThat(f.frequencyHz()).isCloseTo(fRef, within(1e-4 * seRef));
        assertThat(f.stdErrorHz()).isCloseTo(seRef, within(1e-6 * seRef));
        assertThat(ours.rss()).isLessThanOrEqualTo(rss * (1 + 1e-12));
        assertThat(ours.dof()).isEqualTo(n - 4);
    }

    @Test
    void fourParameterSineFitConvergesFromTheFftStartOnAnUnevenGappyRecord() {
        Random rnd = new Random(21);
        int n = 500;
        double[] t = new double[n];
        double[] y = new double[n];
        double acc = 0;
        for (int i = 0; i < n; i++) {
            acc += 0.01 * (0.5 + rnd.nextDouble());
            t[i] = acc;
            y[i] = (i % 50 < 10) ? Double.NaN : -1 + 0.8 * Math.cos(2 * Math.PI * 3.3333 * t[i] - 1.0);
        }
        Series s = Series.at(t, y);
        Refinement r = SineFit.fourParameter(s);
        // noise-free: the generating tone is the exact optimum (common practice)
        assertThat(r.frequencies().get(0).frequencyHz()).isCloseTo(3.3333, within(1e-9));
        assertThat(((SinusoidReport) r.fit().terms().get(1)).amplitude()).isCloseTo(0.8, within(1e-9));
        assertThat(r.converged()).isTrue();
    }

    @Test
    void startModelsFromASurveyRefineToTheTones() {
        double rate = 500;
        int n = 2500;
        Random rnd = new Random(3);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double tt = i / rate;
            y[i] = Math.cos(2 * Math.PI * 20.04 * tt) + 0.4 * Math.cos(2 * Math.PI * 40.08 * tt + 1) + 0.25 * Math.sin(2 * Math.PI * 77.7 * tt)
                    + 0.05 * rnd.nextGaussian();
        }
        Series s = Series.uniform(0, rate, y);
        ModelSpec start = StartModels.fromFundamental(Survey.of(s), 5);
        assertThat(start.terms()).hasSize(3);
        Refinement r = FrequencyRefiner.refine(s, start);
        RefinedFrequency f0 = r.frequencies().get(0);
        RefinedFrequency tone = r.frequencies().get(1);
        // the generating frequencies within 4 reported standard errors (asymptotic normality; common practice)
        assertThat(f0.frequencyHz()).isCloseTo(20.04, within(4 * f0.stdErrorHz()));
        assertThat(tone.frequencyHz()).isCloseTo(77.7, within(4 * tone.stdErrorHz()));
        assertThat(tone.stdErrorHz()).isLessThan(1e-3);
    }

    @Test
    void refusesModelsWithoutFrequenciesAndReachingNyquist() {
        Series s = Series.uniform(0, 10, new double[] {1, 2, 3, 4, 5, 6, 7, 8, 9, 10});
        assertThatThrownBy(() -> FrequencyRefiner.refine(s, ModelSpec.of(new Intercept())))
                .isInstanceOf(ModelException.class).hasMessageContaining("no sinusoid");
        // a starting frequency above Nyquist is refused by the engine with its alias named
        assertThatThrownBy(() -> FrequencyRefiner.refine(s, ModelSpec.of(new Intercept(), new Sinusoid(7))))
                .isInstanceOf(ModelException.class).hasMessageContaining("alias at 3 Hz");
    }
}
