package org.phasewright.io.read;

import java.util.List;
import org.phasewright.series.Series;

/**
 * The result of reading a CSV file: one {@link Series} per chosen channel (all sharing the same
 * times, origin and covariates) and the reader's summary.
 */
public record CsvData(List<Series> channels, CsvSummary summary) {

    public CsvData {
        channels = List.copyOf(channels);
        if (channels.isEmpty()) {
            throw new IllegalArgumentException("at least one channel");
        }
    }

    /** The first (often the only) channel. */
    public Series series() {
        return channels.get(0);
    }

    /** The channel whose name is {@code name}. */
    public Series channel(String name) {
        for (Series s : channels) {
            if (s.name().equals(name)) {
                return s;
            }
        }
        throw new IllegalArgumentException("no channel named '" + name + "'; read: "
                + String.join(", ", channels.stream().map(Series::name).toList()));
    }
}
