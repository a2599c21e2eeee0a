package org.phasewright.spectrum;

/**
 * Options of {@link Survey}.
 *
 * @param method           which periodogram: AUTO chooses FFT for complete uniform records, Lomb-Scargle otherwise
 * @param periodogram      FFT options (window, zero padding)
 * @param lombScargle      Lomb-Scargle options (oversampling, maximum frequency)
 * @param peaks            peak-search options
 * @param harmonicToleranceHz tolerance for matching peaks to harmonics; NaN derives it from each peak's frequency
 *                         standard error (see {@link FundamentalSearch})
 * @param maxDivisor       highest divisor tried when looking for a fundamental below the strongest peaks
 * @param detrendDegree    degree of the least-squares polynomial removed before the periodogram and fitted with
 *                         the peaks (-1: none, only the mean; default 2)
 * @param refinePeaks      re-estimate the peaks' frequencies and amplitudes jointly by least squares
 *                         ({@link JointPeakFit}) before looking for a fundamental
 * @param maxChanceProbability a fundamental is suggested only when peaks placed at random would line up as
 *                         well with probability at most this (default 0.01)
 */
public record SurveyOptions(Method method, PeriodogramOptions periodogram, LombScargleOptions lombScargle,
                            PeakOptions peaks, double harmonicToleranceHz, int maxDivisor, int detrendDegree,
                            boolean refinePeaks, double maxChanceProbability) {

    /** Periodogram choice. */
    public enum Method { AUTO, FFT, LOMB_SCARGLE }

    public SurveyOptions {
        if (method == null || periodogram == null || lombScargle == null || peaks == null) {
            throw new IllegalArgumentException("survey options must all be given");
        }
        if (maxDivisor < 1) {
            throw new IllegalArgumentException("divisor limit must be at least 1, got " + maxDivisor);
        }
        if (detrendDegree < -1 || detrendDegree > 5) {
            throw new IllegalArgumentException("detrend degree must be between -1 (none) and 5, got " + detrendDegree);
        }
        if (!(maxChanceProbability > 0 && maxChanceProbability <= 1)) {
            throw new IllegalArgumentException("the chance probability limit must be in (0, 1], got " + maxChanceProbability);
        }
        if (!Double.isNaN(harmonicToleranceHz) && !(harmonicToleranceHz > 0)) {
            throw new IllegalArgumentException("harmonic tolerance must be positive hertz, got " + harmonicToleranceHz);
        }
    }

    /** The options of earlier versions: quadratic detrend, joint peak refinement, chance limit 0.01. */
    public SurveyOptions(Method method, PeriodogramOptions periodogram, LombScargleOptions lombScargle,
                         PeakOptions peaks, double harmonicToleranceHz, int maxDivisor) {
        this(method, periodogram, lombScargle, peaks, harmonicToleranceHz, maxDivisor, 2, true, 0.01);
    }

    public static SurveyOptions defaults() {
        return new SurveyOptions(Method.AUTO, PeriodogramOptions.defaults(), LombScargleOptions.defaults(),
                PeakOptions.defaults(), Double.NaN, 8, 2, true, 0.01);
    }

    public SurveyOptions withMethod(Method m) {
        return new SurveyOptions(m, periodogram, lombScargle, peaks, harmonicToleranceHz, maxDivisor, detrendDegree,
                refinePeaks, maxChanceProbability);
    }

    public SurveyOptions withPeriodogram(PeriodogramOptions p) {
        return new SurveyOptions(method, p, lombScargle, peaks, harmonicToleranceHz, maxDivisor, detrendDegree,
                refinePeaks, maxChanceProbability);
    }

    public SurveyOptions withLombScargle(LombScargleOptions l) {
        return new SurveyOptions(method, periodogram, l, peaks, harmonicToleranceHz, maxDivisor, detrendDegree,
                refinePeaks, maxChanceProbability);
    }

    public SurveyOptions withPeaks(PeakOptions p) {
        return new SurveyOptions(method, periodogram, lombScargle, p, harmonicToleranceHz, maxDivisor, detrendDegree,
                refinePeaks, maxChanceProbability);
    }

    public SurveyOptions withHarmonicTolerance(double hz) {
        return new SurveyOptions(method, periodogram, lombScargle, peaks, hz, maxDivisor, detrendDegree, refinePeaks,
                maxChanceProbability);
    }

    public SurveyOptions withMaxDivisor(int d) {
        return new SurveyOptions(method, periodogram, lombScargle, peaks, harmonicToleranceHz, d, detrendDegree,
                refinePeaks, maxChanceProbability);
    }

    public SurveyOptions withDetrendDegree(int degree) {
        return new SurveyOptions(method, periodogram, lombScargle, peaks, harmonicToleranceHz, maxDivisor, degree,
                refinePeaks, maxChanceProbability);
    }

    public SurveyOptions withRefinePeaks(boolean refine) {
        return new SurveyOptions(method, periodogram, lombScargle, peaks, harmonicToleranceHz, maxDivisor, detrendDegree,
                refine, maxChanceProbability);
    }

    public SurveyOptions withMaxChanceProbability(double p) {
        return new SurveyOptions(method, periodogram, lombScargle, peaks, harmonicToleranceHz, maxDivisor, detrendDegree,
                refinePeaks, p);
    }
}
