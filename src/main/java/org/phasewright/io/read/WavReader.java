package org.phasewright.io.read;

import static org.phasewright.io.InputException.Kind;

import java.nio.file.Path;
import org.phasewright.io.InputException;
import org.phasewright.series.Series;

/**
 * Reads a whole WAV file into a uniform {@link Series} (times {@code i / rate}, values in
 * full-scale units, unit "FS"), through {@link WavBlockReader}. The one array allocated has the
 * length the header declares, which has been checked against the file's size first. Records
 * longer than {@code Integer.MAX_VALUE - 8} frames must be streamed with the block reader.
 * Cost: O(frames x channels) time, 8 bytes per frame of memory.
 */
public final class WavReader {

    private WavReader() {
    }

    public static WavData read(Path file) {
        return read(file, WavReadOptions.defaults());
    }

    public static WavData read(Path file, WavReadOptions options) {
        try (WavBlockReader reader = WavBlockReader.open(file, options)) {
            WavInfo info = reader.info();
            if (info.frames() > Integer.MAX_VALUE - 8) {
                throw InputException.inFile(Kind.BAD_OPTION, file, info.frames()
                        + " frames are too many to hold in memory at once; read the file in blocks");
            }
            if (info.frames() < 2) {
                throw InputException.inFile(Kind.TOO_FEW_SAMPLES, file, "the file holds a single frame; at least two are needed");
            }
            double[] values = new double[(int) info.frames()];
            int at = 0;
            int n;
            while ((n = reader.read(values, at, values.length - at)) > 0) {
                at += n;
            }
            long over = 0;
            for (double v : values) {
                if (v > 1 || v < -1) {
                    over++;
                }
            }
            String stem = file.getFileName().toString().replaceFirst("\\.[^.]*$", "");
            String name = info.channels() == 1 ? stem
                    : stem + (options.averages() ? " mean" : " ch" + options.channel());
            Series s = Series.builder().uniform(0, info.sampleRateHz(), values).name(name).unit("FS").build();
            return new WavData(s, info, over);
        }
    }
}
