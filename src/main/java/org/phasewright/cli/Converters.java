package org.phasewright.cli;

import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * picocli converters for the value syntaxes of our own (frequencies, times, levels). Each turns
 * a parsing failure into a {@link TypeConversionException}, which picocli reports as a usage
 * error naming the option (exit code 2).
 */
final class Converters {

    private Converters() {
    }

    static final class FrequencyConverter implements ITypeConverter<Frequency> {
        @Override
        public Frequency convert(String value) {
            try {
                return FrequencyParser.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    static final class TimePointConverter implements ITypeConverter<TimePoint> {
        @Override
        public TimePoint convert(String value) {
            try {
                return TimePoint.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    static final class LevelConverter implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            try {
                return ConfidenceLevel.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** A significance level strictly between 0 and 1, e.g. {@code 0.01} or {@code 1%}. */
    static final class ProbabilityConverter implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            String s = value.trim();
            boolean percent = s.endsWith("%");
            double v;
            try {
                v = Double.parseDouble(percent ? s.substring(0, s.length() - 1).trim() : s);
            } catch (NumberFormatException e) {
                throw new TypeConversionException("'" + value + "' is not a significance level; write e.g. 0.01 or 1%");
            }
            v = percent ? v / 100 : v;
            if (!(v > 0 && v < 1)) {
                throw new TypeConversionException("'" + value + "' is not a significance level: it must lie strictly"
                        + " between 0 and 1, e.g. 0.01 or 1%");
            }
            return v;
        }
    }

    /** {@code HZ} or {@code auto}: the fundamental of a harmonic series. */
    static final class FundamentalConverter implements ITypeConverter<FundamentalChoice> {
        @Override
        public FundamentalChoice convert(String value) {
            if (value.trim().equalsIgnoreCase("auto")) {
                return FundamentalChoice.AUTO;
            }
            try {
                return new FundamentalChoice(FrequencyParser.parse(value));
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage() + ", or auto");
            }
        }
    }

    static final class SkipConverter implements ITypeConverter<SkipList> {
        @Override
        public SkipList convert(String value) {
            try {
                return new SkipList(HarmonicNumbers.parse(value));
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    static final class HarmonicCountConverter implements ITypeConverter<HarmonicCount> {
        @Override
        public HarmonicCount convert(String value) {
            try {
                return HarmonicCount.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    static final class TrendConverter implements ITypeConverter<TrendOption> {
        @Override
        public TrendOption convert(String value) {
            try {
                return new TrendOption(value, TrendChoice.parse(value));
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** The fundamental given: a frequency, or {@code null} for {@code auto}. */
    record FundamentalChoice(Frequency frequency) {
        static final FundamentalChoice AUTO = new FundamentalChoice(null);

        boolean isAuto() {
            return frequency == null;
        }
    }

    record SkipList(java.util.List<Integer> harmonics) {
    }

    record TrendOption(String text, java.util.Optional<org.phasewright.model.TermSpec> term) {
    }
}
