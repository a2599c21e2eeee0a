package org.phasewright.model;

import java.util.Arrays;
import org.phasewright.series.Series;

/**
 * What a term may know about the record when it is bound: the observed time span, the observed
 * sample times (sorted), the sampling, which covariates exist, and whether the model carries an
 * intercept (so that trend bases drop their constant).
 */
public final class BindingContext {
    private final Series series;
    private final double[] observedTimes;
    private final boolean hasIntercept;

    BindingContext(Series series, double[] observedTimes, boolean hasIntercept) {
        if (observedTimes.length == 0) {
            throw new ModelException("the record has no observed samples to fit");
        }
        this.series = series;
        this.observedTimes = observedTimes;
        this.hasIntercept = hasIntercept;
    }

    /** Time of the first observed sample, seconds. */
    public double firstTime() {
        return observedTimes[0];
    }

    /** Time of the last observed sample, seconds. */
    public double lastTime() {
        return observedTimes[observedTimes.length - 1];
    }

    /** Record length T in seconds as {@link Series#duration()} defines it. */
    public double duration() {
        return series.duration();
    }

    public boolean isUniform() {
        return series.isUniform();
    }

    /** Sample rate in hertz, NaN for uneven sampling. */
    public double rate() {
        return series.rate().orElse(Double.NaN);
    }

    public boolean hasIntercept() {
        return hasIntercept;
    }

    /** The q-quantile (0..1) of the observed sample times, by linear interpolation. */
    public double timeQuantile(double q) {
        double pos = q * (observedTimes.length - 1);
        int lo = (int) Math.floor(pos);
        int hi = Math.min(lo + 1, observedTimes.length - 1);
        return observedTimes[lo] + (pos - lo) * (observedTimes[hi] - observedTimes[lo]);
    }

    public int observedCount() {
        return observedTimes.length;
    }

    /** Fails with a message listing the available covariates when {@code name} is not one. */
    public void requireCovariate(String name) {
        if (!series.hasCovariate(name)) {
            throw new ModelException("the model asks for covariate '" + name + "', but the record has "
                    + (series.covariateNames().isEmpty() ? "no covariate columns"
                    : "only " + String.join(", ", series.covariateNames())));
        }
    }

    static double[] sortedCopy(double[] t) {
        double[] c = t.clone();
        Arrays.sort(c);
        return c;
    }
}
