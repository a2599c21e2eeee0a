package org.phasewright.spectrum;

/**
 * Options of the peak search.
 *
 * @param maxPeaks            most peaks returned (strongest first)
 * @param minSnrDb            peaks below this signal-to-noise ratio are dropped
 * @param noiseHalfWidthBins  half-width, in resolution bins 1/T, of the band whose median gives the local noise
 * @param leakageMarginDb     a peak is kept only if it stands this far above the leakage predicted from
 *                            the stronger peaks through the window (or spectral window) response
 * @param minCycles           peaks below {@code minCycles / T} are not reported: with fewer than about two
 *                            cycles in the record a sinusoid cannot be told from a trend (0 keeps them)
 */
public record PeakOptions(int maxPeaks, double minSnrDb, double noiseHalfWidthBins, double leakageMarginDb,
                          double minCycles) {

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
        if (!(minCycles >= 0) || Double.isInfinite(minCycles)) {
            throw new IllegalArgumentException("the minimum number of cycles must be finite and >= 0, got " + minCycles);
        }
    }

    /** Options without the low-frequency limit (kept for callers of the four-argument form). */
    public PeakOptions(int maxPeaks, double minSnrDb, double noiseHalfWidthBins, double leakageMarginDb) {
        this(maxPeaks, minSnrDb, noiseHalfWidthBins, leakageMarginDb, 0);
    }

    /** 20 peaks, 10 dB SNR, noise from +-50 bins, 6 dB above predicted leakage, at least 2 cycles in the record. */
    public static PeakOptions defaults() {
        return new PeakOptions(20, 10, 50, 6, 2);
    }

    public PeakOptions withMaxPeaks(int m) {
        return new PeakOptions(m, minSnrDb, noiseHalfWidthBins, leakageMarginDb, minCycles);
    }

    public PeakOptions withMinSnrDb(double db) {
        return new PeakOptions(maxPeaks, db, noiseHalfWidthBins, leakageMarginDb, minCycles);
    }

    public PeakOptions withMinCycles(double cycles) {
        return new PeakOptions(maxPeaks, minSnrDb, noiseHalfWidthBins, leakageMarginDb, cycles);
    }
}
