package org.phasewright.series;

import java.time.Instant;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * A sampled signal held in memory: sample times in seconds, values, a mask of missing samples,
 * optional weights and optional covariate channels aligned with the samples.
 *
 * <p>Times are seconds measured from the series' time zero. For timestamped input the wall-clock
 * instant of time zero is kept as {@link #origin()}; phases reported by a fit refer to time zero.
 * Times must be strictly increasing. A sample is missing (a gap) when its value is NaN; gaps are
 * excluded from fits but kept in place so that every output stays aligned with the input.
 *
 * <p>Instances are immutable: arrays are copied on the way in and on the way out (use the
 * {@code xxxAt(i)} accessors in loops to avoid copies). Memory: about 17 bytes per sample plus
 * 8 per sample per covariate. For records too large for memory the streaming path (a later
 * addition) reads blocks instead of building a {@code Series}.
 */
public final class Series {

    private final double[] times;
    private final double[] values;
    private final double[] weights;
    private final Map<String, double[]> covariates;
    private final double uniformRate;
    private final Instant origin;
    private final String name;
    private final String unit;

    private Series(Builder b) {
        this.times = b.times;
        this.values = b.values;
        this.weights = b.weights;
        this.covariates = Collections.unmodifiableMap(new LinkedHashMap<>(b.covariates));
        this.origin = b.origin;
        this.name = b.name;
        this.unit = b.unit;
        this.uniformRate = b.uniformRate;
    }

    /** A uniformly sampled series: sample n is at time {@code start + n / rate} seconds. */
    public static Series uniform(double start, double rateHz, double[] values) {
        return builder().uniform(start, rateHz, values).build();
    }

    /** A series at explicit (possibly uneven) times in seconds. */
    public static Series at(double[] times, double[] values) {
        return builder().times(times).values(values).build();
    }

    public static Builder builder() {
        return new Builder();
    }

    /** A builder that starts as a copy of this series, for adding covariates or weights. */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.times = times;
        b.values = values;
        b.weights = weights;
        b.covariates = new LinkedHashMap<>(covariates);
        b.origin = origin;
        b.name = name;
        b.unit = unit;
        b.uniformRate = uniformRate;
        b.trusted = true;
        return b;
    }

    public int size() {
        return times.length;
    }

    public double timeAt(int i) {
        return times[i];
    }

    public double valueAt(int i) {
        return values[i];
    }

    /** True when sample {@code i} is a gap (its value is NaN). */
    public boolean isMissing(int i) {
        return Double.isNaN(values[i]);
    }

    /** Weight of sample {@code i}; 1 when the series is unweighted. */
    public double weightAt(int i) {
        return weights == null ? 1.0 : weights[i];
    }

    public boolean isWeighted() {
        return weights != null;
    }

    public double[] times() {
        return times.clone();
    }

    public double[] values() {
        return values.clone();
    }

    public Optional<double[]> weights() {
        return weights == null ? Optional.empty() : Optional.of(weights.clone());
    }

    /** Number of samples that are not gaps. */
    public int observedCount() {
        int c = 0;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                c++;
            }
        }
        return c;
    }

    /** Number of gap samples. */
    public int missingCount() {
        return size() - observedCount();
    }

    /** Length of the longest run of consecutive gap samples. */
    public int longestGap() {
        int best = 0;
        int run = 0;
        for (double v : values) {
            run = Double.isNaN(v) ? run + 1 : 0;
            best = Math.max(best, run);
        }
        return best;
    }

    public double startTime() {
        return times.length == 0 ? Double.NaN : times[0];
    }

    public double endTime() {
        return times.length == 0 ? Double.NaN : times[times.length - 1];
    }

    /**
     * Record length T in seconds. For uniform sampling this is {@code n / rate} (each sample
     * covers one sampling interval), so a record of whole cycles has {@code f T} integral, as on
     * the FFT grid; for uneven sampling it is last time minus first time.
     */
    public double duration() {
        if (times.length == 0) {
            return 0;
        }
        if (isUniform()) {
            return times.length / uniformRate;
        }
        return times[times.length - 1] - times[0];
    }

    /** True when the samples lie on a uniform grid (declared, or detected by the reader). */
    public boolean isUniform() {
        return !Double.isNaN(uniformRate);
    }

    /** Sample rate in hertz for uniform series. */
    public OptionalDouble rate() {
        return isUniform() ? OptionalDouble.of(uniformRate) : OptionalDouble.empty();
    }

    /** Wall-clock instant of time zero, for timestamped input. */
    public Optional<Instant> origin() {
        return Optional.ofNullable(origin);
    }

    public String name() {
        return name;
    }

    public String unit() {
        return unit;
    }

    public Set<String> covariateNames() {
        return Collections.unmodifiableSet(covariates.keySet());
    }

    public boolean hasCovariate(String covariateName) {
        return covariates.containsKey(covariateName);
    }

    /** Value of covariate {@code covariateName} at sample {@code i} (NaN where missing). */
    public double covariateAt(String covariateName, int i) {
        double[] c = covariates.get(covariateName);
        if (c == null) {
            throw new IllegalArgumentException("no covariate named '" + covariateName + "'; available: "
                    + (covariates.isEmpty() ? "none" : String.join(", ", covariates.keySet())));
        }
        return c[i];
    }

    /** A copy of covariate {@code covariateName}'s values (NaN where missing). */
    public double[] covariate(String covariateName) {
        double[] c = covariates.get(covariateName);
        if (c == null) {
            throw new IllegalArgumentException("no covariate named '" + covariateName + "'; available: "
                    + (covariates.isEmpty() ? "none" : String.join(", ", covariates.keySet())));
        }
        return c.clone();
    }

    /** A copy with other values (same times, weights, covariates); used for residuals or cleaning. */
    public Series withValues(double[] newValues) {
        if (newValues.length != size()) {
            throw new IllegalArgumentException("expected " + size() + " values, got " + newValues.length);
        }
        Builder b = toBuilder();
        b.values = newValues.clone();
        return b.build();
    }

    @Override
    public String toString() {
        return "Series[" + name + ", n=" + size() + ", missing=" + missingCount()
                + (isUniform() ? ", rate=" + uniformRate + " Hz" : ", uneven") + "]";
    }

    /** Builds a {@link Series}; checks times, lengths and values. */
    public static final class Builder {
        private double[] times;
        private double[] values;
        private double[] weights;
        private Map<String, double[]> covariates = new LinkedHashMap<>();
        private Instant origin;
        private String name = "signal";
        private String unit = "";
        private double uniformRate = Double.NaN;
        private boolean trusted;

        private Builder() {
        }

        /** Uniform sampling: time of sample n is {@code start + n / rateHz}. */
        public Builder uniform(double start, double rateHz, double[] vals) {
            if (!(rateHz > 0) || Double.isInfinite(rateHz)) {
                throw new IllegalArgumentException("sample rate must be a positive finite number of hertz, got " + rateHz);
            }
            double[] t = new double[vals.length];
            for (int i = 0; i < t.length; i++) {
                t[i] = start + i / rateHz;
            }
            this.times = t;
            this.values = vals.clone();
            this.uniformRate = rateHz;
            this.trusted = false;
            return this;
        }

        public Builder times(double[] t) {
            this.times = t.clone();
            this.uniformRate = Double.NaN;
            return this;
        }

        /**
         * Declares the explicit times to lie on a uniform grid of this rate (as detected by a
         * reader within its tolerance).
         */
        public Builder declaredUniformRate(double rateHz) {
            this.uniformRate = rateHz;
            return this;
        }

        public Builder values(double[] v) {
            this.values = v.clone();
            return this;
        }

        public Builder weights(double[] w) {
            this.weights = w == null ? null : w.clone();
            return this;
        }

        public Builder covariate(String covariateName, double[] c) {
            Objects.requireNonNull(covariateName, "covariate name");
            covariates.put(covariateName, c.clone());
            return this;
        }

        public Builder origin(Instant o) {
            this.origin = o;
            return this;
        }

        public Builder name(String n) {
            this.name = Objects.requireNonNull(n);
            return this;
        }

        public Builder unit(String u) {
            this.unit = Objects.requireNonNull(u);
            return this;
        }

        public Series build() {
            if (times == null || values == null) {
                throw new IllegalStateException("a series needs times and values");
            }
            if (times.length != values.length) {
                throw new IllegalArgumentException("times and values differ in length: " + times.length + " vs " + values.length);
            }
            if (!trusted) {
                for (int i = 0; i < times.length; i++) {
                    if (!Double.isFinite(times[i])) {
                        throw new IllegalArgumentException("sample " + i + " has a non-finite time " + times[i]);
                    }
                    if (i > 0 && !(times[i] > times[i - 1])) {
                        throw new IllegalArgumentException("times must increase strictly: sample " + i + " at " + times[i]
                                + " s follows " + times[i - 1] + " s");
                    }
                    if (Double.isInfinite(values[i])) {
                        throw new IllegalArgumentException("sample " + i + " has an infinite value");
                    }
                }
            }
            if (weights != null) {
                if (weights.length != times.length) {
                    throw new IllegalArgumentException("weights differ in length from the samples");
                }
                for (int i = 0; i < weights.length; i++) {
                    if (!(weights[i] >= 0) || Double.isInfinite(weights[i])) {
                        throw new IllegalArgumentException("weight of sample " + i + " must be finite and >= 0, got " + weights[i]);
                    }
                }
            }
            for (Map.Entry<String, double[]> e : covariates.entrySet()) {
                if (e.getValue().length != times.length) {
                    throw new IllegalArgumentException("covariate '" + e.getKey() + "' has " + e.getValue().length
                            + " values for " + times.length + " samples");
                }
            }
            return new Series(this);
        }
    }
}
