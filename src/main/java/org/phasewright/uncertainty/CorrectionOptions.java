package org.phasewright.uncertainty;

/**
 * Options of {@link SeCorrection}.
 *
 * @param method         which standard errors
 * @param maxArOrder     highest AR order tried for {@link SeMethod#AR_NOISE} (the order is chosen by AIC)
 * @param bandHalfWidthBins half-width in resolution bins 1/T of the band used by {@link SeMethod#LOCAL_SPECTRUM}
 */
public record CorrectionOptions(SeMethod method, int maxArOrder, int bandHalfWidthBins) {

    public CorrectionOptions {
        if (method == null) {
            throw new IllegalArgumentException("a standard-error method must be given");
        }
        if (maxArOrder < 1 || maxArOrder > 50) {
            throw new IllegalArgumentException("AR order limit must be between 1 and 50, got " + maxArOrder);
        }
        if (bandHalfWidthBins < 3) {
            throw new IllegalArgumentException("local band half-width must be at least 3 bins, got " + bandHalfWidthBins);
        }
    }

    public static CorrectionOptions of(SeMethod method) {
        return new CorrectionOptions(method, 5, 12);
    }

    public CorrectionOptions withMaxArOrder(int p) {
        return new CorrectionOptions(method, p, bandHalfWidthBins);
    }
}
