package org.phasewright.spectrum;

import java.util.ArrayList;
import java.util.List;

/**
 * A fundamental frequency that explains several peaks as its harmonics (see {@link FundamentalSearch}
 * for how it is found and judged).
 *
 * @param frequencyHz            fundamental in hertz: the weighted least-squares fit {@code sum h f / s^2 / sum h^2 / s^2}
 *                               over the matched peaks, s the standard error of each peak's frequency
 * @param explainedPowerFraction share of the peaks' total power (sum of amplitude^2) carried by matched peaks
 * @param harmonics              matched peaks by harmonic number
 * @param unexplained            peaks not matched to any harmonic, strongest first
 * @param toleranceHz            widest matching window (half-width) applied to a matched peak
 * @param frequencyStdErrorHz    standard error of the fundamental from that fit, {@code 1 / sqrt(sum h^2 / s^2)}
 * @param evidenceBits           how many bits shorter the description of the peak frequencies is with this
 *                               fundamental than with each peak on its own (see {@link FundamentalSearch})
 * @param chanceProbability      upper bound, {@code 2^-evidenceBits}, on the probability that peaks placed at
 *                               random would line up at least this well with some fundamental
 */
public record FundamentalCandidate(double frequencyHz, double explainedPowerFraction, List<HarmonicMatch> harmonics,
                                   List<Peak> unexplained, double toleranceHz, double frequencyStdErrorHz,
                                   double evidenceBits, double chanceProbability) {

    public FundamentalCandidate {
        harmonics = List.copyOf(harmonics);
        unexplained = List.copyOf(unexplained);
    }

    /** The harmonic numbers explained, in increasing order. */
    public List<Integer> harmonicNumbers() {
        return harmonics.stream().map(HarmonicMatch::harmonic).sorted().toList();
    }

    /** The highest harmonic number explained. */
    public int highestHarmonic() {
        return harmonics.stream().mapToInt(HarmonicMatch::harmonic).max().orElse(0);
    }

    /** Harmonic numbers from 1 to the highest explained that have no peak (e.g. the even ones of a hum). */
    public List<Integer> missingHarmonics() {
        List<Integer> found = harmonicNumbers();
        List<Integer> missing = new ArrayList<>();
        for (int k = 1; k <= highestHarmonic(); k++) {
            if (!found.contains(k)) {
                missing.add(k);
            }
        }
        return List.copyOf(missing);
    }
}
