package org.phasewright.spectrum;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Finds a fundamental that explains most peaks as harmonics: a harmonic sum over the peak list.
 *
 * <p>Method (common practice for harmonic-sum pitch estimation): trial fundamentals are
 * {@code f_p / h} for each of the strongest peaks p and divisors h = 1..{@code maxDivisor}. For a
 * trial f0, each peak is matched to the nearest harmonic {@code h = round(f / f0)} when
 * {@code |f - h f0| <= tolerance}; at most one peak per harmonic (the strongest). f0 is then
 * re-estimated by amplitude-squared weighted least squares {@code sum w h f / sum w h^2} and the
 * peaks re-matched (two passes). The score is the share of the peaks' power the matches carry.
 * Trials so low that a peak placed at random would fall within the tolerance of some harmonic with
 * probability {@code 2 tol / f0} above 0.1 are not considered (they "explain" peaks by chance).
 * Among trials explaining at least two peaks, the highest fundamental whose score is at least 0.9
 * of the best is chosen, which rejects sub-harmonics (f0/2 explains everything f0 does).
 * Cost: O(P^2 D) for P peaks and D divisors.
 */
public final class FundamentalSearch {

    private static final int STRONGEST = 6;
    private static final double SCORE_SHARE = 0.9;
    private static final double MAX_CHANCE = 0.1;

    private FundamentalSearch() {
    }

    /**
     * The best candidate, or empty when no fundamental explains two or more peaks.
     *
     * @param toleranceHz matching tolerance in hertz (e.g. the resolution 1/T)
     * @param minFundamentalHz trial fundamentals below this are ignored (e.g. 2/T)
     */
    public static Optional<FundamentalCandidate> find(List<Peak> peaks, double toleranceHz, double minFundamentalHz,
                                                      int maxDivisor) {
        if (peaks.size() < 2) {
            return Optional.empty();
        }
        if (!(toleranceHz > 0)) {
            throw new IllegalArgumentException("harmonic tolerance must be positive hertz, got " + toleranceHz);
        }
        List<Peak> strongest = peaks.stream().sorted(Comparator.comparingDouble(Peak::amplitude).reversed())
                .limit(STRONGEST).toList();
        double totalPower = 0;
        for (Peak p : peaks) {
            totalPower += p.amplitude() * p.amplitude();
        }
        List<FundamentalCandidate> trials = new ArrayList<>();
        for (Peak p : strongest) {
            for (int h = 1; h <= maxDivisor; h++) {
                double f0 = p.frequencyHz() / h;
                if (f0 < minFundamentalHz || 2 * toleranceHz / f0 > MAX_CHANCE) {
                    break;
                }
                FundamentalCandidate c = match(peaks, f0, toleranceHz, totalPower);
                c = match(peaks, c.frequencyHz(), toleranceHz, totalPower);
                if (c.harmonics().size() >= 2) {
                    trials.add(c);
                }
            }
        }
        if (trials.isEmpty()) {
            return Optional.empty();
        }
        double best = trials.stream().mapToDouble(FundamentalCandidate::explainedPowerFraction).max().orElse(0);
        return trials.stream().filter(c -> c.explainedPowerFraction() >= SCORE_SHARE * best)
                .max(Comparator.comparingDouble(FundamentalCandidate::frequencyHz));
    }

    private static FundamentalCandidate match(List<Peak> peaks, double f0, double tol, double totalPower) {
        Map<Integer, Peak> byHarmonic = new HashMap<>();
        for (Peak p : peaks) {
            int h = (int) Math.round(p.frequencyHz() / f0);
            if (h < 1 || Math.abs(p.frequencyHz() - h * f0) > tol) {
                continue;
            }
            Peak old = byHarmonic.get(h);
            if (old == null || p.amplitude() > old.amplitude()) {
                byHarmonic.put(h, p);
            }
        }
        double num = 0;
        double den = 0;
        double explained = 0;
        for (Map.Entry<Integer, Peak> e : byHarmonic.entrySet()) {
            double w = e.getValue().amplitude() * e.getValue().amplitude();
            num += w * e.getKey() * e.getValue().frequencyHz();
            den += w * e.getKey() * e.getKey();
            explained += w;
        }
        double fit = den > 0 ? num / den : f0;
        List<HarmonicMatch> matches = new ArrayList<>();
        List<Peak> rest = new ArrayList<>();
        for (Peak p : peaks) {
            int h = (int) Math.round(p.frequencyHz() / f0);
            if (h >= 1 && byHarmonic.get(h) == p) {
                matches.add(new HarmonicMatch(h, p, p.frequencyHz() - h * fit));
            } else {
                rest.add(p);
            }
        }
        matches.sort(Comparator.comparingInt(HarmonicMatch::harmonic));
        return new FundamentalCandidate(fit, totalPower > 0 ? explained / totalPower : 0, matches, rest, tol);
    }
}
