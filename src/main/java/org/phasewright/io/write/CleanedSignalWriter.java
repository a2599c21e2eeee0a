package org.phasewright.io.write;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;
import org.phasewright.io.OutputException;
import org.phasewright.io.WavEncoding;
import org.phasewright.io.WavSampleFormat;
import org.phasewright.series.Series;

/**
 * Writes a cleaned signal (a {@link Series} holding the observed values minus the chosen
 * components, as computed by the analysis) to CSV or to WAV, atomically.
 *
 * <p>CSV: columns {@code time [s]}, then {@code time [UTC]} (ISO-8601) when the series has a
 * wall-clock origin, then the signal headed by its name and unit; gaps are empty cells.
 * WAV: mono, in the given sample format, encoded block by block through
 * {@code javax.sound.sampled}; integer samples are rounded to the nearest step and values beyond
 * the format's range are clipped and counted; gaps are written as 0 and counted (WAV has no
 * gaps). Cost: O(n), constant memory beyond the series.
 */
public final class CleanedSignalWriter {

    private CleanedSignalWriter() {
    }

    public static CleanedSignalReport writeCsv(Path target, Series cleaned, boolean replace) {
        Instant origin = cleaned.origin().orElse(null);
        List<String> header = new ArrayList<>();
        header.add("time [s]");
        if (origin != null) {
            header.add("time [UTC]");
        }
        header.add(Headers.withUnit(cleaned.name(), cleaned.unit()));
        AtomicFile.writeText(target, replace, w -> {
            CsvTableWriter t = new CsvTableWriter(w, header);
            for (int i = 0; i < cleaned.size(); i++) {
                double time = cleaned.timeAt(i);
                t.cell(CsvCells.number(time));
                if (origin != null) {
                    t.cell(Headers.instantAt(origin, time));
                }
                t.cell(CsvCells.number(cleaned.valueAt(i)));
                t.endRow();
            }
            t.flush();
        });
        return new CleanedSignalReport(target, cleaned.size(), cleaned.missingCount(), 0, 0);
    }

    /**
     * Writes a mono WAV in {@code format}; the series must be uniform at the format's rate.
     *
     * @throws OutputException UNSUITABLE for an uneven series or a rate mismatch
     */
    public static CleanedSignalReport writeWav(Path target, Series cleaned, WavSampleFormat format, boolean replace) {
        if (!cleaned.isUniform()) {
            throw new OutputException(OutputException.Kind.UNSUITABLE, target,
                    "a WAV file needs uniform sampling; this series is unevenly sampled (write CSV instead)");
        }
        double rate = cleaned.rate().getAsDouble();
        if (Math.abs(rate - format.sampleRateHz()) > 1e-9 * format.sampleRateHz()) {
            throw new OutputException(OutputException.Kind.UNSUITABLE, target, "the series is sampled at " + rate
                    + " Hz but the WAV format asks for " + format.sampleRateHz() + " Hz");
        }
        Encoder encoder = new Encoder(cleaned, format);
        AudioFormat af = new AudioFormat(switch (format.encoding()) {
            case PCM_SIGNED -> AudioFormat.Encoding.PCM_SIGNED;
            case PCM_UNSIGNED -> AudioFormat.Encoding.PCM_UNSIGNED;
            case PCM_FLOAT -> AudioFormat.Encoding.PCM_FLOAT;
        }, (float) format.sampleRateHz(), format.bitsPerSample(), 1, format.bytesPerSample(),
                (float) format.sampleRateHz(), false);
        AtomicFile.write(target, replace, out -> {
            try (AudioInputStream ais = new AudioInputStream(encoder, af, cleaned.size())) {
                AudioSystem.write(ais, AudioFileFormat.Type.WAVE, out);
            }
        });
        return new CleanedSignalReport(target, cleaned.size(), encoder.gaps, encoder.clipped, encoder.overFullScale);
    }

    /** Produces the little-endian sample bytes on demand, 4096 samples at a time. */
    private static final class Encoder extends InputStream {
        private static final int BLOCK = 4096;
        private final Series s;
        private final WavSampleFormat f;
        private final int width;
        private final ByteBuffer block;
        private int next;
        private int gaps;
        private long clipped;
        private long overFullScale;

        Encoder(Series s, WavSampleFormat f) {
            this.s = s;
            this.f = f;
            this.width = f.bytesPerSample();
            this.block = ByteBuffer.allocate(BLOCK * width).order(ByteOrder.LITTLE_ENDIAN);
            block.limit(0);
        }

        @Override
        public int read() throws IOException {
            byte[] one = new byte[1];
            return read(one, 0, 1) < 0 ? -1 : one[0] & 0xff;
        }

        @Override
        public int read(byte[] b, int off, int len) {
            if (!block.hasRemaining() && !fill()) {
                return -1;
            }
            int n = Math.min(len, block.remaining());
            block.get(b, off, n);
            return n;
        }

        private boolean fill() {
            if (next >= s.size()) {
                return false;
            }
            block.clear();
            int end = Math.min(s.size(), next + BLOCK);
            for (; next < end; next++) {
                double v = s.valueAt(next);
                if (Double.isNaN(v)) {
                    gaps++;
                    v = 0;
                }
                put(v);
            }
            block.flip();
            return true;
        }

        private void put(double v) {
            if (f.encoding() == WavEncoding.PCM_FLOAT) {
                if (v > 1 || v < -1) {
                    overFullScale++;
                }
                if (width == 4) {
                    block.putFloat((float) v);
                } else {
                    block.putDouble(v);
                }
                return;
            }
            int bits = f.bitsPerSample();
            long max = (1L << (bits - 1)) - 1;
            long min = -(1L << (bits - 1));
            double scaled = Math.rint(Math.scalb(v, bits - 1));
            long q;
            if (scaled > max) {
                q = max;
                clipped++;
            } else if (scaled < min) {
                q = min;
                clipped++;
            } else {
                q = (long) scaled;
            }
            if (f.encoding() == WavEncoding.PCM_UNSIGNED) {
                q += 1L << (bits - 1);
            }
            for (int k = 0; k < width; k++) {
                block.put((byte) (q >>> (8 * k)));
            }
        }
    }
}
