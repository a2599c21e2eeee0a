package org.phasewright.spectrum;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What a {@link Survey} found.
 *
 * @param spectrum    the amplitude spectrum (of the detrended record)
 * @param peaks       peaks, strongest first
 * @param fundamental the fundamental that explains the most peaks as harmonics, when the match is too good to
 *                    be chance (see {@link FundamentalSearch}); empty otherwise
 * @param topPeakFalseAlarmProbability Baluev (2008) false-alarm probability of the highest Lomb-Scargle
 *                    peak (empty for the FFT path)
 * @param notes       remarks in words (method chosen and why, detrending, why no fundamental, ...)
 * @param otherSeries further accepted fundamentals found among the peaks the first one leaves unexplained
 *                    (a second source, such as a musical note under mains hum), in order of evidence
 */
public record SurveyResult(Spectrum spectrum, List<Peak> peaks, Optional<FundamentalCandidate> fundamental,
                           OptionalDouble topPeakFalseAlarmProbability, List<SpectrumNote> notes,
                           List<FundamentalCandidate> otherSeries) {

    public SurveyResult {
        peaks = List.copyOf(peaks);
        notes = List.copyOf(notes);
        otherSeries = List.copyOf(otherSeries);
    }

    /** A result without further series. */
    public SurveyResult(Spectrum spectrum, List<Peak> peaks, Optional<FundamentalCandidate> fundamental,
                        OptionalDouble topPeakFalseAlarmProbability, List<SpectrumNote> notes) {
        this(spectrum, peaks, fundamental, topPeakFalseAlarmProbability, notes, List.of());
    }
}
