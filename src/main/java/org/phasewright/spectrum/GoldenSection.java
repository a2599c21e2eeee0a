package org.phasewright.spectrum;

/**
 * Golden-section search for the maximum of a tone amplitude over a frequency bracket (Kiefer 1953;
 * Press et al., Numerical Recipes, 3rd ed., 10.2). Each step shrinks the bracket by 0.618 at the
 * cost of one probe evaluation.
 */
final class GoldenSection {
    private GoldenSection() {
    }

    /** The maximiser on [lo, hi] after {@code steps} steps, or {@code at} if the probe is at least as high there. */
    static double maximise(ToneProbe probe, double lo, double hi, double at, int steps) {
        if (!(hi > lo)) {
            return at;
        }
        double g = (Math.sqrt(5) - 1) / 2;
        double x1 = hi - g * (hi - lo);
        double x2 = lo + g * (hi - lo);
        double v1 = probe.amplitudeAt(x1);
        double v2 = probe.amplitudeAt(x2);
        for (int it = 0; it < steps; it++) {
            if (v1 < v2) {
                lo = x1;
                x1 = x2;
                v1 = v2;
                x2 = lo + g * (hi - lo);
                v2 = probe.amplitudeAt(x2);
            } else {
                hi = x2;
                x2 = x1;
                v2 = v1;
                x1 = hi - g * (hi - lo);
                v1 = probe.amplitudeAt(x1);
            }
        }
        double best = 0.5 * (lo + hi);
        return probe.amplitudeAt(best) >= probe.amplitudeAt(at) ? best : at;
    }
}
