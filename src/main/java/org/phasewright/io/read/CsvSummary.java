package org.phasewright.io.read;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

/**
 * What a CSV reader found in a file: its layout, how time was read, the sampling, and each
 * channel's gaps. Front ends print it; nothing here is recomputed elsewhere.
 *
 * @param file              the file read
 * @param bytes             its size in bytes
 * @param rows              data rows read (= samples per channel)
 * @param delimiter         field delimiter used (',' ';' or tab)
 * @param decimalComma      whether "1,5" was accepted as 1.5
 * @param header            whether the first record was a header
 * @param columns           names of all columns in file order ({@code column_k} without a header)
 * @param time              how time was obtained
 * @param timeColumn        name of the time column, or null when the rate was given
 * @param timeScale         unit of a numeric time column, or null
 * @param timeOffsetSeconds seconds subtracted from numeric times so that t = 0 is the first sample (0 when none)
 * @param origin            wall-clock instant of t = 0 for date-time input, or null
 * @param zoneForLocalTimes zone used for date-times written without an offset, or null when all had one
 * @param sampling          uniform or uneven, rate, jitter and time gaps
 * @param channels          each channel read, with its gaps
 * @param covariates        names of the columns kept as covariates
 * @param ignoredColumns    names of columns skipped because their first cell was text
 */
public record CsvSummary(Path file, long bytes, int rows, char delimiter, boolean decimalComma, boolean header,
                         List<String> columns, TimeSource time, String timeColumn, TimeScale timeScale,
                         double timeOffsetSeconds, Instant origin, String zoneForLocalTimes,
                         SamplingSummary sampling, List<ChannelSummary> channels, List<String> covariates,
                         List<String> ignoredColumns) {

    /** Where the sample times came from. */
    public enum TimeSource {
        /** A numeric column in a named unit. */
        NUMBER,
        /** A column of ISO-8601 date-times. */
        ISO_8601,
        /** No time column: a sample rate given by the user. */
        GIVEN_RATE
    }

    public CsvSummary {
        columns = List.copyOf(columns);
        channels = List.copyOf(channels);
        covariates = List.copyOf(covariates);
        ignoredColumns = List.copyOf(ignoredColumns);
    }

    public Optional<Instant> originInstant() {
        return Optional.ofNullable(origin);
    }

    /** Gap samples summed over all channels. */
    public long totalMissing() {
        return channels.stream().mapToLong(ChannelSummary::missing).sum();
    }
}
