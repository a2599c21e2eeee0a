package org.phasewright.spectrum;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.jtransforms.fft.DoubleFFT_1D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.phasewright.series.Series;

class PeriodogramTest {

    private static double[] tone(int n, double rate, double f, double amp, double phase) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = amp * Math.cos(2 * Math.PI * f * i / rate + phase);
        }
        return x;
    }

    @ParameterizedTest
    @EnumSource(Window.class)
    void matchesJTransformsFullComplexTransform(Window window) {
        // Reference: JTransforms realForwardFull (the full complex spectrum) on the same windowed data.
        int n = 300;
        double rate = 1000;
        java.util.Random rnd = new java.util.Random(11);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = rnd.nextGaussian() + 0.7 * Math.sin(2 * Math.PI * 123.4 * i / rate);
        }
        PeriodogramOptions o = new PeriodogramOptions(window, 3, false);
        Spectrum s = Periodogram.of(x, rate, o);
        int m = 900;
        double[] w = window.weights(n);
        double[] full = new double[2 * m];
        double sumW = 0;
        for (int i = 0; i < n; i++) {
            full[i] = x[i] * w[i];
            sumW += w[i];
        }
        new DoubleFFT_1D(m).realForwardFull(full);
        assertThat(s.size()).isEqualTo(m / 2 + 1);
        for (int k = 0; k <= m / 2; k++) {
            double c = (k == 0 || k == m / 2) ? 1 : 2;
            double ref = c * Math.hypot(full[2 * k], full[2 * k + 1]) / sumW;
            assertThat(s.amplitudeAt(k)).isCloseTo(ref, within(1e-12 * (1 + ref)));
            assertThat(s.frequencyAt(k)).isCloseTo(k * rate / m, within(1e-9));
        }
    }

    @ParameterizedTest
    @EnumSource(Window.class)
    void onBinToneReadsItsAmplitude(Window window) {
        // Exact tone on bin 37 of 512: amplitude-correct scaling must read A exactly (common practice).
        double rate = 512;
        double[] x = tone(512, rate, 37, 2.5, 0.3);
        Spectrum s = Periodogram.of(x, rate, new PeriodogramOptions(window, 1, true));
        assertThat(s.argMax()).isEqualTo(37);
        assertThat(s.amplitudeAt(37)).isCloseTo(2.5, within(1e-10));
    }

    @ParameterizedTest
    @EnumSource(Window.class)
    void offBinToneIsInterpolatedAndReadAtItsAmplitude(Window window) {
        double rate = 1000;
        int n = 2000;
        double f = 123.37; // 246.74 bins: 0.26 bin off the grid
        double[] x = tone(n, rate, f, 1.7, 1.1);
        PeriodogramOptions o = new PeriodogramOptions(window, 1, true);
        Spectrum s = Periodogram.of(x, rate, o);
        int k = s.argMax();
        double fHat = Periodogram.interpolatePeak(s, k);
        double bin = rate / n;
        // log-parabola interpolation alone: within 0.2 bin for every window (its bias is largest for the
        // rectangular and flat-top lobes, which are far from Gaussian)
        assertThat(Math.abs(fHat - f) / bin).isLessThan(0.2);
        // polished by maximising the windowed DTFT: exact for a lone tone up to the image's leakage; the
        // flat top's rippled lobe has its maximum off centre, so (as in Survey) a Hann probe locates it
        PeriodogramOptions locate = window == Window.FLAT_TOP ? o.withWindow(Window.HANN) : o;
        double polished = PeakFinder.polish(s, Periodogram.probe(x, rate, locate), fHat);
        assertThat(Math.abs(polished - f) / bin).isLessThan(2e-3);
        double amp = Periodogram.probe(x, rate, o).amplitudeAt(polished);
        // rectangular: the negative-frequency image leaks about A / (pi 2 f T) = 1e-3 A into the reading
        assertThat(amp).isCloseTo(1.7, within(window == Window.RECTANGULAR ? 3e-3 : 1e-3));
        if (window == Window.FLAT_TOP) {
            // flat top: scalloping loss below 0.01 dB even on the raw grid (D'Antona and Ferrero 2006)
            assertThat(20 * Math.log10(s.amplitudeAt(k) / 1.7)).isCloseTo(0, within(0.012));
        }
    }

    @Test
    void zeroPaddingRefinesTheGridWithoutChangingTheResolution() {
        double rate = 100;
        double[] x = tone(400, rate, 7.3, 1, 0);
        Spectrum s1 = Periodogram.of(x, rate, new PeriodogramOptions(Window.HANN, 1, true));
        Spectrum s8 = Periodogram.of(x, rate, new PeriodogramOptions(Window.HANN, 8, true));
        assertThat(s8.gridStepHz()).isCloseTo(s1.gridStepHz() / 8, within(1e-12));
        assertThat(s8.resolutionHz()).isEqualTo(s1.resolutionHz());
        assertThat(s8.amplitudeAt(s8.argMax())).isGreaterThan(s1.amplitudeAt(s1.argMax()));
        assertThat(Math.abs(Periodogram.interpolatePeak(s8, s8.argMax()) - 7.3)).isLessThan(0.002 * rate / 400 * 10);
    }

    @Test
    void windowConstantsMatchPublishedValues() {
        // Equivalent noise bandwidths from Harris (1978), Table 1: Hann 1.50 bins, 4-term Blackman-Harris 2.00 bins;
        // flat top 3.77 bins (D'Antona and Ferrero 2006).
        assertThat(Window.RECTANGULAR.noiseBandwidthBins()).isEqualTo(1.0);
        assertThat(Window.HANN.noiseBandwidthBins()).isCloseTo(1.5, within(1e-12));
        assertThat(Window.BLACKMAN_HARRIS.noiseBandwidthBins()).isCloseTo(2.00, within(0.01));
        assertThat(Window.FLAT_TOP.noiseBandwidthBins()).isCloseTo(3.77, within(0.01));
        // Hann response one bin off is exactly one half (-6.02 dB), zero from 2 bins on (common practice)
        assertThat(Window.HANN.response(1, 1024)).isCloseTo(0.5, within(1e-9));
        assertThat(Window.HANN.response(3, 1024)).isCloseTo(0, within(1e-9));
        // Harris (1978): rectangular worst-case scalloping loss 3.92 dB at half a bin
        assertThat(20 * Math.log10(Window.RECTANGULAR.response(0.5, 4096))).isCloseTo(-3.92, within(0.01));
        // the closed-form response agrees with the directly computed DTFT of the weights
        double[] w = Window.BLACKMAN_HARRIS.weights(256);
        double[] z = Periodogram.dtft(w, 2.3 / 256);
        double sum = 0;
        for (double v : w) {
            sum += v;
        }
        assertThat(Window.BLACKMAN_HARRIS.response(2.3, 256)).isCloseTo(Math.hypot(z[0], z[1]) / sum, within(1e-12));
    }

    @Test
    void gapsAndUnevenSamplingAreRefusedWithAReason() {
        double[] v = tone(64, 64, 5, 1, 0);
        v[10] = Double.NaN;
        assertThatThrownBy(() -> Periodogram.of(Series.uniform(0, 64, v), PeriodogramOptions.defaults()))
                .hasMessageContaining("1 missing samples").hasMessageContaining("Lomb-Scargle");
        assertThatThrownBy(() -> Periodogram.of(Series.at(new double[] {0, 1, 3, 4, 7}, new double[] {1, 2, 3, 4, 5}),
                PeriodogramOptions.defaults())).hasMessageContaining("unevenly sampled");
    }

    @Test
    void windowNamesParse() {
        assertThat(Window.parse("Blackman-Harris")).isEqualTo(Window.BLACKMAN_HARRIS);
        assertThat(Window.parse("flattop")).isEqualTo(Window.FLAT_TOP);
        assertThatThrownBy(() -> Window.parse("kaiser")).hasMessageContaining("choose one of");
    }
}
