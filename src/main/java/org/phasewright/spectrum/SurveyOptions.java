package org.phasewright.spectrum;

/**
 * Options of {@link Survey}.
 *
 * @param method           which periodogram: AUTO chooses FFT for complete uniform records, Lomb-Scargle otherwise
 * @param periodogram      FFT options (window, zero padding)
 * @param lombScargle      Lomb-Scargle options (oversampling, maximum frequency)
 * @param peaks            peak-search options
 * @param harmonicToleranceHz tolerance for matching peaks to harmonics; NaN means the resolution 1/T
 * @param maxDivisor       highest divisor tried when looking for a fundamental below the strongest peaks
 */
public record SurveyOptions(Method method, PeriodogramOptions periodogram, LombScargleOptions lombScargle,
                            PeakOptions peaks, double harmonicToleranceHz, int maxDivisor) {

    /** Periodogram choice. */
    public enum Method { AUTO, FFT, LOMB_SCARGLE }

    public SurveyOptions {
        if (method == null || periodogram == null || lombScargle == null || peaks == null) {
            throw new IllegalArgumentException("survey options must all be given");
        }
        if (maxDivisor < 1) {
            throw new IllegalArgumentException("divisor limit must be at least 1, got " + maxDivisor);
        }
    }

    public static SurveyOptions defaults() {
        return new SurveyOptions(Method.AUTO, PeriodogramOptions.defaults(), LombScargleOptions.defaults(),
                PeakOptions.defaults(), Double.NaN, 8);
    }

    public SurveyOptions withMethod(Method m) {
        return new SurveyOptions(m, periodogram, lombScargle, peaks, harmonicToleranceHz, maxDivisor);
    }

    public SurveyOptions withPeriodogram(PeriodogramOptions p) {
        return new SurveyOptions(method, p, lombScargle, peaks, harmonicToleranceHz, maxDivisor);
    }

    public SurveyOptions withLombScargle(LombScargleOptions l) {
        return new SurveyOptions(method, periodogram, l, peaks, harmonicToleranceHz, maxDivisor);
    }

    public SurveyOptions withPeaks(PeakOptions p) {
        return new SurveyOptions(method, periodogram, lombScargle, p, harmonicToleranceHz, maxDivisor);
    }

    public SurveyOptions withHarmonicTolerance(double hz) {
        return new SurveyOptions(method, periodogram, lombScargle, peaks, hz, maxDivisor);
    }
}
