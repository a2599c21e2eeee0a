package org.phasewright.spectrum;

/**
 * An amplitude spectrum on a frequency grid, scaled so that a pure tone of amplitude A reads A at
 * its peak (after the window's coherent-gain correction).
 *
 * @param method            "fft" (uniform sampling, {@link Periodogram}) or "lomb_scargle"
 *                          ({@link LombScargle})
 * @param window            the data window (always {@link Window#RECTANGULAR} for Lomb-Scargle)
 * @param frequencyHz       grid frequencies in hertz, increasing
 * @param amplitude         amplitude in the signal's unit at each grid frequency
 * @param gridStepHz        spacing of the grid in hertz (finer than the resolution when zero padded
 *                          or oversampled)
 * @param resolutionHz      Rayleigh resolution 1/T in hertz, T the record length
 * @param noiseBandwidthBins equivalent noise bandwidth of the window in resolution bins
 * @param samples           number of observed samples used
 * @param recordSeconds     record length T in seconds
 */
public record Spectrum(String method, Window window, double[] frequencyHz, double[] amplitude,
                       double gridStepHz, double resolutionHz, double noiseBandwidthBins,
                       int samples, double recordSeconds) {

    public Spectrum {
        if (frequencyHz.length != amplitude.length) {
            throw new IllegalArgumentException("frequency and amplitude arrays differ in length");
        }
        frequencyHz = frequencyHz.clone();
        amplitude = amplitude.clone();
    }

    @Override
    public double[] frequencyHz() {
        return frequencyHz.clone();
    }

    @Override
    public double[] amplitude() {
        return amplitude.clone();
    }

    /** Number of grid points. */
    public int size() {
        return frequencyHz.length;
    }

    public double frequencyAt(int k) {
        return frequencyHz[k];
    }

    public double amplitudeAt(int k) {
        return amplitude[k];
    }

    /** Index of the largest amplitude, skipping index 0 (the zero frequency) when there are others. */
    public int argMax() {
        int best = frequencyHz.length > 1 && frequencyHz[0] == 0 ? 1 : 0;
        for (int k = best + 1; k < amplitude.length; k++) {
            if (amplitude[k] > amplitude[best]) {
                best = k;
            }
        }
        return best;
    }
}
