package org.phasewright.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.Fitter;
import org.phasewright.io.read.WavData;
import org.phasewright.io.read.WavReader;
import org.phasewright.io.write.CleanedSignalReport;
import org.phasewright.io.write.CleanedSignalWriter;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.HarmonicSeriesReport;
import org.phasewright.model.Intercept;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.SinusoidReport;
import org.phasewright.series.Series;

/** Fit, remove the hum, write a 16-bit WAV in the input's format, read it back and fit again. */
class CleanedWavEndToEndTest {

    @Test
    void humIsGoneFromTheCleanedRecording(@TempDir Path dir) {
        double rate = 8000;
        int n = 16000;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            y[i] = 0.4 * Math.cos(2 * Math.PI * 330 * t) + 0.25 * Math.cos(2 * Math.PI * 50 * t - 1)
                    + 0.08 * Math.cos(2 * Math.PI * 150 * t);
        }
        Series s = Series.uniform(0, rate, y);
        ModelSpec model = ModelSpec.of(new Intercept(), new HarmonicSeries(50, 5, List.of(2, 4)), new Sinusoid(330));
        FitResult fit = Fitter.fit(s, model);
        Series cleaned = Cleaning.remove(s, fit, List.of("harmonics of 50 Hz"));
        CleanedSignalReport report = CleanedSignalWriter.writeWav(dir.resolve("clean.wav"), cleaned,
                org.phasewright.io.WavSampleFormat.pcm16(rate), false);
        assertThat(report.clipped()).isZero();

        WavData back = WavReader.read(dir.resolve("clean.wav"));
        FitResult again = Fitter.fit(back.series(), model);
        HarmonicSeriesReport hum = (HarmonicSeriesReport) again.terms().get(1);
        SinusoidReport tone = (SinusoidReport) again.terms().get(2);
        // 16-bit quantisation leaves noise near 2^-15 / sqrt(12) per sample; the hum falls to that level
        assertThat(hum.harmonics().get(0).amplitude()).isLessThan(1e-4);
        assertThat(hum.harmonics().get(1).amplitude()).isLessThan(1e-4);
        assertThat(tone.amplitude()).isCloseTo(0.4, org.assertj.core.api.Assertions.within(1e-4));
    }
}
