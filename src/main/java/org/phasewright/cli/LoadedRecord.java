package org.phasewright.cli;

import java.util.List;
import org.phasewright.io.read.CsvSummary;
import org.phasewright.io.read.SamplingSummary;
import org.phasewright.io.read.WavInfo;
import org.phasewright.series.Series;

/**
 * A record read from a file, with what the file held besides it.
 *
 * @param where     how messages name the file (its path as the user gave it)
 * @param format    the file's format in words, e.g. "CSV" or "WAV, 16-bit PCM"
 * @param channels  the names of the signal channels the file holds (value columns, WAV channels)
 * @param channel   the name of the channel that became {@code series}
 * @param series    the signal, with the requested covariates attached
 * @param unit      the signal's unit as the file states it ("" when it does not)
 * @param csv       the CSV reader's summary, or null for other formats
 * @param wav       the WAV header information, or null for other formats
 */
record LoadedRecord(String where, String format, List<String> channels, String channel, Series series,
                    String unit, CsvSummary csv, WavInfo wav) {
    LoadedRecord {
        channels = List.copyOf(channels);
    }

    /** How the CSV reader found the samples spaced in time; null when it did not examine times. */
    SamplingSummary sampling() {
        return csv == null ? null : csv.sampling();
    }
}
