package org.phasewright.spectrum;

import java.util.List;

/**
 * A fundamental frequency that explains several peaks as its harmonics.
 *
 * @param frequencyHz            fundamental in hertz, the amplitude-squared weighted least-squares fit
 *                               {@code sum w h f / sum w h^2} over the matched peaks
 * @param explainedPowerFraction share of the peaks' total power (sum of amplitude^2) carried by matched peaks
 * @param harmonics              matched peaks by harmonic number
 * @param unexplained            peaks not matched to any harmonic
 * @param toleranceHz            matching tolerance used
 */
public record FundamentalCandidate(double frequencyHz, double explainedPowerFraction, List<HarmonicMatch> harmonics,
                                   List<Peak> unexplained, double toleranceHz) {

    public FundamentalCandidate {
        harmonics = List.copyOf(harmonics);
        unexplained = List.copyOf(unexplained);
    }

    /** The harmonic numbers explained, in increasing order. */
    public List<Integer> harmonicNumbers() {
        return harmonics.stream().map(HarmonicMatch::harmonic).sorted().toList();
    }
}
