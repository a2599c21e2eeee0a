package org.phasewright.io;

import java.util.Objects;

/**
 * The sample format of a WAV file: encoding, bits per sample and sample rate. Readers report the
 * input's format so that writers can produce a cleaned file in the same format.
 */
public record WavSampleFormat(WavEncoding encoding, int bitsPerSample, double sampleRateHz) {

    public WavSampleFormat {
        Objects.requireNonNull(encoding, "encoding");
        boolean ok = switch (encoding) {
            case PCM_UNSIGNED -> bitsPerSample == 8;
            case PCM_SIGNED -> bitsPerSample == 8 || bitsPerSample == 16 || bitsPerSample == 24 || bitsPerSample == 32;
            case PCM_FLOAT -> bitsPerSample == 32 || bitsPerSample == 64;
        };
        if (!ok) {
            throw new IllegalArgumentException(bitsPerSample + "-bit " + encoding + " is not a WAV sample format Phasewright writes");
        }
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive, got " + sampleRateHz);
        }
    }

    /** Bytes per sample of one channel. */
    public int bytesPerSample() {
        return bitsPerSample / 8;
    }

    /** 16-bit signed PCM at {@code rateHz}, the most widely read WAV format. */
    public static WavSampleFormat pcm16(double rateHz) {
        return new WavSampleFormat(WavEncoding.PCM_SIGNED, 16, rateHz);
    }
}
