package org.phasewright.demo;

import java.util.List;

/** Evaluates sums of true sinusoids with {@link StrictMath}, so values are identical on every JVM. */
final class Waves {

    private Waves() {
    }

    /** Sum over the components of {@code A cos(2 pi f t - phi)} at time {@code t} seconds. */
    static double sum(List<TrueSinusoid> parts, double t) {
        double s = 0;
        for (TrueSinusoid p : parts) {
            s += p.amplitude() * StrictMath.cos(2 * StrictMath.PI * p.frequencyHz() * t - StrictMath.toRadians(p.phaseDeg()));
        }
        return s;
    }

    /** Hertz from a speed in degrees per hour (the way tidal constituent speeds are published). */
    static double degreesPerHourToHz(double degreesPerHour) {
        return degreesPerHour / 360.0 / 3600.0;
    }
}
