package org.phasewright.io.read;

/**
 * How the samples of a record are spaced in time, as a reader found them.
 *
 * @param uniform           true when every time lies within {@code tolerance} steps of the grid
 *                          {@code t0 + i * meanStep}
 * @param tolerance         the tolerance used, as a fraction of one step
 * @param rateHz            {@code 1 / meanStep} when uniform, NaN when uneven
 * @param meanStepSeconds   (last time - first time) / (n - 1)
 * @param medianStepSeconds median of the steps (estimated from at most 100 000 evenly spread steps)
 * @param minStepSeconds    smallest step
 * @param maxStepSeconds    largest step
 * @param jitterRmsSeconds  root-mean-square deviation of the times from the uniform grid
 * @param jitterMaxSeconds  largest absolute deviation from the uniform grid
 * @param timeGaps          number of steps longer than 1.5 median steps (rows absent from the file)
 */
public record SamplingSummary(boolean uniform, double tolerance, double rateHz, double meanStepSeconds,
                              double medianStepSeconds, double minStepSeconds, double maxStepSeconds,
                              double jitterRmsSeconds, double jitterMaxSeconds, int timeGaps) {

    /** Summary of an exactly uniform record of {@code n} samples at {@code rateHz}. */
    public static SamplingSummary exact(double rateHz) {
        double step = 1.0 / rateHz;
        return new SamplingSummary(true, 0, rateHz, step, step, step, step, 0, 0, 0);
    }

    /**
     * Examines strictly increasing times (n >= 2). Cost: two passes over the times, plus a sort
     * of at most 100 000 steps.
     */
    public static SamplingSummary of(double[] t, double tolerance) {
        int n = t.length;
        double mean = (t[n - 1] - t[0]) / (n - 1);
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        double sumSq = 0;
        double worst = 0;
        for (int i = 0; i < n; i++) {
            if (i > 0) {
                double step = t[i] - t[i - 1];
                min = Math.min(min, step);
                max = Math.max(max, step);
            }
            double dev = t[i] - (t[0] + i * mean);
            sumSq += dev * dev;
            worst = Math.max(worst, Math.abs(dev));
        }
        double median = medianStep(t);
        int gaps = 0;
        for (int i = 1; i < n; i++) {
            if (t[i] - t[i - 1] > 1.5 * median) {
                gaps++;
            }
        }
        boolean uniform = worst <= tolerance * mean;
        return new SamplingSummary(uniform, tolerance, uniform ? 1.0 / mean : Double.NaN, mean, median, min, max,
                Math.sqrt(sumSq / n), worst, gaps);
    }

    private static double medianStep(double[] t) {
        int steps = t.length - 1;
        int k = Math.min(steps, 100_000);
        double[] s = new double[k];
        for (int j = 0; j < k; j++) {
            int i = (int) ((long) j * steps / k) + 1;
            s[j] = t[i] - t[i - 1];
        }
        java.util.Arrays.sort(s);
        return k % 2 == 1 ? s[k / 2] : 0.5 * (s[k / 2 - 1] + s[k / 2]);
    }
}
