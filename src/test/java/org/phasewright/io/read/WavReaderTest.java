package org.phasewright.io.read;

import static org.assertj.core.api.Assertions.assertThat;
import static org.phasewright.io.read.WavFixtureGenerator.FRAMES;
import static org.phasewright.io.read.WavFixtureGenerator.code;
import static org.phasewright.io.read.WavFixtureGenerator.floatValue;

import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.phasewright.io.TestResources;
import org.phasewright.io.WavEncoding;

/**
 * Reads the committed WAV fixtures (written by the JDK, see io/README.md) and checks every
 * decoded sample against the integer codes the generator wrote, scaled by 2^-(bits-1) to full
 * scale (common practice for PCM).
 */
class WavReaderTest {

    private static Path fixture(String name) {
        return TestResources.path("io/wav/" + name);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "tone-pcm8-mono.wav, PCM_UNSIGNED, 8, 1",
        "tone-pcm16-stereo.wav, PCM_SIGNED, 16, 2",
        "tone-pcm24-mono.wav, PCM_SIGNED, 24, 1",
        "tone-pcm32-mono.wav, PCM_SIGNED, 32, 1",
        "tone-extensible-pcm24-stereo.wav, PCM_SIGNED, 24, 2",
    })
    void integerFixturesDecodeToScaledCodes(String name, WavEncoding encoding, int bits, int channels) {
        for (int ch = 1; ch <= channels; ch++) {
            WavData d = WavReader.read(fixture(name), WavReadOptions.channel(ch));
            WavInfo info = d.info();
            assertThat(info.encoding()).isEqualTo(encoding);
            assertThat(info.bitsPerSample()).isEqualTo(bits);
            assertThat(info.channels()).isEqualTo(channels);
            assertThat(info.sampleRateHz()).isEqualTo(8000);
            assertThat(info.frames()).isEqualTo(FRAMES);
            assertThat(d.series().rate()).hasValue(8000);
            double scale = Math.scalb(1.0, -(bits - 1));
            for (int i = 0; i < FRAMES; i++) {
                assertThat(d.series().valueAt(i)).as("frame %d channel %d", i, ch).isEqualTo(code(i, ch - 1, bits) * scale);
            }
            assertThat(d.series().valueAt(5)).isEqualTo(-1.0);
            assertThat(d.series().valueAt(6)).isLessThan(1.0);
            assertThat(d.overFullScale()).isZero();
        }
    }

    @Test
    void averagingTakesTheMeanOfTheChannels() {
        WavData d = WavReader.read(fixture("tone-pcm16-stereo.wav"), WavReadOptions.averageChannels());
        double scale = Math.scalb(1.0, -15);
        for (int i = 0; i < FRAMES; i++) {
            assertThat(d.series().valueAt(i)).isEqualTo((code(i, 0, 16) * scale + code(i, 1, 16) * scale) / 2);
        }
        assertThat(d.info().selection()).isEqualTo("mean of 2 channels");
        assertThat(d.series().name()).isEqualTo("tone-pcm16-stereo mean");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({"tone-float32-stereo.wav, 2", "tone-extensible-float32-mono.wav, 1"})
    void floatFixturesPassThrough(String name, int channels) {
        WavData d = WavReader.read(fixture(name), WavReadOptions.channel(channels));
        assertThat(d.info().encoding()).isEqualTo(WavEncoding.PCM_FLOAT);
        assertThat(d.info().bitsPerSample()).isEqualTo(32);
        for (int i = 0; i < FRAMES; i++) {
            assertThat(d.series().valueAt(i)).isEqualTo((double) floatValue(i, channels - 1));
        }
    }

    @Test
    void otherAudioFormatsTheJdkKnowsAreRefused(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        javax.sound.sampled.AudioFormat f = new javax.sound.sampled.AudioFormat(8000, 16, 1, true, true);
        Path au = dir.resolve("tone.au");
        try (javax.sound.sampled.AudioInputStream ais = new javax.sound.sampled.AudioInputStream(
                new java.io.ByteArrayInputStream(new byte[200]), f, 100)) {
            javax.sound.sampled.AudioSystem.write(ais, javax.sound.sampled.AudioFileFormat.Type.AU, au.toFile());
        }
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> WavReader.read(au))
                .isInstanceOfSatisfying(org.phasewright.io.InputException.class,
                        e -> assertThat(e.kind()).isEqualTo(org.phasewright.io.InputException.Kind.UNSUPPORTED_AUDIO))
                .hasMessageContaining("not a WAV file");
    }

    @Test
    void progressCountsFrames() {
        java.util.List<Long> frames = new java.util.ArrayList<>();
        WavReader.read(fixture("tone-pcm16-stereo.wav"), WavReadOptions.channel(2).withProgress((b, t, n) -> frames.add(n)));
        assertThat(frames).last().isEqualTo((long) FRAMES);
    }

    @Test
    void blockReaderDeliversTheSameSamplesInSmallBlocks() {
        double[] whole = WavReader.read(fixture("tone-pcm24-mono.wav")).series().values();
        try (WavBlockReader r = WavBlockReader.open(fixture("tone-pcm24-mono.wav"))) {
            double[] block = new double[7];
            int at = 0;
            int n;
            while ((n = r.read(block)) > 0) {
                for (int k = 0; k < n; k++) {
                    assertThat(block[k]).isEqualTo(whole[at + k]);
                }
                at += n;
            }
            assertThat(at).isEqualTo(FRAMES);
            assertThat(r.framesRead()).isEqualTo(FRAMES);
            assertThat(r.read(block)).isEqualTo(-1);
        }
    }
}
