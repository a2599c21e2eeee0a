package org.phasewright.io.read;

import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.phasewright.io.ReadProgress;

/**
 * How to read a signal CSV file. Immutable; build with {@link #builder()} or start from
 * {@link #defaults()}: delimiter and header detected, time in the first column (seconds, or
 * ISO-8601 detected from the first data cell), the first other numeric column as the channel,
 * every remaining numeric column as a covariate, and uniform sampling accepted when no time
 * deviates from the fitted grid by more than 1 % of a step.
 */
public final class CsvReadOptions {

    /** Whether the first record is a header. */
    public enum HeaderMode { DETECT, PRESENT, ABSENT }

    /** How the time column is written. */
    public enum TimeFormat {
        /** Decided from the first data cell: a number, else an ISO-8601 date-time. */
        DETECT,
        /** A number in the {@link TimeScale} given. */
        NUMBER,
        /** ISO-8601 date-times (or dates), with or without an offset. */
        ISO_8601
    }

    /** Where time zero of numeric times lies. Timestamped input always starts at its first sample. */
    public enum TimeZero {
        /**
         * Time zero at the first sample when the first time is farther from zero than the
         * record is long (e.g. Unix seconds, or a cut from a long log), else as written.
         */
        DETECT,
        /** Time zero at the first sample. */
        FIRST_SAMPLE,
        /** Times exactly as written (converted to seconds). */
        AS_WRITTEN
    }

    private final Character delimiter;
    private final HeaderMode header;
    private final ColumnRef timeColumn;
    private final double sampleRateHz;
    private final TimeFormat timeFormat;
    private final TimeScale timeScale;
    private final TimeZero timeZero;
    private final ZoneId zoneForLocalTimes;
    private final List<ColumnRef> channels;
    private final List<ColumnRef> covariates;
    private final double uniformTolerance;
    private final Boolean decimalComma;
    private final ReadProgress progress;

    private CsvReadOptions(Builder b) {
        this.delimiter = b.delimiter;
        this.header = b.header;
        this.timeColumn = b.timeColumn;
        this.sampleRateHz = b.sampleRateHz;
        this.timeFormat = b.timeFormat;
        this.timeScale = b.timeScale;
        this.timeZero = b.timeZero;
        this.zoneForLocalTimes = b.zoneForLocalTimes;
        this.channels = List.copyOf(b.channels);
        this.covariates = b.covariates == null ? null : List.copyOf(b.covariates);
        this.uniformTolerance = b.uniformTolerance;
        this.decimalComma = b.decimalComma;
        this.progress = b.progress;
    }

    public static CsvReadOptions defaults() {
        return builder().build();
    }

    public static Builder builder() {
        return new Builder();
    }

    /** The delimiter forced by the user; empty when it is detected. */
    public Optional<Character> delimiter() {
        return Optional.ofNullable(delimiter);
    }

    public HeaderMode header() {
        return header;
    }

    /** The time column forced by the user; empty for the default (the first column). */
    public Optional<ColumnRef> timeColumn() {
        return Optional.ofNullable(timeColumn);
    }

    /** The sample rate for a file without a time column; empty when the file has one. */
    public OptionalDouble sampleRateHz() {
        return Double.isNaN(sampleRateHz) ? OptionalDouble.empty() : OptionalDouble.of(sampleRateHz);
    }

    public TimeFormat timeFormat() {
        return timeFormat;
    }

    public TimeScale timeScale() {
        return timeScale;
    }

    public TimeZero timeZero() {
        return timeZero;
    }

    public ZoneId zoneForLocalTimes() {
        return zoneForLocalTimes;
    }

    /** Channels chosen by the user; empty for the default (first numeric non-time column). */
    public List<ColumnRef> channels() {
        return channels;
    }

    /** Covariates chosen by the user; empty Optional means every other numeric column. */
    public Optional<List<ColumnRef>> covariates() {
        return Optional.ofNullable(covariates);
    }

    /** Largest deviation from the uniform grid still called uniform, as a fraction of one step. */
    public double uniformTolerance() {
        return uniformTolerance;
    }

    /** Forced decimal-comma setting; empty means: accepted exactly when the delimiter is ';'. */
    public Optional<Boolean> decimalComma() {
        return Optional.ofNullable(decimalComma);
    }

    public ReadProgress progress() {
        return progress;
    }

    public Builder toBuilder() {
        Builder b = new Builder();
        b.delimiter = delimiter;
        b.header = header;
        b.timeColumn = timeColumn;
        b.sampleRateHz = sampleRateHz;
        b.timeFormat = timeFormat;
        b.timeScale = timeScale;
        b.timeZero = timeZero;
        b.zoneForLocalTimes = zoneForLocalTimes;
        b.channels = new ArrayList<>(channels);
        b.covariates = covariates == null ? null : new ArrayList<>(covariates);
        b.uniformTolerance = uniformTolerance;
        b.decimalComma = decimalComma;
        b.progress = progress;
        return b;
    }

    /** Fluent builder; every setter validates its argument at once. */
    public static final class Builder {
        private Character delimiter;
        private HeaderMode header = HeaderMode.DETECT;
        private ColumnRef timeColumn;
        private double sampleRateHz = Double.NaN;
        private TimeFormat timeFormat = TimeFormat.DETECT;
        private TimeScale timeScale = TimeScale.SECONDS;
        private TimeZero timeZero = TimeZero.DETECT;
        private ZoneId zoneForLocalTimes = ZoneOffset.UTC;
        private List<ColumnRef> channels = new ArrayList<>();
        private List<ColumnRef> covariates;
        private double uniformTolerance = 0.01;
        private Boolean decimalComma;
        private ReadProgress progress = ReadProgress.NONE;

        private Builder() {
        }

        /** Forces the delimiter: ',', ';' or a tab. */
        public Builder delimiter(char d) {
            if (d != ',' && d != ';' && d != '\t') {
                throw new IllegalArgumentException("the delimiter must be a comma, a semicolon or a tab, got '" + d + "'");
            }
            this.delimiter = d;
            return this;
        }

        public Builder header(HeaderMode mode) {
            this.header = Objects.requireNonNull(mode);
            return this;
        }

        /** The column holding the time (default: the first column). */
        public Builder timeColumn(ColumnRef column) {
            this.timeColumn = Objects.requireNonNull(column);
            this.sampleRateHz = Double.NaN;
            return this;
        }

        /** The file has no time column; sample i is at {@code i / rateHz} seconds. */
        public Builder noTimeColumn(double rateHz) {
            if (!(rateHz > 0) || Double.isInfinite(rateHz)) {
                throw new IllegalArgumentException("the sample rate must be a positive number of hertz, got " + rateHz);
            }
            this.sampleRateHz = rateHz;
            this.timeColumn = null;
            return this;
        }

        public Builder timeFormat(TimeFormat format) {
            this.timeFormat = Objects.requireNonNull(format);
            return this;
        }

        /** Unit of a numeric time column (implies {@link TimeFormat#NUMBER}). */
        public Builder timeScale(TimeScale scale) {
            this.timeScale = Objects.requireNonNull(scale);
            this.timeFormat = TimeFormat.NUMBER;
            return this;
        }

        public Builder timeZero(TimeZero zero) {
            this.timeZero = Objects.requireNonNull(zero);
            return this;
        }

        /** Zone for date-times written without an offset (default UTC). */
        public Builder zoneForLocalTimes(ZoneId zone) {
            this.zoneForLocalTimes = Objects.requireNonNull(zone);
            return this;
        }

        /** The signal columns, in order; each becomes one {@code Series}. */
        public Builder channels(List<ColumnRef> columns) {
            if (columns.isEmpty()) {
                throw new IllegalArgumentException("name at least one channel, or leave the default");
            }
            this.channels = new ArrayList<>(columns);
            return this;
        }

        /** Channels given as typed by a user: names, or 1-based positions. */
        public Builder channels(String... columns) {
            List<ColumnRef> refs = new ArrayList<>();
            for (String c : columns) {
                refs.add(ColumnRef.parse(c));
            }
            return channels(refs);
        }

        /** Restricts the covariates to these columns (an empty list: none). */
        public Builder covariates(List<ColumnRef> columns) {
            this.covariates = new ArrayList<>(columns);
            return this;
        }

        /** Fraction of a sampling step (0 to 0.5) by which times may stray from a uniform grid. */
        public Builder uniformTolerance(double fractionOfStep) {
            if (!(fractionOfStep >= 0 && fractionOfStep <= 0.5)) {
                throw new IllegalArgumentException("the uniform-sampling tolerance is a fraction of one step between 0 and 0.5, got "
                        + fractionOfStep);
            }
            this.uniformTolerance = fractionOfStep;
            return this;
        }

        public Builder decimalComma(boolean accepted) {
            this.decimalComma = accepted;
            return this;
        }

        public Builder progress(ReadProgress listener) {
            this.progress = Objects.requireNonNull(listener);
            return this;
        }

        public CsvReadOptions build() {
            return new CsvReadOptions(this);
        }
    }
}
