package org.phasewright.spectrum;

/**
 * Options of the peak search.
 *
 * @param maxPeaks            most peaks returned (strongest first)
 * @param minSnrDb            peaks below this signal-to-noise ratio are dropped
 * @param noiseHalfWidthBins  half-width, in resolution bins 1/T, of the band whose median gives the local noise
 * @param leakageMarginDb     a peak is kept only if it stands this far above the leakage predicted from
 *                            the stronger peaks through the window (or spectral window) response
 */
public record PeakOptions(int maxPeaks, double minSnrDb, double noiseHalfWidthBins, double leakageMarginDb) {

    public PeakOptions {
        if (maxPeaks < 1) {
            throw new IllegalArgumentException("the number of peaks must be at least 1, got " + maxPeaks);
        }
        if (!(noiseHalfWidthBins >= 2)) {
            throw new IllegalArgumentException("the noise band half-width must be at least 2 bins, got " + noiseHalfWidthBins);
        }
        if (!Double.isFinite(minSnrDb) || !(leakageMarginDb >= 0)) {
            throw new IllegalArgumentException("SNR threshold must be finite and leakage margin >= 0 dB");
        }
    }

    /** 20 peaks, 10 dB SNR, noise from +-50 bins, 6 dB above predicted leakage. */
    public static PeakOptions defaults() {
        return new PeakOptions(20, 10, 50, 6);
    }

    public PeakOptions withMaxPeaks(int m) {
        return new PeakOptions(m, minSnrDb, noiseHalfWidthBins, leakageMarginDb);
    }

    public PeakOptions withMinSnrDb(double db) {
        return new PeakOptions(maxPeaks, db, noiseHalfWidthBins, leakageMarginDb);
    }
}
