package org.phasewright.spectrum;

/**
 * A spectral peak.
 *
 * @param frequencyHz    peak frequency in hertz: interpolated on the spectrum, then (by default, see
 *                       {@link Survey}) re-estimated jointly with the other peaks by least squares
 * @param amplitude      amplitude at that frequency (signal unit): read off the spectrum by a {@link ToneProbe},
 *                       or the joint least-squares amplitude when the peaks were re-estimated
 * @param snrDb          20 log10(amplitude / noiseAmplitude)
 * @param noiseAmplitude local noise level: the RMS amplitude a grid point would read from the noise
 *                       alone, estimated from the median of nearby grid amplitudes (see {@link PeakFinder}); of the
 *                       residual spectrum (the record minus all peaks and the trend) when the peaks were re-estimated
 * @param gridIndex      index of the grid maximum the peak was found at
 * @param frequencyStdErrorHz standard error of the frequency from the local noise level (the single-tone
 *                       Cramér-Rao bound, see {@link JointPeakFit#frequencyStdError}); NaN when not computed
 */
public record Peak(double frequencyHz, double amplitude, double snrDb, double noiseAmplitude, int gridIndex,
                   double frequencyStdErrorHz) {

    /** A peak without a frequency standard error. */
    public Peak(double frequencyHz, double amplitude, double snrDb, double noiseAmplitude, int gridIndex) {
        this(frequencyHz, amplitude, snrDb, noiseAmplitude, gridIndex, Double.NaN);
    }
}
