package org.phasewright.io.write;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.phasewright.io.OutputException;
import org.phasewright.io.WavEncoding;
import org.phasewright.io.WavSampleFormat;
import org.phasewright.io.read.CsvData;
import org.phasewright.io.read.CsvReader;
import org.phasewright.io.read.WavData;
import org.phasewright.io.read.WavReader;
import org.phasewright.series.Series;

class CleanedSignalWriterTest {

    @TempDir
    Path dir;

    @Test
    void csvRoundTripIsExactAndKeepsGapsAndOrigin() throws IOException {
        Random r = new Random(7);
        double[] v = new double[500];
        for (int i = 0; i < v.length; i++) {
            v[i] = i % 37 == 0 ? Double.NaN : r.nextGaussian() * Math.pow(10, r.nextInt(12) - 6);
        }
        Instant origin = Instant.parse("2026-05-04T03:02:01.5Z");
        Series s = Series.builder().uniform(0, 250, v).origin(origin).name("strain").unit("ue").build();
        Path f = dir.resolve("cleaned.csv");
        CleanedSignalReport rep = CleanedSignalWriter.writeCsv(f, s, false);
        assertThat(rep.gaps()).isEqualTo(s.missingCount());
        assertThat(Files.readAllLines(f).get(0)).isEqualTo("time [s],time [UTC],strain [ue]");
        assertThat(Files.readAllLines(f).get(2)).startsWith("0.004,2026-05-04T03:02:01.504Z,");
        CsvData back = CsvReader.read(f);
        assertThat(back.series().values()).containsExactly(v);
        assertThat(back.series().times()).containsExactly(s.times());
        assertThat(back.series().unit()).isEqualTo("ue");
        assertThat(back.series().covariateNames()).isEmpty();
        assertThat(back.summary().ignoredColumns()).containsExactly("time [UTC]");
        assertThat(back.series().rate().getAsDouble()).isEqualTo(250.0);
    }

    @ParameterizedTest(name = "{0} {1}")
    @CsvSource({"PCM_UNSIGNED, 8", "PCM_SIGNED, 16", "PCM_SIGNED, 24", "PCM_SIGNED, 32", "PCM_FLOAT, 32", "PCM_FLOAT, 64"})
    void wavRoundTripToTheFormatsPrecisionWithClippingCounted(WavEncoding enc, int bits, @TempDir Path out) {
        double[] v = new double[1000];
        for (int i = 0; i < v.length; i++) {
            v[i] = 0.9 * Math.sin(2 * Math.PI * 50 * i / 8000.0);
        }
        v[10] = 1.5;
        v[11] = -1.25;
        v[12] = Double.NaN;
        Series s = Series.uniform(0, 8000, v);
        WavSampleFormat f = new WavSampleFormat(enc, bits, 8000);
        Path file = out.resolve("cleaned.wav");
        CleanedSignalReport rep = CleanedSignalWriter.writeWav(file, s, f, false);
        assertThat(rep.gaps()).isEqualTo(1);
        WavData back = WavReader.read(file);
        assertThat(back.info().sampleFormat()).isEqualTo(f);
        double step = enc == WavEncoding.PCM_FLOAT ? (bits == 32 ? 1e-7 : 0) : Math.scalb(1.0, -(bits - 1));
        for (int i = 0; i < v.length; i++) {
            if (i < 10 || i > 12) {
                assertThat(Math.abs(back.series().valueAt(i) - v[i])).as("sample %d", i).isLessThanOrEqualTo(step / 2 + 1e-300);
            }
        }
        assertThat(back.series().valueAt(12)).isZero();
        if (enc == WavEncoding.PCM_FLOAT) {
            assertThat(rep.clipped()).isZero();
            assertThat(rep.overFullScale()).isEqualTo(2);
            assertThat(back.series().valueAt(10)).isEqualTo(1.5);
            assertThat(back.overFullScale()).isEqualTo(2);
        } else {
            assertThat(rep.clipped()).isEqualTo(2);
            assertThat(rep.notice()).contains("2 of 1000 samples exceeded full scale and were clipped");
            assertThat(back.series().valueAt(10)).isEqualTo(1 - step);
            assertThat(back.series().valueAt(11)).isEqualTo(-1);
        }
    }

    @Test
    void wavNeedsUniformSamplingAtTheFormatsRate() {
        Series uneven = Series.at(new double[] {0, 1, 3}, new double[] {0, 0.1, 0.2});
        assertThatThrownBy(() -> CleanedSignalWriter.writeWav(dir.resolve("a.wav"), uneven, WavSampleFormat.pcm16(1), false))
                .isInstanceOfSatisfying(OutputException.class, e -> assertThat(e.kind()).isEqualTo(OutputException.Kind.UNSUITABLE));
        Series s = Series.uniform(0, 100, new double[] {0, 0.1});
        assertThatThrownBy(() -> CleanedSignalWriter.writeWav(dir.resolve("b.wav"), s, WavSampleFormat.pcm16(8000), false))
                .hasMessageContaining("100.0 Hz");
        assertThat(dir.toFile().list()).isEmpty();
    }
}
