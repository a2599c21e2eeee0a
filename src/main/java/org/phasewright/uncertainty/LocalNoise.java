package org.phasewright.uncertainty;

/**
 * The residual noise level near one sinusoid's frequency.
 *
 * @param label        the sinusoid (or harmonic) label
 * @param frequencyHz  its frequency
 * @param densityRatio mean residual periodogram in the band around the frequency over the residual
 *                     variance: 1 for white noise, above 1 where coloured noise is stronger than average
 * @param binsUsed     periodogram ordinates averaged
 */
public record LocalNoise(String label, double frequencyHz, double densityRatio, int binsUsed) {
}
