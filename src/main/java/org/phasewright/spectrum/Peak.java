package org.phasewright.spectrum;

/**
 * A spectral peak.
 *
 * @param frequencyHz    interpolated peak frequency in hertz
 * @param amplitude      amplitude at that frequency (signal unit), read off the grid by a {@link ToneProbe}
 * @param snrDb          20 log10(amplitude / noiseAmplitude)
 * @param noiseAmplitude local noise level: the RMS amplitude a grid point would read from the noise
 *                       alone, estimated from the median of nearby grid amplitudes (see {@link PeakFinder})
 * @param gridIndex      index of the grid maximum the peak was found at
 */
public record Peak(double frequencyHz, double amplitude, double snrDb, double noiseAmplitude, int gridIndex) {
}
