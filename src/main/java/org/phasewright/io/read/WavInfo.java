package org.phasewright.io.read;

import java.nio.file.Path;
import org.phasewright.io.WavEncoding;
import org.phasewright.io.WavSampleFormat;

/**
 * What the header of a WAV file declares, checked against the file's size.
 *
 * @param file           the file
 * @param bytes          file size in bytes
 * @param encoding       sample encoding
 * @param bitsPerSample  bits per sample of one channel (container size)
 * @param channels       number of interleaved channels
 * @param sampleRateHz   frames per second
 * @param frames         frames in the data chunk (one sample per channel each)
 * @param bigEndian      byte order of the samples (false for RIFF WAV)
 * @param selection      what the reader returns: "channel k of n" or "mean of n channels"
 */
public record WavInfo(Path file, long bytes, WavEncoding encoding, int bitsPerSample, int channels,
                      double sampleRateHz, long frames, boolean bigEndian, String selection) {

    /** Seconds of audio: frames / rate. */
    public double durationSeconds() {
        return frames / sampleRateHz;
    }

    /** The sample format, for writing a cleaned file like the input. */
    public WavSampleFormat sampleFormat() {
        return new WavSampleFormat(encoding, bitsPerSample, sampleRateHz);
    }

    public int bytesPerFrame() {
        return channels * bitsPerSample / 8;
    }
}
