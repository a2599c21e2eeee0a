package org.phasewright.io.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.phasewright.io.read.CsvData;
import org.phasewright.io.read.CsvReadOptions;
import org.phasewright.io.read.CsvReader;
import org.phasewright.io.read.WavBlockReader;

/**
 * Speed and memory of the readers on large files (not a unit test; run by hand):
 * {@code java -Xmx1g -cp target/classes:target/test-classes:$(cat cp.txt) org.phasewright.io.bench.IoBenchmark /tmp/bench [rows] [wavFrames]}.
 * Writes a CSV of {@code rows} rows (time, value, covariate) and a 16-bit mono WAV of
 * {@code wavFrames} frames, then reads the CSV whole and streams the WAV in blocks, printing
 * rows per second, file size and the heap in use after reading.
 */
public final class IoBenchmark {

    private IoBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "/tmp/phasewright-bench");
        int rows = args.length > 1 ? Integer.parseInt(args[1]) : 10_000_000;
        long frames = args.length > 2 ? Long.parseLong(args[2]) : 100_000_000L;
        Files.createDirectories(dir);
        Path csv = dir.resolve("big.csv");
        if (!Files.exists(csv)) {
            try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
                w.write("time [s],accel [g],temp [degC]\n");
                for (int i = 0; i < rows; i++) {
                    double t = i / 1000.0;
                    w.write(Double.toString(t));
                    w.write(',');
                    w.write(Double.toString(Math.sin(2 * Math.PI * 50 * t) + 1e-3 * (i % 97)));
                    w.write(',');
                    w.write(Double.toString(20 + (i % 1000) * 1e-3));
                    w.write('\n');
                }
            }
        }
        long[] lastProgress = new long[1];
        long t0 = System.nanoTime();
        CsvData d = CsvReader.read(csv, CsvReadOptions.builder().progress((b, total, n) -> lastProgress[0] = n).build());
        double secs = (System.nanoTime() - t0) * 1e-9;
        System.gc();
        Runtime rt = Runtime.getRuntime();
        long used = rt.totalMemory() - rt.freeMemory();
        System.out.printf("CSV: %d rows, %.0f MB file, read in %.1f s (%.2f M rows/s), heap in use after read %.0f MB, "
                        + "uniform=%b rate=%.3f Hz, last progress %d rows%n",
                d.summary().rows(), Files.size(csv) / 1e6, secs, d.summary().rows() / secs / 1e6, used / 1e6,
                d.summary().sampling().uniform(), d.summary().sampling().rateHz(), lastProgress[0]);
        d = null;

        Path wav = dir.resolve("big.wav");
        if (!Files.exists(wav)) {
            writeWav(wav, frames);
        }
        System.gc();
        long before = rt.totalMemory() - rt.freeMemory();
        t0 = System.nanoTime();
        double sumSq = 0;
        long n = 0;
        long peak = 0;
        try (WavBlockReader r = WavBlockReader.open(wav)) {
            double[] block = new double[WavBlockReader.BLOCK_FRAMES];
            int k;
            while ((k = r.read(block)) > 0) {
                for (int i = 0; i < k; i++) {
                    sumSq += block[i] * block[i];
                }
                n += k;
                if ((n & ((1 << 24) - 1)) < k) {
                    peak = Math.max(peak, rt.totalMemory() - rt.freeMemory());
                }
            }
        }
        secs = (System.nanoTime() - t0) * 1e-9;
        System.out.printf("WAV: %d frames, %.0f MB file, streamed in %.1f s (%.1f M frames/s), RMS %.4f FS, "
                        + "heap before %.0f MB, sampled heap during read at most %.0f MB%n",
                n, Files.size(wav) / 1e6, secs, n / secs / 1e6, Math.sqrt(sumSq / n), before / 1e6, peak / 1e6);
    }

    /** A 16-bit mono 48 kHz WAV with a 50 Hz tone at half scale, header written here for speed. */
    private static void writeWav(Path wav, long frames) throws IOException {
        long dataBytes = frames * 2;
        try (OutputStream out = new java.io.BufferedOutputStream(Files.newOutputStream(wav), 1 << 20)) {
            ByteBuffer h = ByteBuffer.allocate(44).order(ByteOrder.LITTLE_ENDIAN);
            h.put("RIFF".getBytes(StandardCharsets.US_ASCII)).putInt((int) (36 + dataBytes)).put("WAVE".getBytes(StandardCharsets.US_ASCII));
            h.put("fmt ".getBytes(StandardCharsets.US_ASCII)).putInt(16).putShort((short) 1).putShort((short) 1).putInt(48000)
                    .putInt(96000).putShort((short) 2).putShort((short) 16);
            h.put("data".getBytes(StandardCharsets.US_ASCII)).putInt((int) dataBytes);
            out.write(h.array());
            byte[] buf = new byte[2 * 960];
            ByteBuffer b = ByteBuffer.wrap(buf).order(ByteOrder.LITTLE_ENDIAN);
            for (int i = 0; i < 960; i++) {
                b.putShort((short) Math.round(16384 * Math.sin(2 * Math.PI * i / 960.0)));
            }
            for (long f = 0; f < frames; f += 960) {
                out.write(buf, 0, (int) Math.min(960, frames - f) * 2);
            }
        }
    }
}
