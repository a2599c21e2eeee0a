package org.phasewright.fit;

import java.util.Random;

/** Small helpers for building test signals. */
final class TestSignals {
    private TestSignals() {
    }

    static double[] tones(double rate, int n, double[][] ampFreqPhaseDeg, double offset) {
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / rate;
            double v = offset;
            for (double[] a : ampFreqPhaseDeg) {
                v += a[0] * Math.cos(2 * Math.PI * a[1] * t - Math.toRadians(a[2]));
            }
            y[i] = v;
        }
        return y;
    }

    static double[] addNoise(double[] y, double sigma, Random rnd) {
        double[] o = y.clone();
        for (int i = 0; i < o.length; i++) {
            o[i] += sigma * rnd.nextGaussian();
        }
        return o;
    }
}
