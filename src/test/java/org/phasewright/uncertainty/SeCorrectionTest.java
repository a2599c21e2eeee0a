package org.phasewright.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.FitOptions;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelException;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

class SeCorrectionTest {

    @Test
    void arModelOfWhiteNoiseIsWhiteAndKeepsThePlainErrors() {
        Random rnd = new Random(1);
        double[] y = new double[800];
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.sin(0.3 * i) + rnd.nextGaussian();
        }
        Series s = Series.uniform(0, 1, y);
        ModelSpec spec = ModelSpec.of(new Intercept(), new Sinusoid(0.3 / (2 * Math.PI)));
        FitResult plain = Fitter.fit(s, spec);
        CorrectedInference ar = SeCorrection.apply(plain, s, CorrectionOptions.of(SeMethod.AR_NOISE));
        // white noise: AIC picks order 0 and Gamma = s^2 I makes the sandwich C (X' s^2 I X) C = s^2 C (textbook)
        assertThat(ar.arCoefficients()).isEmpty();
        for (int j = 0; j < plain.p(); j++) {
            assertThat(ar.coefficients().get(j).stdError()).isCloseTo(plain.coefficients().get(j).stdError(),
                    within(1e-9 * plain.coefficients().get(j).stdError()));
            assertThat(ar.coefficients().get(j).estimate()).isEqualTo(plain.coefficients().get(j).estimate());
        }
        assertThat(ar.description()).contains("AR order 0").contains("equal the plain ones");
    }

    @Test
    void arModelRecoversPhiAndWorksAcrossGapsWithTrendsAndHarmonics() {
        Random rnd = new Random(2);
        int n = 3000;
        double[] y = new double[n];
        double e = 0;
        for (int i = 0; i < n; i++) {
            e = 0.6 * e + rnd.nextGaussian();
            double t = i / 100.0;
            y[i] = (i % 500 < 40) ? Double.NaN : 0.01 * t + Math.cos(2 * Math.PI * 1.5 * t) + 0.3 * Math.cos(2 * Math.PI * 4.5 * t) + e;
        }
        Series s = Series.uniform(0, 100, y);
        ModelSpec spec = ModelSpec.of(new Intercept(), new PolynomialTrend(1), new HarmonicSeries(1.5, 3, List.of(2)));
        CorrectedInference ar = SeCorrection.fit(s, spec, CorrectionOptions.of(SeMethod.AR_NOISE), FitOptions.defaults());
        // the generating phi = 0.6; the Yule-Walker estimate has SD about sqrt((1 - phi^2) / n) = 0.015
        // (Brockwell and Davis 1991, sec. 8.2)
        assertThat(ar.arCoefficients()[0]).isCloseTo(0.6, within(0.05));
        HarmonicSeriesReport h = (HarmonicSeriesReport) ar.term("harmonics of 1.5 Hz");
        HarmonicSeriesReport p = (HarmonicSeriesReport) ar.plain().term("harmonics of 1.5 Hz");
        // noise density at low frequency exceeds the average: corrected errors are larger
        assertThat(h.harmonics().get(0).amplitudeSe()).isGreaterThan(1.5 * p.harmonics().get(0).amplitudeSe());
        assertThat(h.varianceShare()).isEqualTo(p.varianceShare());
        // +-40 bins: about 76 ordinates, so the band mean has a relative SD near 1/sqrt(76) = 11.5%
        CorrectedInference local = SeCorrection.apply(ar.plain(), s, new CorrectionOptions(SeMethod.LOCAL_SPECTRUM, 5, 40));
        assertThat(local.localNoise()).hasSize(2);
        // AR(1) density ratio at 1.5 Hz (0.015 cycles/sample): (1 - phi^2) / |1 - phi e^{-iw}|^2 = 3.6 (common practice)
        double w = 2 * Math.PI * 0.015;
        double expected = (1 - 0.36) / (1 - 1.2 * Math.cos(w) + 0.36);
        assertThat(local.localNoise().get(0).densityRatio()).isCloseTo(expected, within(0.35 * expected));
    }

    @Test
    void unevenRecordsAreRefusedForLagBasedMethodsWithAPointer() {
        double[] t = new double[50];
        double[] y = new double[50];
        Random rnd = new Random(3);
        double acc = 0;
        for (int i = 0; i < 50; i++) {
            acc += 0.5 + rnd.nextDouble();
            t[i] = acc;
            y[i] = Math.sin(0.2 * acc) + 0.1 * rnd.nextGaussian();
        }
        Series s = Series.at(t, y);
        ModelSpec spec = ModelSpec.of(new Intercept(), new Sinusoid(0.2 / (2 * Math.PI)));
        assertThatThrownBy(() -> SeCorrection.fit(s, spec, CorrectionOptions.of(SeMethod.NEWEY_WEST), FitOptions.defaults()))
                .isInstanceOf(ModelException.class).hasMessageContaining("local_spectrum");
        assertThat(SeCorrection.fit(s, spec, CorrectionOptions.of(SeMethod.LOCAL_SPECTRUM), FitOptions.defaults()).localNoise())
                .hasSize(1);
        assertThat(SeMethod.parse("HAC")).isEqualTo(SeMethod.NEWEY_WEST);
    }
}
