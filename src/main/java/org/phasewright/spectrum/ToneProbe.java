package org.phasewright.spectrum;

/**
 * Evaluates the amplitude of the best-fitting single tone at an arbitrary frequency, off the grid
 * of a {@link Spectrum}. Used to read amplitudes at interpolated peak frequencies and to predict
 * leakage. Implementations cost O(n) per call.
 */
@FunctionalInterface
public interface ToneProbe {

    /** Amplitude (signal unit) of a tone at {@code frequencyHz}, on the same scale as the spectrum. */
    double amplitudeAt(double frequencyHz);
}
