package org.phasewright.demo;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Random;

/**
 * Scenario 5: a current clamp on one phase of a 60 Hz induction motor fed through a six-pulse
 * rectifier drive, sampled at 8 kHz for 0.4625 s (27.75 cycles, deliberately not a whole number).
 * The current is 10 A rms at the fundamental with the 5th and 7th harmonics the rectifier
 * draws; the even harmonics and the 3rd are absent (their true amplitude is 0). The clamp adds a
 * small offset and noise.
 */
public final class MotorDriveCurrent implements DemoScenario {

    public static final String FILE = "motor-drive-current.csv";
    public static final double RATE_HZ = 8000;
    public static final int SAMPLES = 3700;
    public static final double OFFSET_A = 0.03;
    public static final double NOISE_SD_A = 0.06;
    private static final long SEED = 4105L;

    private static final List<TrueSinusoid> TRUTH = List.of(
            new TrueSinusoid("fundamental", 60, 14.142, 30.0),
            new TrueSinusoid("2nd harmonic", 120, 0, 0),
            new TrueSinusoid("3rd harmonic", 180, 0, 0),
            new TrueSinusoid("4th harmonic", 240, 0, 0),
            new TrueSinusoid("5th harmonic", 300, 0.850, -160.0),
            new TrueSinusoid("6th harmonic", 360, 0, 0),
            new TrueSinusoid("7th harmonic", 420, 0.520, 75.0));

    @Override
    public String fileName() {
        return FILE;
    }

    @Override
    public List<TrueSinusoid> sinusoids() {
        return TRUTH;
    }

    @Override
    public List<TrueScalar> scalars() {
        return List.of(new TrueScalar("clamp offset", "intercept", OFFSET_A));
    }

    @Override
    public List<String> command() {
        return List.of("fit", "demo-signals/" + FILE, "--fundamental", "60", "--harmonics", "7");
    }

    @Override
    public byte[] render() {
        Random noise = new Random(SEED);
        StringBuilder csv = new StringBuilder(SAMPLES * 22);
        csv.append("time_s,current_a\n");
        for (int i = 0; i < SAMPLES; i++) {
            double t = i / RATE_HZ;
            double x = OFFSET_A + Waves.sum(TRUTH, t) + NOISE_SD_A * noise.nextGaussian();
            csv.append(Decimals.fixed(t, 6)).append(',').append(Decimals.fixed(x, 4)).append('\n');
        }
        return csv.toString().getBytes(StandardCharsets.UTF_8);
    }
}
