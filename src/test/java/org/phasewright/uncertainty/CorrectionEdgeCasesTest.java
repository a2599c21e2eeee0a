package org.phasewright.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

/** Corrections at the edges: many columns beside few samples, and what a correction may not touch. */
class CorrectionEdgeCasesTest {

    private static Series white(int n, Random rnd) {
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 2 * Math.cos(2 * Math.PI * 0.31 * i + 0.4) + rnd.nextGaussian();
        }
        return Series.uniform(0, 1, y);
    }

    @Test
    void localSpectrumLeavesThePlainFitUntouched() {
        // Contract: a correction returns a new covariance; the plain fit it was given (kept in the result as
        // plain()) keeps its own s^2 (X'X)^-1 and predictions.
        Series s = white(300, new Random(5));
        FitResult plain = Fitter.fit(s, ModelSpec.of(new Intercept(), new Sinusoid(0.31)));
        double[][] before = new double[plain.p()][];
        for (int i = 0; i < plain.p(); i++) {
            before[i] = plain.covariance()[i].clone();
        }
        double predictionBefore = plain.predict(new double[] {3.5}).meanHigh()[0];
        CorrectedInference local = SeCorrection.apply(plain, s, CorrectionOptions.of(SeMethod.LOCAL_SPECTRUM));
        assertThat(local.plain().covariance()).isDeepEqualTo(before);
        assertThat(plain.predict(new double[] {3.5}).meanHigh()[0]).isEqualTo(predictionBefore);
    }

    @Test
    void localSpectrumRatioIsOneForWhiteNoiseBesideManyColumns() {
        // For white noise of variance sigma^2 the residual periodogram away from the fitted frequencies has mean
        // sigma^2 (Hannan 1970, Multiple Time Series, ch. VII), and the unbiased estimate of sigma^2 is
        // RSS / (n - p) (textbook); so the density ratio averages 1 whatever p is. Here p = 83 of n = 240
        // (40 harmonics on the Fourier grid, far below the tone's band), where RSS / n would give n / (n - p) = 1.53.
        // 200 records of 22 ordinates: the mean ratio has SD near 1 / sqrt(200 x 22) = 0.015; band +-0.06.
        Random rnd = new Random(240);
        ModelSpec spec = ModelSpec.of(new Intercept(), new HarmonicSeries(1.0 / 240, 40), new Sinusoid(0.31));
        double sum = 0;
        int records = 200;
        for (int r = 0; r < records; r++) {
            Series s = white(240, rnd);
            CorrectedInference local = SeCorrection.apply(Fitter.fit(s, spec), s, CorrectionOptions.of(SeMethod.LOCAL_SPECTRUM));
            LocalNoise tone = local.localNoise().get(local.localNoise().size() - 1);
            assertThat(tone.frequencyHz()).isEqualTo(0.31);
            sum += tone.densityRatio();
        }
        assertThat(sum / records).isCloseTo(1.0, within(0.06));
    }

    @Test
    void arOrderNeverExhaustsTheResidualDegreesOfFreedom() {
        // 64 samples, 61 columns (intercept and 30 harmonics on the Fourier grid): 3 residual degrees of freedom.
        // The residuals of such a fit are strongly structured and the AIC picks orders up to the limit; the t
        // reference on n - p - order degrees of freedom must stay defined (at least 1; common practice).
        for (long seed = 1; seed <= 3; seed++) {
            Random rnd = new Random(seed);
            double[] z = new double[64];
            for (int i = 0; i < z.length; i++) {
                z[i] = rnd.nextGaussian();
            }
            Series s = Series.uniform(0, 1, z);
            FitResult plain = Fitter.fit(s, ModelSpec.of(new Intercept(), new HarmonicSeries(1.0 / 64, 30)));
            assertThat(plain.dof()).isEqualTo(3);
            CorrectedInference ar = SeCorrection.apply(plain, s, new CorrectionOptions(SeMethod.AR_NOISE, 10, 12));
            assertThat(ar.dof()).isEqualTo(plain.dof() - ar.arCoefficients().length).isGreaterThanOrEqualTo(1);
            assertThat(ar.coefficients().get(0).pValue()).isBetween(0.0, 1.0);
        }
    }
}
