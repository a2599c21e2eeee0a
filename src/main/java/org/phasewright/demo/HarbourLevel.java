package org.phasewright.demo;

import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Random;

/**
 * Scenario 3: a water-level logger on a harbour wall, reading every hour for 60 days from
 * 1 March 2026 00:00 UTC, in metres above the chart datum. The tide is the sum of the five main
 * constituents at their published speeds (M2 28.9841042, S2 30.0, N2 28.4397295, K1 15.0410686,
 * O1 13.9430356 degrees per hour); the mean level rises slowly with the season (a quadratic in
 * time); readings carry a little white noise (wind chop); the logger missed two spans (a
 * battery change of 30 h and a flooded cable of 52 h) and five single readings, written as empty
 * cells.
 */
public final class HarbourLevel implements DemoScenario {

    public static final String FILE = "harbour-level.csv";
    public static final Instant START = Instant.parse("2026-03-01T00:00:00Z");
    public static final int HOURS = 60 * 24;
    public static final double NOISE_SD_M = 0.035;
    /** Seasonal mean level {@code c0 + c1 u + c2 u^2} m with u = t / 60 days. */
    public static final double[] SEASON_M = {2.10, 0.080, 0.030};
    /** Gaps as {first hour, count}. */
    static final int[][] GAPS = {{200, 30}, {733, 1}, {810, 52}, {1011, 1}, {1100, 1}, {1257, 1}, {1391, 1}};
    private static final long SEED = 4133L;

    private static final List<TrueSinusoid> TRUTH = List.of(
            new TrueSinusoid("M2", Waves.degreesPerHourToHz(28.9841042), 1.180, 112.0),
            new TrueSinusoid("S2", Waves.degreesPerHourToHz(30.0), 0.410, 146.0),
            new TrueSinusoid("N2", Waves.degreesPerHourToHz(28.4397295), 0.240, 87.0),
            new TrueSinusoid("K1", Waves.degreesPerHourToHz(15.0410686), 0.350, -129.0),
            new TrueSinusoid("O1", Waves.degreesPerHourToHz(13.9430356), 0.260, -155.0));

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
        return List.of("fit", "demo-signals/" + FILE, "--freq", "28.9841042deg/h", "--freq", "30deg/h",
                "--freq", "28.4397295deg/h", "--freq", "15.0410686deg/h", "--freq", "13.9430356deg/h",
                "--trend", "poly:2");
    }

    @Override
    public byte[] render() {
        Random noise = new Random(SEED);
        StringBuilder csv = new StringBuilder(HOURS * 30);
        csv.append("time,level_m\n");
        double span = HOURS * 3600.0;
        for (int h = 0; h < HOURS; h++) {
            double t = h * 3600.0;
            double u = t / span;
            double x = SEASON_M[0] + SEASON_M[1] * u + SEASON_M[2] * u * u + Waves.sum(TRUTH, t)
                    + NOISE_SD_M * noise.nextGaussian();
            csv.append(START.plus(Duration.ofHours(h))).append(',');
            if (!inGap(h)) {
                csv.append(Decimals.fixed(x, 3));
            }
            csv.append('\n');
        }
        return csv.toString().getBytes(StandardCharsets.UTF_8);
    }

    static boolean inGap(int h) {
        for (int[] g : GAPS) {
            if (h >= g[0] && h < g[0] + g[1]) {
                return true;
            }
        }
        return false;
    }
}
