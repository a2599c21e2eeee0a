package org.phasewright.spectrum;

/**
 * Options of the generalised Lomb-Scargle periodogram.
 *
 * @param oversampling   grid points per Rayleigh resolution 1/T (default 5)
 * @param maxFrequencyHz highest frequency of the grid; NaN chooses the pseudo-Nyquist frequency
 *                       1 / (2 median spacing)
 */
public record LombScargleOptions(double oversampling, double maxFrequencyHz) {

    public LombScargleOptions {
        if (!(oversampling >= 1 && oversampling <= 100)) {
            throw new IllegalArgumentException("oversampling must be between 1 and 100 grid points per resolution, got " + oversampling);
        }
        if (!Double.isNaN(maxFrequencyHz) && !(maxFrequencyHz > 0)) {
            throw new IllegalArgumentException("maximum frequency must be positive hertz, got " + maxFrequencyHz);
        }
    }

    public static LombScargleOptions defaults() {
        return new LombScargleOptions(5, Double.NaN);
    }

    public LombScargleOptions withOversampling(double o) {
        return new LombScargleOptions(o, maxFrequencyHz);
    }

    public LombScargleOptions withMaxFrequency(double hz) {
        return new LombScargleOptions(oversampling, hz);
    }
}
