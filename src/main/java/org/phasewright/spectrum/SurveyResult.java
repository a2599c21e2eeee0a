package org.phasewright.spectrum;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What a {@link Survey} found.
 *
 * @param spectrum    the amplitude spectrum
 * @param peaks       peaks, strongest first
 * @param fundamental a fundamental explaining several peaks as harmonics, if any
 * @param topPeakFalseAlarmProbability Baluev (2008) false-alarm probability of the highest Lomb-Scargle
 *                    peak (empty for the FFT path)
 * @param notes       remarks in words (method chosen and why, nothing found, ...)
 */
public record SurveyResult(Spectrum spectrum, List<Peak> peaks, Optional<FundamentalCandidate> fundamental,
                           OptionalDouble topPeakFalseAlarmProbability, List<SpectrumNote> notes) {

    public SurveyResult {
        peaks = List.copyOf(peaks);
        notes = List.copyOf(notes);
    }
}
