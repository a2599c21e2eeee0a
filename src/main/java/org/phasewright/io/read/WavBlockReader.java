package org.phasewright.io.read;

import static org.phasewright.io.InputException.Kind;

import java.io.BufferedInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;
import javax.sound.sampled.UnsupportedAudioFileException;
import org.phasewright.io.InputException;
import org.phasewright.io.WavEncoding;

/**
 * Reads a WAV file block by block as doubles in full-scale units, so that a record of any length
 * can be processed with a fixed amount of memory (the streaming fit path uses this).
 *
 * <p>Decoding is left to the JDK's {@code javax.sound.sampled}: on JDK 17 it reads PCM of 8
 * (unsigned), 16, 24 and 32 bits, IEEE float of 32 and 64 bits, and WAVE_FORMAT_EXTENSIBLE headers
 * with PCM or float sub-formats (checked by this project's tests), so no RIFF parser of our own
 * is needed. The only bytes read here directly are the format tag, peeked to name an encoding the
 * JDK refuses. Integer samples are scaled by {@code 2^-(bits-1)} to [-1, 1); 8-bit unsigned
 * samples have 128 subtracted first; float samples are passed through.
 *
 * <p>Before any sample is read the declared data length is checked against the file size, so a
 * header that claims more data than the file holds is refused at once and no buffer larger than
 * one block (64 Ki frames) is ever allocated. A file that ends early is reported at the frame
 * where it ends. Cost: O(frames x channels), one pass.
 */
public final class WavBlockReader implements AutoCloseable {

    /** Frames decoded per call to the underlying stream. */
    public static final int BLOCK_FRAMES = 1 << 16;
    /** The shortest RIFF/WAVE header (RIFF, WAVE, a 16-byte fmt chunk, the data chunk header). */
    private static final int MIN_HEADER_BYTES = 44;

    private final Path file;
    private final WavInfo info;
    private final WavReadOptions options;
    private final AudioInputStream audio;
    private final int bytesPerSample;
    private final int frameBytes;
    private final double scale;
    private byte[] buffer;
    private long framesRead;

    private WavBlockReader(Path file, WavInfo info, WavReadOptions options, AudioInputStream audio) {
        this.file = file;
        this.info = info;
        this.options = options;
        this.audio = audio;
        this.bytesPerSample = info.bitsPerSample() / 8;
        this.frameBytes = info.bytesPerFrame();
        this.scale = info.encoding() == WavEncoding.PCM_FLOAT ? 1.0 : Math.scalb(1.0, -(info.bitsPerSample() - 1));
    }

    /** Opens {@code file} reading channel 1. */
    public static WavBlockReader open(Path file) {
        return open(file, WavReadOptions.defaults());
    }

    /**
     * Opens {@code file} and checks its header: encoding, channel choice, and that the declared
     * data fit in the file.
     *
     * @throws InputException for a missing, truncated, empty or undecodable file
     */
    public static WavBlockReader open(Path file, WavReadOptions options) {
        if (!Files.isRegularFile(file)) {
            throw InputException.inFile(Kind.UNREADABLE, file, Files.exists(file) ? "not a regular file" : "no such file");
        }
        long size;
        AudioInputStream audio;
        try {
            size = Files.size(file);
            if (size == 0) {
                throw InputException.inFile(Kind.EMPTY_FILE, file, "the file is empty (0 bytes)");
            }
            if (!WavHeaderPeek.peek(file).riffWave()) {
                // the JDK would also decode AIFF and AU; this reader promises WAV and checks sizes as WAV
                throw InputException.inFile(Kind.UNSUPPORTED_AUDIO, file, "not a WAV file: it does not start with a RIFF/WAVE header");
            }
            InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
            try {
                audio = AudioSystem.getAudioInputStream(in);
            } catch (UnsupportedAudioFileException | IOException | RuntimeException e) {
                in.close();
                throw refused(file, size, e);
            }
        } catch (IOException e) {
            throw InputException.inFile(Kind.UNREADABLE, file, "cannot be read: " + e.getMessage(), e);
        }
        try {
            WavInfo info = check(file, size, audio.getFormat(), audio.getFrameLength(), options);
            return new WavBlockReader(file, info, options, audio);
        } catch (RuntimeException e) {
            closeQuietly(audio);
            throw e;
        }
    }

    private static InputException refused(Path file, long size, Exception e) {
        WavHeaderPeek.Peek peek = WavHeaderPeek.peek(file);
        if (!peek.riffWave()) {
            return InputException.inFile(Kind.UNSUPPORTED_AUDIO, file,
                    "not a WAV file: it does not start with a RIFF/WAVE header", e);
        }
        if (size < MIN_HEADER_BYTES || e instanceof EOFException || !peek.fmtComplete()) {
            return InputException.inFile(Kind.TRUNCATED, file,
                    "the file ends inside its header (" + size + " bytes)", e);
        }
        return InputException.inFile(Kind.UNSUPPORTED_AUDIO, file, "the WAV encoding "
                + WavHeaderPeek.describeTag(peek.formatTag()) + " is not supported; convert the file to PCM (8, 16, 24 or 32 bit) or 32/64-bit float", e);
    }

    private static WavInfo check(Path file, long size, AudioFormat f, long frames, WavReadOptions options) {
        WavEncoding enc;
        AudioFormat.Encoding e = f.getEncoding();
        if (AudioFormat.Encoding.PCM_SIGNED.equals(e)) {
            enc = WavEncoding.PCM_SIGNED;
        } else if (AudioFormat.Encoding.PCM_UNSIGNED.equals(e)) {
            enc = WavEncoding.PCM_UNSIGNED;
        } else if (AudioFormat.Encoding.PCM_FLOAT.equals(e)) {
            enc = WavEncoding.PCM_FLOAT;
        } else {
            throw InputException.inFile(Kind.UNSUPPORTED_AUDIO, file, "the WAV encoding " + e
                    + " is not supported; convert the file to PCM (8, 16, 24 or 32 bit) or 32/64-bit float");
        }
        int channels = f.getChannels();
        int frameSize = f.getFrameSize();
        float rate = f.getSampleRate();
        if (channels < 1 || frameSize < 1 || frameSize % channels != 0) {
            throw InputException.inFile(Kind.UNSUPPORTED_AUDIO, file, "the header declares " + channels
                    + " channels in frames of " + frameSize + " bytes, which does not describe interleaved samples");
        }
        int bits = 8 * (frameSize / channels);
        boolean bitsOk = enc == WavEncoding.PCM_FLOAT ? bits == 32 || bits == 64 : bits >= 8 && bits <= 32;
        if (!bitsOk) {
            throw InputException.inFile(Kind.UNSUPPORTED_AUDIO, file, bits + "-bit " + enc + " samples are not supported");
        }
        if (!(rate > 0) || Float.isInfinite(rate)) {
            throw InputException.inFile(Kind.UNSUPPORTED_AUDIO, file, "the header declares a sample rate of " + rate + " Hz");
        }
        if (frames == AudioSystem.NOT_SPECIFIED || frames < 0) {
            throw InputException.inFile(Kind.UNSUPPORTED_AUDIO, file, "the header does not state the length of the data");
        }
        if (frames == 0) {
            throw InputException.inFile(Kind.NO_AUDIO_DATA, file, "the data chunk holds no samples");
        }
        long available = size - MIN_HEADER_BYTES;
        if (frames > available / frameSize) {
            throw InputException.inFile(Kind.TRUNCATED, file, "the header declares " + frames + " frames ("
                    + frames * frameSize + " bytes of samples) but the file holds only "
                    + size + " bytes; it was cut short or its header is wrong");
        }
        if (options.channel() > channels) {
            throw InputException.inFile(Kind.BAD_OPTION, file, "channel " + options.channel() + " was asked for, but the file has "
                    + channels + (channels == 1 ? " channel" : " channels"));
        }
        String selection = options.averages() ? "mean of " + channels + " channels"
                : "channel " + options.channel() + " of " + channels;
        return new WavInfo(file, size, enc, bits, channels, rate, frames, f.isBigEndian(), selection);
    }

    public WavInfo info() {
        return info;
    }

    /** Frames returned so far. */
    public long framesRead() {
        return framesRead;
    }

    /** Reads up to {@code out.length} frames; see {@link #read(double[], int, int)}. */
    public int read(double[] out) {
        return read(out, 0, out.length);
    }

    /**
     * Reads up to {@code len} frames of the selected channel (or channel mean) into
     * {@code out[off..off+len)}.
     *
     * @return frames read, or -1 when all declared frames have been read
     * @throws InputException when the file ends before the frames its header declares
     */
    public int read(double[] out, int off, int len) {
        long left = info.frames() - framesRead;
        if (left <= 0) {
            return -1;
        }
        int want = (int) Math.min(Math.min(len, left), BLOCK_FRAMES);
        if (want == 0) {
            return 0;
        }
        if (buffer == null || buffer.length < want * frameBytes) {
            buffer = new byte[(int) Math.min((long) BLOCK_FRAMES, info.frames()) * frameBytes];
        }
        int bytes;
        try {
            bytes = audio.readNBytes(buffer, 0, want * frameBytes);
        } catch (IOException e) {
            throw InputException.inFile(Kind.UNREADABLE, file, "cannot be read after frame " + framesRead + ": " + e.getMessage(), e);
        }
        int got = bytes / frameBytes;
        if (got < want) {
            throw InputException.inFile(Kind.TRUNCATED, file, "the data end after frame " + (framesRead + got) + " of the "
                    + info.frames() + " the header declares" + (bytes % frameBytes != 0 ? ", inside a frame" : "")
                    + "; the file was cut short");
        }
        decode(got, out, off);
        framesRead += got;
        options.progress().update(Math.min(info.bytes(), MIN_HEADER_BYTES + framesRead * frameBytes), info.bytes(), framesRead);
        return got;
    }

    private void decode(int frames, double[] out, int off) {
        ByteBuffer b = ByteBuffer.wrap(buffer, 0, frames * frameBytes)
                .order(info.bigEndian() ? ByteOrder.BIG_ENDIAN : ByteOrder.LITTLE_ENDIAN);
        int channels = info.channels();
        int pick = options.channel() - 1;
        for (int i = 0; i < frames; i++) {
            int base = i * frameBytes;
            if (options.averages()) {
                double sum = 0;
                for (int c = 0; c < channels; c++) {
                    sum += sample(b, base + c * bytesPerSample);
                }
                out[off + i] = sum / channels;
            } else {
                out[off + i] = sample(b, base + pick * bytesPerSample);
            }
        }
    }

    private double sample(ByteBuffer b, int at) {
        switch (info.encoding()) {
            case PCM_FLOAT:
                return bytesPerSample == 4 ? b.getFloat(at) : b.getDouble(at);
            case PCM_UNSIGNED:
                return (unsignedInt(b, at) - (1L << (info.bitsPerSample() - 1))) * scale;
            default:
                long u = unsignedInt(b, at);
                int shift = 64 - info.bitsPerSample();
                return ((u << shift) >> shift) * scale;
        }
    }

    private long unsignedInt(ByteBuffer b, int at) {
        long v = 0;
        if (info.bigEndian()) {
            for (int k = 0; k < bytesPerSample; k++) {
                v = (v << 8) | (b.get(at + k) & 0xffL);
            }
        } else {
            for (int k = bytesPerSample - 1; k >= 0; k--) {
                v = (v << 8) | (b.get(at + k) & 0xffL);
            }
        }
        return v;
    }

    @Override
    public void close() {
        closeQuietly(audio);
    }

    private static void closeQuietly(AudioInputStream a) {
        try {
            a.close();
        } catch (IOException ignored) {
            // nothing was written; a failed close of an input loses nothing
        }
    }
}
