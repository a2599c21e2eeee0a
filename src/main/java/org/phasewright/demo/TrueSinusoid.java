package org.phasewright.demo;

/**
 * One periodic component a demo signal was made from: {@code amplitude * cos(2 pi f t - phase)},
 * with t in seconds from the first sample of the file (the series' time zero).
 *
 * @param label       a short name used in the demo README and in test messages
 * @param frequencyHz frequency in hertz
 * @param amplitude   amplitude in the unit of the signal column
 * @param phaseDeg    phase in degrees in (-180, 180], in the engine's convention x = A cos(2 pi f t - phi)
 */
public record TrueSinusoid(String label, double frequencyHz, double amplitude, double phaseDeg) {
}
