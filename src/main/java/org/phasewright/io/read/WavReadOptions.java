package org.phasewright.io.read;

import java.util.Objects;
import org.phasewright.io.ReadProgress;

/**
 * How to read a WAV file: which channel (1-based) or the average of all channels, and where to
 * report progress. The default reads channel 1.
 *
 * @param channel  1-based channel to read, or 0 for the average of all channels
 * @param progress progress listener (frames read)
 */
public record WavReadOptions(int channel, ReadProgress progress) {

    public WavReadOptions {
        if (channel < 0) {
            throw new IllegalArgumentException("channels are numbered from 1 (0 averages them), got " + channel);
        }
        Objects.requireNonNull(progress, "progress");
    }

    public static WavReadOptions defaults() {
        return new WavReadOptions(1, ReadProgress.NONE);
    }

    /** Reads the 1-based {@code channel}. */
    public static WavReadOptions channel(int channel) {
        if (channel < 1) {
            throw new IllegalArgumentException("channels are numbered from 1, got " + channel);
        }
        return new WavReadOptions(channel, ReadProgress.NONE);
    }

    /** Reads the mean of all channels, frame by frame. */
    public static WavReadOptions averageChannels() {
        return new WavReadOptions(0, ReadProgress.NONE);
    }

    public WavReadOptions withProgress(ReadProgress listener) {
        return new WavReadOptions(channel, listener);
    }

    public boolean averages() {
        return channel == 0;
    }
}
