package org.phasewright.spectrum;

/**
 * A peak explained as harmonic {@code harmonic} of a fundamental.
 *
 * @param harmonic    harmonic number (1 = the fundamental itself)
 * @param peak        the peak
 * @param offsetHz    peak frequency minus harmonic times the fundamental
 * @param toleranceHz half-width of the window around harmonic times the fundamental that the peak had to fall in
 */
public record HarmonicMatch(int harmonic, Peak peak, double offsetHz, double toleranceHz) {

    /** A match without a recorded tolerance. */
    public HarmonicMatch(int harmonic, Peak peak, double offsetHz) {
        this(harmonic, peak, offsetHz, Double.NaN);
    }
}
