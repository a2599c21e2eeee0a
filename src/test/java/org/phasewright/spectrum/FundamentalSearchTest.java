package org.phasewright.spectrum;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The harmonic comb on peak lists alone, where the truth is set exactly. */
class FundamentalSearchTest {

    /** A 1.5 s record at 8 kHz: resolution 2/3 Hz, band 2/T .. 4000 Hz. */
    private static final double T = 1.5;
    private static final FundamentalSearch.Criteria CRITERIA =
            new FundamentalSearch.Criteria(2 / T, 4000, 1 / T, Double.NaN, 2 / T, 8, 0.01);

    private static Peak peak(double f, double amplitude, double seBins) {
        return new Peak(f, amplitude, 40, amplitude / 100, 0, seBins / T);
    }

    @Test
    void oddHumUnderANoteIsTheHumNotItsCommonDivisor() {
        // every frequency is a multiple of 10 Hz, so 10 Hz "explains" all six peaks as harmonics 5, 15, 25, 35,
        // 44 and 88; the comb pays for the 82 empty harmonics in between and loses to 50 Hz (1, 3, 5, 7)
        List<Peak> peaks = List.of(peak(440, 0.3, 0.001), peak(880, 0.08, 0.001), peak(50, 0.06, 0.001),
                peak(150, 0.025, 0.002), peak(250, 0.012, 0.003), peak(350, 0.006, 0.005));
        FundamentalSearch.Outcome out = FundamentalSearch.series(peaks, CRITERIA);
        FundamentalCandidate hum = out.best().orElseThrow();
        assertThat(hum.frequencyHz()).isCloseTo(50, within(1e-6));
        assertThat(hum.harmonicNumbers()).containsExactly(1, 3, 5, 7);
        assertThat(hum.missingHarmonics()).containsExactly(2, 4, 6);
        assertThat(hum.unexplained()).extracting(Peak::frequencyHz).containsExactly(440.0, 880.0);
        assertThat(out.series()).hasSize(2);
        FundamentalCandidate note = out.series().get(1);
        assertThat(note.frequencyHz()).isCloseTo(440, within(1e-6));
        assertThat(note.harmonicNumbers()).containsExactly(1, 2);
    }

    @Test
    void subharmonicLosesBecauseEveryEmptyHarmonicCostsABit() {
        List<Peak> peaks = List.of(peak(100, 1, 0.01), peak(200, 0.5, 0.01), peak(300, 0.3, 0.01));
        FundamentalCandidate c = FundamentalSearch.find(peaks, CRITERIA).orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(100, within(1e-3));
        assertThat(c.harmonicNumbers()).containsExactly(1, 2, 3);
        // the description-length bookkeeping, by hand: every window is at its floor 0.05/T (3 standard errors of
        // 0.01/T are narrower), so each peak on its own costs L = log2(B / (0.1/T)) bits; anchored at harmonic 1 the
        // series costs 1 bit for h = 1, log2(3 * 4) bits for H - h = 2 and one presence bit (harmonic 2)
        double lone = FundamentalSearch.lonePeakBits(4000 - 2 / T, 0.05 / T);
        assertThat(c.evidenceBits()).isCloseTo(2 * lone - (1 + Math.log(12) / Math.log(2) + 1), within(1e-9));
        assertThat(c.chanceProbability()).isCloseTo(Math.pow(2, -c.evidenceBits()), within(1e-15));
    }

    @Test
    void missingFundamentalIsFoundFromLowHarmonicsOnly() {
        List<Peak> low = List.of(peak(80, 1, 0.01), peak(120, 0.8, 0.01), peak(160, 0.6, 0.01));
        FundamentalCandidate c = FundamentalSearch.find(low, CRITERIA).orElseThrow();
        assertThat(c.frequencyHz()).isCloseTo(40, within(1e-3));
        assertThat(c.harmonicNumbers()).containsExactly(2, 3, 4);
        // first seen at its 5th harmonic: a coincidence of high harmonics, not a fundamental to suggest
        List<Peak> high = List.of(peak(200, 1, 0.01), peak(240, 0.8, 0.01), peak(280, 0.6, 0.01));
        Optional<FundamentalCandidate> h = FundamentalSearch.find(high, CRITERIA);
        assertThat(h).isEmpty();
    }

    @Test
    void aPairOffByMoreThanItsFrequencyErrorsIsNotAHarmonic() {
        // K1 and S2 of the tide stand 0.33/T away from 1:2 over 60 days; with frequency errors of 0.02/T the
        // pair is not harmonic (common practice: tidal lines are not a harmonic series of one fundamental)
        double t = 60 * 86400;
        double res = 1 / t;
        FundamentalSearch.Criteria cr = new FundamentalSearch.Criteria(2 * res, 1 / 7200.0, res, Double.NaN, 2 * res, 8, 0.01);
        double k1 = 15.0410686 / 360 / 3600;
        double s2 = 30.0 / 360 / 3600;
        List<Peak> peaks = List.of(new Peak(k1, 0.35, 26, 0.02, 0, 0.02 * res), new Peak(s2, 0.41, 24, 0.025, 0, 0.02 * res));
        assertThat(FundamentalSearch.series(peaks, cr).series()).isEmpty();
        // the same pair read with a loose fixed window of 1/T does match, but two peaks in a 1:2 ratio within a
        // wide window are too likely by chance to be suggested
        FundamentalSearch.Outcome loose = FundamentalSearch.series(peaks,
                new FundamentalSearch.Criteria(2 * res, 1 / 7200.0, res, res, 2 * res, 8, 0.01));
        assertThat(loose.series()).isEmpty();
        assertThat(loose.bestRejected()).hasValueSatisfying(c -> assertThat(c.chanceProbability()).isGreaterThan(0.01));
    }

    @Test
    void randomPeaksAreAcceptedNoMoreOftenThanTheChanceBoundAllows() {
        // No-hypercompression inequality (P. Grünwald 2007, The Minimum Description Length Principle, sec. 3.3):
        // peaks placed uniformly at random save b bits with probability at most 2^-b, so at most 1 % of random
        // peak lists may yield a fundamental at the 0.01 limit. 4000 lists of 6 peaks: binomial(4000, 0.01) has
        // mean 40 and exceeds 60 with probability below 0.2 %; the bound is conservative, so far fewer are expected.
        Random rnd = new Random(11);
        int accepted = 0;
        int lists = 4000;
        for (int i = 0; i < lists; i++) {
            List<Peak> peaks = new ArrayList<>();
            for (int k = 0; k < 6; k++) {
                double f = 2 / T + rnd.nextDouble() * (4000 - 2 / T);
                peaks.add(peak(f, 0.1 + rnd.nextDouble(), 0.02 + 0.05 * rnd.nextDouble()));
            }
            if (FundamentalSearch.find(peaks, CRITERIA).isPresent()) {
                accepted++;
            }
        }
        System.out.printf("random peak lists with a suggested fundamental: %d of %d%n", accepted, lists);
        assertThat(accepted).isLessThanOrEqualTo(60);
    }

    @Test
    void codeLengthsAreThoseDocumented() {
        // a prefix code for 0, 1, 2, ...: probabilities 1/((m+1)(m+2)) sum to 1 (telescoping; common practice)
        assertThat(FundamentalSearch.wholeNumberBits(0)).isCloseTo(1, within(1e-12));
        assertThat(FundamentalSearch.wholeNumberBits(6)).isCloseTo(Math.log(56) / Math.log(2), within(1e-12));
        double kraft = 0;
        for (int m = 0; m < 1_000_000; m++) {
            kraft += Math.pow(2, -FundamentalSearch.wholeNumberBits(m));
        }
        assertThat(kraft).isCloseTo(1, within(1e-5));
        // harmonics 1, 3, 5, 7 anchored at 1: h = 1 (1 bit), H - h = 6 (log2 56 bits), presence of 2..6 (5 bits)
        assertThat(FundamentalSearch.seriesBits(1, 7)).isCloseTo(1 + Math.log(56) / Math.log(2) + 5, within(1e-12));
    }
}
