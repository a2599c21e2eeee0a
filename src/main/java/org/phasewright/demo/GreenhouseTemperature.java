package org.phasewright.demo;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Random;

/**
 * Scenario 4: a battery temperature logger in a greenhouse, 14 days from 6 April 2026 00:00 UTC.
 * It aims at one reading every 10 minutes but its clock wakes up to 90 s early or late and it
 * skips about 3 % of readings, so the timestamps are uneven. Each row also holds the outside
 * temperature from the weather station next door, to 0.1 degC. The inside temperature is
 * {@code 14.0 + 0.30 * outside} plus a daily cycle from the sun (with its second harmonic, as the
 * vents open at midday), plus a step of +2.2 degC when the grower raised the heater's set point
 * on 14 April at 06:00 UTC, plus sensor noise. The outside temperature has its own daily swing
 * and slow weather (an Ornstein-Uhlenbeck process, 8 h correlation time), so it is not a
 * multiple of the daily cycle and its gain can be told apart from the sun's.
 */
public final class GreenhouseTemperature implements DemoScenario {

    public static final String FILE = "greenhouse-temperature.csv";
    public static final Instant START = Instant.parse("2026-04-06T00:00:00Z");
    public static final Instant HEATER_CHANGE = Instant.parse("2026-04-14T06:00:00Z");
    public static final int DAYS = 14;
    public static final double DAY_S = 86_400.0;
    public static final double BASE_C = 14.0;
    public static final double OUTSIDE_GAIN = 0.30;
    public static final double STEP_C = 2.2;
    public static final double NOISE_SD_C = 0.25;
    private static final long SEED = 4104L;

    private static final List<TrueSinusoid> TRUTH = List.of(
            new TrueSinusoid("daily cycle", 1 / DAY_S, 3.40, -160.0),
            new TrueSinusoid("daily 2nd harmonic", 2 / DAY_S, 0.90, 40.0));
    private static final List<TrueSinusoid> OUTSIDE_DAILY = List.of(
            new TrueSinusoid("outside daily", 1 / DAY_S, 5.5, -135.0));

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
        return List.of(new TrueScalar("heater step", "step", STEP_C),
                new TrueScalar("outside gain", "covariate", OUTSIDE_GAIN));
    }

    @Override
    public List<String> command() {
        return List.of("fit", "demo-signals/" + FILE, "--value-column", "inside_c", "--fundamental", "1/day",
                "--harmonics", "2", "--step", HEATER_CHANGE.toString(), "--covariate", "outside_c");
    }

    @Override
    public byte[] render() {
        Random rng = new Random(SEED);
        StringBuilder csv = new StringBuilder(2100 * 40);
        csv.append("time,inside_c,outside_c\n");
        double stepAt = HEATER_CHANGE.getEpochSecond() - START.getEpochSecond();
        double tau = 8 * 3600.0;
        double weatherSd = 2.0;
        double weather = 0;
        long previous = -1;
        int slots = DAYS * 144;
        for (int k = 0; k < slots; k++) {
            long jitter = k == 0 ? 0 : rng.nextInt(181) - 90;
            boolean skipped = k > 0 && rng.nextDouble() < 0.03;
            if (skipped) {
                continue;
            }
            long t = k * 600L + jitter;
            double dt = previous < 0 ? 0 : t - previous;
            double keep = StrictMath.exp(-dt / tau);
            weather = previous < 0 ? weatherSd * rng.nextGaussian()
                    : weather * keep + weatherSd * StrictMath.sqrt(1 - keep * keep) * rng.nextGaussian();
            previous = t;
            double outside = Decimals.rounded(9.0 + Waves.sum(OUTSIDE_DAILY, t) + weather, 1);
            double inside = BASE_C + OUTSIDE_GAIN * outside + Waves.sum(TRUTH, t)
                    + (t >= stepAt ? STEP_C : 0) + NOISE_SD_C * rng.nextGaussian();
            csv.append(START.plusSeconds(t)).append(',')
                    .append(Decimals.fixed(inside, 2)).append(',')
                    .append(Decimals.fixed(outside, 1)).append('\n');
        }
        return csv.toString().getBytes(StandardCharsets.UTF_8);
    }
}
