package org.phasewright.io.write;

import java.nio.file.Path;

/**
 * What writing a cleaned signal did.
 *
 * @param file          the file written
 * @param samples       samples written
 * @param gaps          gap samples (empty cells in CSV; written as 0 in WAV, which has no gaps)
 * @param clipped       samples beyond the integer format's range, written at the nearest limit
 * @param overFullScale samples outside [-1, 1] written unchanged to a floating-point WAV
 */
public record CleanedSignalReport(Path file, int samples, int gaps, long clipped, long overFullScale) {

    /** A sentence for front ends; empty when nothing needs saying. */
    public String notice() {
        StringBuilder sb = new StringBuilder();
        if (clipped > 0) {
            sb.append(clipped).append(" of ").append(samples).append(" samples exceeded full scale and were clipped");
        }
        if (overFullScale > 0) {
            sb.append(sb.length() > 0 ? "; " : "").append(overFullScale).append(" of ").append(samples)
                    .append(" samples lie outside [-1, 1] (kept; players may clip them)");
        }
        if (gaps > 0) {
            sb.append(sb.length() > 0 ? "; " : "").append(gaps).append(" gap samples");
        }
        return sb.toString();
    }
}
