package org.phasewright.spectrum;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Finds fundamentals that explain peaks as their harmonics, and accepts one only when the peaks line
 * up too well to be chance: a harmonic comb over the peak list, judged by description length.
 *
 * <p><b>Trials.</b> Every peak p and divisor h = 1..{@code maxDivisor} give a trial fundamental
 * {@code f_p / h} (so a missing fundamental is found from its harmonics, as in the subharmonic summation
 * of D. J. Hermes, 1988, "Measurement of pitch by subharmonic summation", J. Acoust. Soc. Am. 83, 257,
 * here on the peak list rather than on the spectrum). A peak at f is matched to harmonic
 * {@code k = round(f / f0)} when it lies within the window {@code |f - k f0| <= tol}, with
 * {@code tol = max(3 sqrt(s^2 + k^2 var(f0)), 0.05 / T)} from the peak's frequency standard error s
 * ({@link Peak#frequencyStdErrorHz()}) and the fundamental's, or a fixed tolerance if one is given. At most
 * one peak per harmonic (the nearest, relative to its window). The fundamental is then refitted by
 * weighted least squares, {@code f0 = sum (k f / s^2) / sum (k^2 / s^2)}, and the peaks matched again,
 * until the set of matches stops changing.
 *
 * <p><b>Score: description length.</b> The evidence for a fundamental is how many bits it saves in
 * describing the peak frequencies, compared with describing every peak on its own (the minimum
 * description length principle; P. Grünwald, 2007, The Minimum Description Length Principle, MIT
 * Press). On its own, a peak costs {@code L = log2(B / (2 tol))} bits: which of the windows of width
 * 2 tol in the searched band B it falls in. With a fundamental, one matched peak (the anchor) is
 * described as before, plus its harmonic number h and the highest harmonic H (each a whole number
 * coded in {@code log2((m + 1)(m + 2))} bits for m = h - 1 and m = H - h), plus one bit for each other
 * harmonic from 1 to H saying whether it has a peak; every other matched peak then costs nothing,
 * since its frequency follows from the fundamental. So
 * {@code evidence = sum over matched peaks of L, minus the anchor's L and the cost of h, H and the
 * presence bits}, with the anchor chosen to make it largest. This is a comb score in which each
 * expected harmonic without a peak costs a bit: a sub-harmonic f0/2 explains the same peaks as f0 but
 * needs about H more bits, and a low fundamental that reaches the peaks only as harmonics 5, 15, 25,
 * 44 and 88 pays for the 80-odd empty harmonics in between.
 *
 * <p><b>Acceptance.</b> By the no-hypercompression inequality (Grünwald 2007, section 3.3), peaks
 * placed independently and uniformly at random over the band save {@code b} bits or more with
 * probability at most {@code 2^-b}; a fundamental is accepted only when {@code 2^-evidence} is at most
 * {@code maxChanceProbability} (default 0.01, i.e. 6.6 bits). Since the trial fundamentals are part of
 * the description, this already pays for having tried them all. A fundamental must also be supported
 * at low harmonics: its lowest matched harmonic is 1, 2 or 3 (a fundamental first seen at its 4th or
 * higher harmonic rests on a coincidence of high harmonics; common practice in pitch estimation), and
 * it must lie at or above {@code minFundamentalHz} (two cycles in the record).
 *
 * <p><b>Choice.</b> The accepted fundamental with the largest evidence wins; among those within one bit
 * of it, the one with the fewest harmonics (then the highest fundamental) is taken, the simplest
 * explanation. {@link #series} then repeats the search on the peaks left unexplained, which finds a
 * second source (a musical note under mains hum) when there is one.
 *
 * <p>Cost: O(P^2 D) per search for P peaks and D divisors (a few passes per trial).
 */
public final class FundamentalSearch {

    /** Frequency windows are this many standard errors wide on each side. */
    static final double SIGMA_WINDOW = 3;
    /** The narrowest window, in resolution bins 1/T (for peaks whose standard error is tiny). */
    static final double FLOOR_BINS = 0.05;
    /** The lowest matched harmonic may be at most this. */
    static final int MAX_LOWEST_HARMONIC = 3;
    /** Candidates within this many bits of the best count as equally good; the simplest is chosen. */
    static final double TIE_BITS = 1;
    private static final int MAX_SERIES = 4;
    private static final int PASSES = 6;

    private FundamentalSearch() {
    }

    /**
     * What the search looks at and how strict it is.
     *
     * @param bandLowHz            lowest frequency a peak could have been reported at
     * @param bandHighHz           highest frequency of the spectrum (the band peaks are assumed spread over by chance)
     * @param resolutionHz         resolution 1/T of the record
     * @param fixedToleranceHz     matching window half-width in hertz for every peak; NaN derives it from
     *                             each peak's frequency standard error (see the class comment)
     * @param minFundamentalHz     trial fundamentals below this are ignored (e.g. 2/T)
     * @param maxDivisor           highest divisor h of a peak's frequency tried as a fundamental
     * @param maxChanceProbability a fundamental is accepted only if 2^-evidence is at most this
     */
    public record Criteria(double bandLowHz, double bandHighHz, double resolutionHz, double fixedToleranceHz,
                           double minFundamentalHz, int maxDivisor, double maxChanceProbability) {

        public Criteria {
            if (!(bandHighHz > bandLowHz) || !(bandLowHz >= 0) || !(resolutionHz > 0)) {
                throw new IllegalArgumentException("the band must be 0 <= low < high hertz and the resolution positive");
            }
            if (!Double.isNaN(fixedToleranceHz) && !(fixedToleranceHz > 0)) {
                throw new IllegalArgumentException("harmonic tolerance must be positive hertz, got " + fixedToleranceHz);
            }
            if (maxDivisor < 1) {
                throw new IllegalArgumentException("divisor limit must be at least 1, got " + maxDivisor);
            }
            if (!(maxChanceProbability > 0 && maxChanceProbability <= 1)) {
                throw new IllegalArgumentException("the chance probability limit must be in (0, 1], got " + maxChanceProbability);
            }
        }
    }

    /**
     * What the search found: the accepted fundamentals (first the one that explains most, then those found
     * among the peaks it leaves) and, when none was accepted, the best candidate that was turned down.
     */
    public record Outcome(List<FundamentalCandidate> series, Optional<FundamentalCandidate> bestRejected) {
        public Outcome {
            series = List.copyOf(series);
        }

        /** The first accepted fundamental, if any. */
        public Optional<FundamentalCandidate> best() {
            return series.isEmpty() ? Optional.empty() : Optional.of(series.get(0));
        }
    }

    /** The best accepted fundamental, or empty. */
    public static Optional<FundamentalCandidate> find(List<Peak> peaks, Criteria criteria) {
        return series(peaks, criteria).best();
    }

    /** Accepted fundamentals, one after another on the peaks left unexplained, and the best rejected one. */
    public static Outcome series(List<Peak> peaks, Criteria criteria) {
        List<FundamentalCandidate> found = new ArrayList<>();
        List<Peak> left = new ArrayList<>(peaks);
        Optional<FundamentalCandidate> rejected = Optional.empty();
        double total = power(peaks);
        while (found.size() < MAX_SERIES && left.size() >= 2) {
            Optional<FundamentalCandidate> best = bestOf(left, peaks, total, criteria);
            if (best.isEmpty()) {
                break;
            }
            FundamentalCandidate c = best.get();
            if (c.chanceProbability() > criteria.maxChanceProbability()) {
                if (found.isEmpty()) {
                    rejected = best;
                }
                break;
            }
            found.add(c);
            for (HarmonicMatch m : c.harmonics()) {
                left.remove(m.peak());
            }
        }
        return new Outcome(found, rejected);
    }

    private static Optional<FundamentalCandidate> bestOf(List<Peak> pool, List<Peak> all, double total, Criteria cr) {
        List<FundamentalCandidate> trials = new ArrayList<>();
        for (Peak p : pool) {
            for (int h = 1; h <= cr.maxDivisor(); h++) {
                double f0 = p.frequencyHz() / h;
                if (f0 < cr.minFundamentalHz()) {
                    break;
                }
                double sd = sigma(p, cr) / h;
                trial(pool, all, total, f0, sd * sd, cr).ifPresent(trials::add);
            }
        }
        if (trials.isEmpty()) {
            return Optional.empty();
        }
        double top = trials.stream().mapToDouble(FundamentalCandidate::evidenceBits).max().orElseThrow();
        return trials.stream().filter(c -> c.evidenceBits() >= top - TIE_BITS)
                .min(Comparator.comparingInt(FundamentalCandidate::highestHarmonic)
                        .thenComparing(Comparator.comparingDouble(FundamentalCandidate::frequencyHz).reversed()));
    }

    /** Match, refit and rematch from a trial fundamental; empty when it explains fewer than two peaks or fails a rule. */
    private static Optional<FundamentalCandidate> trial(List<Peak> pool, List<Peak> all, double total, double f0,
                                                        double varF0, Criteria cr) {
        Map<Integer, Peak> matches = Map.of();
        double f = f0;
        double v = varF0;
        for (int pass = 0; pass < PASSES; pass++) {
            Map<Integer, Peak> next = match(pool, f, v, cr);
            if (next.size() < 2) {
                return Optional.empty();
            }
            double num = 0;
            double den = 0;
            for (Map.Entry<Integer, Peak> e : next.entrySet()) {
                double s = sigma(e.getValue(), cr);
                double wt = 1 / (s * s);
                num += wt * e.getKey() * e.getValue().frequencyHz();
                den += wt * e.getKey() * e.getKey();
            }
            double fitted = num / den;
            double fittedVar = 1 / den;
            boolean same = next.equals(matches);
            matches = next;
            f = fitted;
            v = fittedVar;
            if (same) {
                break;
            }
        }
        int lowest = matches.keySet().stream().mapToInt(Integer::intValue).min().orElseThrow();
        if (lowest > MAX_LOWEST_HARMONIC || f < cr.minFundamentalHz()) {
            return Optional.empty();
        }
        return Optional.of(candidate(matches, all, total, f, v, cr));
    }

    private static Map<Integer, Peak> match(List<Peak> pool, double f0, double varF0, Criteria cr) {
        Map<Integer, Peak> best = new HashMap<>();
        Map<Integer, Double> closeness = new HashMap<>();
        for (Peak p : pool) {
            long k = Math.round(p.frequencyHz() / f0);
            if (k < 1 || k > 1_000_000) {
                continue;
            }
            int h = (int) k;
            double tol = tolerance(p, h, varF0, cr);
            double off = Math.abs(p.frequencyHz() - h * f0);
            if (off > tol || 2 * tol >= f0) {
                continue;
            }
            double rel = off / tol;
            if (!best.containsKey(h) || rel < closeness.get(h)) {
                best.put(h, p);
                closeness.put(h, rel);
            }
        }
        return best;
    }

    private static FundamentalCandidate candidate(Map<Integer, Peak> matches, List<Peak> all, double total, double f0,
                                                  double varF0, Criteria cr) {
        int highest = matches.keySet().stream().mapToInt(Integer::intValue).max().orElseThrow();
        double band = cr.bandHighHz() - cr.bandLowHz();
        List<HarmonicMatch> list = new ArrayList<>();
        double sumBits = 0;
        double cheapestAnchor = Double.POSITIVE_INFINITY;
        double widest = 0;
        double explained = 0;
        for (Map.Entry<Integer, Peak> e : matches.entrySet()) {
            int h = e.getKey();
            Peak p = e.getValue();
            double tol = tolerance(p, h, varF0, cr);
            widest = Math.max(widest, tol);
            list.add(new HarmonicMatch(h, p, p.frequencyHz() - h * f0, tol));
            double bits = lonePeakBits(band, tol);
            sumBits += bits;
            cheapestAnchor = Math.min(cheapestAnchor, bits + seriesBits(h, highest));
            explained += p.amplitude() * p.amplitude();
        }
        list.sort(Comparator.comparingInt(HarmonicMatch::harmonic));
        List<Peak> rest = all.stream().filter(p -> !matches.containsValue(p)).toList();
        double evidence = sumBits - cheapestAnchor;
        double chance = Math.min(1, Math.pow(2, -evidence));
        return new FundamentalCandidate(f0, total > 0 ? explained / total : 0, list, rest, widest, Math.sqrt(varF0),
                evidence, chance);
    }

    /** Bits to place one peak on its own: which window of width 2 tol in the band it falls in (at least 0). */
    static double lonePeakBits(double bandHz, double tolHz) {
        return Math.max(0, log2(bandHz / (2 * tolHz)));
    }

    /**
     * Bits to describe a series given its anchor: the anchor's harmonic number h, the highest harmonic H and
     * one presence bit for each other harmonic 1..H.
     */
    static double seriesBits(int h, int highest) {
        int presence = highest - (h == highest ? 1 : 2);
        return wholeNumberBits(h - 1) + wholeNumberBits(highest - h) + presence;
    }

    /** A prefix code for m = 0, 1, 2, ...: log2((m + 1)(m + 2)) bits (probabilities 1/((m+1)(m+2)) sum to 1). */
    static double wholeNumberBits(int m) {
        return log2((m + 1.0) * (m + 2.0));
    }

    private static double tolerance(Peak p, int h, double varF0, Criteria cr) {
        if (!Double.isNaN(cr.fixedToleranceHz())) {
            return cr.fixedToleranceHz();
        }
        double s = p.frequencyStdErrorHz();
        if (!(s >= 0)) {
            s = 0.1 * cr.resolutionHz();
        }
        return Math.max(SIGMA_WINDOW * Math.sqrt(s * s + (double) h * h * varF0), FLOOR_BINS * cr.resolutionHz());
    }

    /** The standard error used to weight a peak: its own (a third of the fixed tolerance when one is given). */
    private static double sigma(Peak p, Criteria cr) {
        if (!Double.isNaN(cr.fixedToleranceHz())) {
            return cr.fixedToleranceHz() / SIGMA_WINDOW;
        }
        double s = p.frequencyStdErrorHz();
        if (!(s > 0)) {
            s = 0.1 * cr.resolutionHz();
        }
        return Math.max(s, 1e-9 * cr.resolutionHz());
    }

    private static double power(List<Peak> peaks) {
        double s = 0;
        for (Peak p : peaks) {
            s += p.amplitude() * p.amplitude();
        }
        return s;
    }

    private static double log2(double x) {
        return Math.log(x) / Math.log(2);
    }
}
