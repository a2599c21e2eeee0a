package org.phasewright.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.jtransforms.fft.DoubleFFT_1D;
import org.junit.jupiter.api.Test;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.SinusoidReport;
import org.phasewright.model.Sinusoid;
import org.phasewright.series.Series;

/**
 * Least squares against the DFT computed by JTransforms. On a uniform record with a whole number
 * of cycles (frequency k/T on the FFT grid) the cos/sin columns are orthogonal to each other and to
 * the constant, so the LS amplitude equals 2|X_k|/N and, for x = A cos(2 pi f t - phi), the bin's
 * argument is -phi. Off the grid the FFT bin leaks while least squares stays exact.
 */
class FftCrossCheckTest {

    private static double[] spectrum(double[] y) {
        int n = y.length;
        double[] a = new double[2 * n];
        for (int i = 0; i < n; i++) {
            a[2 * i] = y[i];
        }
        new DoubleFFT_1D(n).complexForward(a);
        return a;
    }

    @Test
    void onGridAmplitudeAndPhaseEqualTheDftBin() {
        int n = 1024;
        double rate = 256;
        Random rnd = new Random(3);
        double[] y = TestSignals.addNoise(TestSignals.tones(rate, n, new double[][] {{1.5, 10.0, 40}, {0.3, 37.25, -100}},
                0.7), 0.5, rnd);
        double[] x = spectrum(y);
        for (int k : new int[] {40, 149, 77, 300}) {
            double f = k * rate / n;
            FitResult fit = Fitter.fit(Series.uniform(0, rate, y), ModelSpec.of(new Intercept(), new Sinusoid(f)));
            SinusoidReport r = (SinusoidReport) fit.terms().get(1);
            double re = x[2 * k];
            double im = x[2 * k + 1];
            double ampFft = 2 * Math.hypot(re, im) / n;
            double phaseFft = -Math.toDegrees(Math.atan2(im, re));
            assertThat(Math.abs(r.amplitude() - ampFft)).as("amplitude at bin %d", k).isLessThan(1e-9);
            double dphi = Math.IEEEremainder(r.phaseDeg() - phaseFft, 360);
            assertThat(Math.abs(Math.toRadians(dphi))).as("phase (radians) at bin %d", k).isLessThan(1e-9);
        }
    }

    @Test
    void offGridLeastSquaresIsExactWhileTheFftBinLeaks() {
        int n = 1000;
        double rate = 100;
        double f = 10.37 * rate / n; // 10.37 cycles in the record: between bins 10 and 11
        double[] y = TestSignals.tones(rate, n, new double[][] {{2.0, f, 25}}, 0);
        FitResult fit = Fitter.fit(Series.uniform(0, rate, y), ModelSpec.of(new Intercept(), new Sinusoid(f)));
        SinusoidReport r = (SinusoidReport) fit.terms().get(1);
        assertThat(Math.abs(r.amplitude() - 2.0)).isLessThan(1e-9);
        assertThat(Math.abs(r.phaseDeg() - 25)).isLessThan(1e-8);
        double[] x = spectrum(y);
        double best = 0;
        for (int k = 1; k < n / 2; k++) {
            best = Math.max(best, 2 * Math.hypot(x[2 * k], x[2 * k + 1]) / n);
        }
        // scalloping loss of the rectangular window at 0.37 bin is about 19% (common practice)
        assertThat(best).isLessThan(0.9 * 2.0);
    }
}
