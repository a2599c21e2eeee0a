package org.phasewright.cli;

import picocli.CommandLine.Option;

/**
 * Options that say which part of an input file is the signal. Shared by every command that reads
 * a record (mixed in with {@code @Mixin}), so all commands spell them the same way.
 */
final class InputOptions {

    @Option(names = "--time-column", paramLabel = "NAME",
            description = "CSV column holding the sample times (seconds, or ISO 8601 date-times); found by"
                    + " the reader when not given.")
    String timeColumn;

    @Option(names = "--value-column", paramLabel = "NAME",
            description = "CSV column holding the signal; the first value column when not given.")
    String valueColumn;

    @Option(names = "--channel", paramLabel = "N",
            description = "Channel to analyse in a multi-channel WAV or CSV file, counting from 1 (default 1).")
    Integer channel;

    @Option(names = "--rate", paramLabel = "HZ", converter = Converters.FrequencyConverter.class,
            description = "Sample rate for files without a time column (e.g. 5000, 5khz).")
    Frequency rate;

    /** What to read, as the record source needs it. */
    RecordRequest request(java.util.List<String> covariates) {
        if (channel != null && channel < 1) {
            throw new UsageException("--channel counts from 1, got " + channel);
        }
        return new RecordRequest(timeColumn, valueColumn, channel, rate == null ? null : rate.hertz(),
                covariates, false);
    }
}
