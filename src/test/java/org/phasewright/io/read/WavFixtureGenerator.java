package org.phasewright.io.read;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

/**
 * Makes the WAV fixtures under src/test/resources/io (see the README there). Valid files are
 * written by the JDK's own {@code AudioSystem.write}; WAVE_FORMAT_EXTENSIBLE files, which the
 * JDK reads but cannot write, get a 68-byte header built here around JDK-encoded samples; the
 * bad files are JDK-written files with bytes changed or cut. Run with
 * {@code java -cp target/test-classes:target/classes org.phasewright.io.read.WavFixtureGenerator}
 * from the project root; the files are committed, so tests never need to run it.
 */
public final class WavFixtureGenerator {

    /** Frames in each valid fixture. */
    public static final int FRAMES = 64;
    public static final float RATE = 8000f;

    private WavFixtureGenerator() {
    }

    /** The integer code of frame i, channel c, for a fixture of {@code bits} bits (signed). */
    public static long code(int i, int c, int bits) {
        double fullScale = Math.scalb(1.0, bits - 1);
        double x = (c == 0 ? 0.75 : -0.5) * Math.sin(2 * Math.PI * 440 * i / RATE + 0.3 * c);
        long q = Math.round(x * fullScale);
        if (i == 5) {
            q = (long) -fullScale; // the most negative code, which scales to exactly -1
        }
        if (i == 6) {
            q = (long) fullScale - 1; // the largest code, just below +1
        }
        return q;
    }

    /** The float value of frame i, channel c, for float fixtures. */
    public static float floatValue(int i, int c) {
        return (float) ((c == 0 ? 0.75 : -0.5) * Math.sin(2 * Math.PI * 440 * i / RATE + 0.3 * c));
    }

    public static void main(String[] args) throws IOException {
        Path root = Path.of(args.length > 0 ? args[0] : "src/test/resources/io");
        Path good = root.resolve("wav");
        Path bad = root.resolve("bad");
        Files.createDirectories(good);
        Files.createDirectories(bad);
        Files.write(good.resolve("tone-pcm8-mono.wav"), jdkPcm(8, 1));
        Files.write(good.resolve("tone-pcm16-stereo.wav"), jdkPcm(16, 2));
        Files.write(good.resolve("tone-pcm24-mono.wav"), jdkPcm(24, 1));
        Files.write(good.resolve("tone-pcm32-mono.wav"), jdkPcm(32, 1));
        Files.write(good.resolve("tone-float32-stereo.wav"), jdkFloat(2));
        Files.write(good.resolve("tone-extensible-pcm24-stereo.wav"), extensible(24, 2, false));
        Files.write(good.resolve("tone-extensible-float32-mono.wav"), extensible(32, 1, true));

        Files.write(bad.resolve("wav-empty.wav"), new byte[0]);
        Files.write(bad.resolve("wav-not-riff.wav"), "time,value\n0,1\n1,2\n".getBytes(StandardCharsets.US_ASCII));
        byte[] pcm16 = jdkPcm(16, 1);
        Files.write(bad.resolve("wav-header-cut.wav"), Arrays.copyOf(pcm16, 30));
        Files.write(bad.resolve("wav-truncated.wav"), withDataSize(Arrays.copyOf(pcm16, 144), 1000));
        Files.write(bad.resolve("wav-huge-declared.wav"), withDataSize(Arrays.copyOf(pcm16, 144), 0xFFFFFFF8L));
        Files.write(bad.resolve("wav-zero-data.wav"), withDataSize(Arrays.copyOf(pcm16, 44), 0));
        Files.write(bad.resolve("wav-adpcm.wav"), withFormatTag(Arrays.copyOf(pcm16, 144), 2));
        Files.write(bad.resolve("wav-mulaw.wav"), mulaw());
        Files.write(bad.resolve("wav-channel-missing.wav"), jdkPcm(16, 2));
        Files.write(bad.resolve("wav-short-data.wav"), shortData());
    }

    static byte[] jdkPcm(int bits, int channels) throws IOException {
        int width = bits / 8;
        ByteBuffer b = ByteBuffer.allocate(FRAMES * channels * width).order(ByteOrder.LITTLE_ENDIAN);
        for (int i = 0; i < FRAMES; i++) {
            for (int c = 0; c < channels; c++) {
                long q = code(i, c, bits);
                if (bits == 8) {
                    q += 128;
                }
                for (int k = 0; k < width; k++) {
                    b.put((byte) (q >>> (8 * k)));
                }
            }
        }
        AudioFormat f = new AudioFormat(bits == 8 ? AudioFormat.Encoding.PCM_UNSIGNED : AudioFormat.Encoding.PCM_SIGNED,
                RATE, bits, channels, channels * width, RATE, false);
        return jdkWrite(b.array(), f);
    }

    static byte[] jdkFloat(int channels) throws IOException {
        ByteBuffer b = ByteBuffer.allocate(FRAMES * channels * 4).order(ByteOrder.LITTLE_ENDIAN);
        for (int i = 0; i < FRAMES; i++) {
            for (int c = 0; c < channels; c++) {
                b.putFloat(floatValue(i, c));
            }
        }
        AudioFormat f = new AudioFormat(AudioFormat.Encoding.PCM_FLOAT, RATE, 32, channels, channels * 4, RATE, false);
        return jdkWrite(b.array(), f);
    }

    private static byte[] jdkWrite(byte[] samples, AudioFormat f) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (AudioInputStream ais = new AudioInputStream(new ByteArrayInputStream(samples), f, samples.length / f.getFrameSize())) {
            AudioSystem.write(ais, AudioFileFormat.Type.WAVE, out);
        }
        return out.toByteArray();
    }

    /** A WAVE_FORMAT_EXTENSIBLE file: the JDK reads these but has no writer for them. */
    static byte[] extensible(int bits, int channels, boolean isFloat) throws IOException {
        byte[] plain = isFloat ? jdkFloat(channels) : jdkPcm(bits, channels);
        byte[] samples = Arrays.copyOfRange(plain, 44, plain.length);
        int block = channels * bits / 8;
        ByteBuffer b = ByteBuffer.allocate(68 + samples.length).order(ByteOrder.LITTLE_ENDIAN);
        b.put(ascii("RIFF")).putInt(60 + samples.length).put(ascii("WAVE"));
        b.put(ascii("fmt ")).putInt(40).putShort((short) 0xFFFE).putShort((short) channels).putInt((int) RATE)
                .putInt((int) RATE * block).putShort((short) block).putShort((short) bits);
        b.putShort((short) 22).putShort((short) bits).putInt(channels == 1 ? 0x4 : 0x3);
        // sub-format GUID {0000000x-0000-0010-8000-00AA00389B71}: x = 1 PCM, 3 IEEE float
        b.putInt(isFloat ? 3 : 1).putShort((short) 0).putShort((short) 0x10)
                .put(new byte[] {(byte) 0x80, 0, 0, (byte) 0xAA, 0, 0x38, (byte) 0x9B, 0x71});
        b.put(ascii("data")).putInt(samples.length).put(samples);
        return b.array();
    }

    private static byte[] mulaw() {
        ByteBuffer b = ByteBuffer.allocate(44 + FRAMES).order(ByteOrder.LITTLE_ENDIAN);
        b.put(ascii("RIFF")).putInt(36 + FRAMES).put(ascii("WAVE"));
        b.put(ascii("fmt ")).putInt(16).putShort((short) 7).putShort((short) 1).putInt((int) RATE).putInt((int) RATE)
                .putShort((short) 1).putShort((short) 8);
        b.put(ascii("data")).putInt(FRAMES);
        for (int i = 0; i < FRAMES; i++) {
            b.put((byte) (0x80 + i));
        }
        return b.array();
    }

    /** A LIST chunk before the data makes the header 70 bytes; 101 frames declared, 88 present. */
    private static byte[] shortData() {
        int declared = 101 * 2;
        int present = 88 * 2;
        ByteBuffer b = ByteBuffer.allocate(70 + present).order(ByteOrder.LITTLE_ENDIAN);
        b.put(ascii("RIFF")).putInt(62 + declared).put(ascii("WAVE"));
        b.put(ascii("fmt ")).putInt(16).putShort((short) 1).putShort((short) 1).putInt((int) RATE).putInt((int) RATE * 2)
                .putShort((short) 2).putShort((short) 16);
        b.put(ascii("LIST")).putInt(18).put(ascii("INFO")).put(ascii("ICMT")).putInt(6).put(ascii("cut!")).putShort((short) 0);
        b.put(ascii("data")).putInt(declared);
        for (int i = 0; i < 88; i++) {
            b.putShort((short) (i * 100));
        }
        return b.array();
    }

    private static byte[] withDataSize(byte[] wav, long size) {
        ByteBuffer.wrap(wav).order(ByteOrder.LITTLE_ENDIAN).putInt(40, (int) size);
        return wav;
    }

    private static byte[] withFormatTag(byte[] wav, int tag) {
        ByteBuffer.wrap(wav).order(ByteOrder.LITTLE_ENDIAN).putShort(20, (short) tag);
        return wav;
    }

    private static byte[] ascii(String s) {
        return s.getBytes(StandardCharsets.US_ASCII);
    }
}
