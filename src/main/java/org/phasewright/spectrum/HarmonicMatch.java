package org.phasewright.spectrum;

/**
 * A peak explained as harmonic {@code harmonic} of a fundamental.
 *
 * @param harmonic  harmonic number (1 = the fundamental itself)
 * @param peak      the peak
 * @param offsetHz  peak frequency minus harmonic times the fundamental
 */
public record HarmonicMatch(int harmonic, Peak peak, double offsetHz) {
}
