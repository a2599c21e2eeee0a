package org.phasewright.demo;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

/**
 * Scenario 2: a recording made in a workshop, 8 kHz mono 16-bit PCM for 1.5 s. A held violin
 * note (A4, 440 Hz, with its second partial at 880 Hz) sounds over mains hum picked up from a
 * nearby transformer: 50 Hz and its odd harmonics 150, 250 and 350 Hz, which the iron core's
 * symmetric magnetisation favours. Amplitudes are fractions of full scale (sample / 32768).
 */
public final class WorkshopHum implements DemoScenario {

    public static final String FILE = "workshop-hum.wav";
    public static final float RATE_HZ = 8000f;
    public static final int SAMPLES = 12_000;
    public static final double NOISE_SD = 0.004;
    private static final long SEED = 4102L;

    private static final List<TrueSinusoid> HUM = List.of(
            new TrueSinusoid("hum 50 Hz", 50, 0.060, 20.0),
            new TrueSinusoid("hum 150 Hz", 150, 0.025, -160.0),
            new TrueSinusoid("hum 250 Hz", 250, 0.012, 75.0),
            new TrueSinusoid("hum 350 Hz", 350, 0.006, -50.0));
    private static final List<TrueSinusoid> TONE = List.of(
            new TrueSinusoid("note A4", 440, 0.300, 0.0),
            new TrueSinusoid("note 2nd partial", 880, 0.080, 95.0));

    @Override
    public String fileName() {
        return FILE;
    }

    @Override
    public List<TrueSinusoid> sinusoids() {
        List<TrueSinusoid> all = new ArrayList<>(HUM);
        all.addAll(TONE);
        return List.copyOf(all);
    }

    @Override
    public List<TrueScalar> scalars() {
        return List.of(new TrueScalar("offset", "intercept", 0.0));
    }

    @Override
    public List<String> command() {
        return List.of("fit", "demo-signals/" + FILE, "--fundamental", "50", "--harmonics", "7",
                "--skip-harmonics", "2,4,6", "--freq", "440", "--freq", "880");
    }

    @Override
    public byte[] render() {
        Random noise = new Random(SEED);
        List<TrueSinusoid> all = sinusoids();
        byte[] pcm = new byte[2 * SAMPLES];
        for (int i = 0; i < SAMPLES; i++) {
            double t = i / (double) RATE_HZ;
            double x = Waves.sum(all, t) + NOISE_SD * noise.nextGaussian();
            long q = Math.round(x * 32768.0);
            short s = (short) Math.max(Short.MIN_VALUE, Math.min(Short.MAX_VALUE, q));
            pcm[2 * i] = (byte) (s & 0xff);
            pcm[2 * i + 1] = (byte) ((s >> 8) & 0xff);
        }
        AudioFormat format = new AudioFormat(RATE_HZ, 16, 1, true, false);
        try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(pcm), format, SAMPLES)) {
            ByteArrayOutputStream out = new ByteArrayOutputStream(pcm.length + 64);
            AudioSystem.write(in, AudioFileFormat.Type.WAVE, out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not encode the workshop recording as WAV", e);
        }
    }
}
