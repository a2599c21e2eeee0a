package org.phasewright.demo;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Random;

/**
 * Scenario 1: an accelerometer on the bearing housing of a centrifugal pump with a seven-vane
 * impeller, sampled uniformly at 5 kHz for 2 s. The shaft turns at 1485 rpm (24.75 Hz); the
 * signal holds the shaft's first three harmonics (imbalance, misalignment), the vane-pass tone
 * at 7 x shaft speed, a slow quadratic drift of the sensor's offset, white noise, and three
 * dropouts where the data logger lost samples (empty cells).
 */
public final class PumpAccelerometer implements DemoScenario {

    public static final String FILE = "pump-accelerometer.csv";
    public static final double RATE_HZ = 5000;
    public static final int SAMPLES = 10_000;
    public static final double SHAFT_HZ = 1485.0 / 60.0;
    public static final double NOISE_SD_G = 0.08;
    /** Drift of the offset: {@code c0 + c1 u + c2 u^2} g with u = t / 2 s. */
    public static final double[] DRIFT_G = {0.020, 0.060, -0.035};
    /** Dropouts as {first sample, count}. */
    static final int[][] DROPOUTS = {{1830, 45}, {5210, 20}, {8420, 60}};
    private static final long SEED = 4101L;

    private static final List<TrueSinusoid> TRUTH = List.of(
            new TrueSinusoid("shaft 1x", SHAFT_HZ, 0.420, 40.0),
            new TrueSinusoid("shaft 2x", 2 * SHAFT_HZ, 0.180, 115.0),
            new TrueSinusoid("shaft 3x", 3 * SHAFT_HZ, 0.070, -70.0),
            new TrueSinusoid("vane pass 7x", 7 * SHAFT_HZ, 0.250, 160.0));

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
        return List.of();
    }

    @Override
    public List<String> command() {
        return List.of("fit", "demo-signals/" + FILE, "--fundamental", "1485rpm", "--harmonics", "7",
                "--skip-harmonics", "4-6", "--trend", "poly:2");
    }

    @Override
    public byte[] render() {
        Random noise = new Random(SEED);
        StringBuilder csv = new StringBuilder(SAMPLES * 22);
        csv.append("time_s,accel_g\n");
        for (int i = 0; i < SAMPLES; i++) {
            double t = i / RATE_HZ;
            double u = t / 2.0;
            double x = DRIFT_G[0] + DRIFT_G[1] * u + DRIFT_G[2] * u * u + Waves.sum(TRUTH, t)
                    + NOISE_SD_G * noise.nextGaussian();
            csv.append(Decimals.fixed(t, 4)).append(',');
            if (!inDropout(i)) {
                csv.append(Decimals.fixed(x, 5));
            }
            csv.append('\n');
        }
        return csv.toString().getBytes(StandardCharsets.UTF_8);
    }

    static boolean inDropout(int i) {
        for (int[] d : DROPOUTS) {
            if (i >= d[0] && i < d[0] + d[1]) {
                return true;
            }
        }
        return false;
    }
}
