package org.phasewright.io.read;

import org.phasewright.series.Series;

/**
 * A WAV file read whole: the selected channel (or channel mean) as a uniform {@link Series} in
 * full-scale units, the header information, and how many samples lay outside [-1, 1] (possible
 * only for floating-point files; reported, never altered).
 */
public record WavData(Series series, WavInfo info, long overFullScale) {
}
