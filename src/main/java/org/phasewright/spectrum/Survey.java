package org.phasewright.spectrum;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.phasewright.series.Series;

/**
 * Frequency discovery in one call: detrending, periodogram, peak list, joint re-estimation of the peaks,
 * fundamental search.
 *
 * <p>Steps: (1) a least-squares polynomial of degree {@link SurveyOptions#detrendDegree()} (default 2) is
 * removed ({@link Detrend}), so that a slow drift does not leak into the lowest bins; peaks below 2/T are
 * not listed ({@link PeakOptions#minCycles()}). (2) Complete uniform records use the FFT {@link Periodogram};
 * uneven or gappy ones the generalised {@link LombScargle} periodogram (with the false-alarm probability of
 * its top peak). (3) Peaks come from {@link PeakFinder}; (4) their frequencies and amplitudes are then
 * re-estimated jointly by least squares with the trend ({@link JointPeakFit}), which removes the pull of
 * neighbouring peaks and of the sampling pattern and gives each frequency a standard error; a peak whose
 * joint amplitude falls below the SNR threshold, or whose frequency moves below 2/T, was leakage and is
 * dropped. (5) The
 * fundamental comes from {@link FundamentalSearch}: accepted only when the harmonic match is too good to be
 * chance, then searched again among the peaks it leaves ({@link SurveyResult#otherSeries()}).
 *
 * <p>Cost: that of the periodogram, plus O(n) per candidate peak in the peak search, plus
 * O(n p^2) per sweep of the joint re-estimation (p = 2 peaks + 3, a few sweeps).
 */
public final class Survey {

    private Survey() {
    }

    public static SurveyResult of(Series series) {
        return of(series, SurveyOptions.defaults());
    }

    public static SurveyResult of(Series series, SurveyOptions options) {
        List<SpectrumNote> notes = new ArrayList<>();
        Series data = Detrend.polynomial(series, options.detrendDegree());
        boolean complete = series.isUniform() && series.missingCount() == 0;
        boolean fft = switch (options.method()) {
            case FFT -> true;
            case LOMB_SCARGLE -> false;
            case AUTO -> complete;
        };
        Spectrum spectrum;
        ToneProbe probe;
        ToneProbe locator;
        DoubleUnaryOperator response;
        OptionalDouble fap = OptionalDouble.empty();
        if (fft) {
            spectrum = Periodogram.of(data, options.periodogram());
            probe = Periodogram.probe(data, options.periodogram());
            locator = options.periodogram().window() == Window.FLAT_TOP
                    ? Periodogram.probe(data, options.periodogram().withWindow(Window.HANN)) : probe;
            response = PeakFinder.windowResponse(spectrum);
            notes.add(new SpectrumNote("method_fft", "FFT periodogram, " + options.periodogram().window().id()
                    + " window, zero padding x" + options.periodogram().zeroPad()));
        } else {
            UnevenPeriodogram ls = LombScargle.of(data, options.lombScargle());
            spectrum = ls.spectrum();
            probe = LombScargle.probe(data);
            locator = probe;
            response = LombScargle.spectralWindow(data);
            fap = OptionalDouble.of(ls.falseAlarmProbability());
            String why = !series.isUniform() ? "the sampling is uneven"
                    : series.missingCount() > 0 ? "the record has " + series.missingCount() + " missing samples"
                    : "it was requested";
            notes.add(new SpectrumNote("method_lomb_scargle", "generalised Lomb-Scargle periodogram because " + why
                    + "; top peak false-alarm probability " + g3(ls.falseAlarmProbability())
                    + " (Baluev 2008, white-noise assumption)"));
        }
        if (options.detrendDegree() >= 0) {
            notes.add(new SpectrumNote("detrended", "a least-squares " + degreeName(options.detrendDegree())
                    + " was removed before the periodogram"
                    + (options.peaks().minCycles() > 0 ? "; peaks below " + g3(options.peaks().minCycles())
                    + "/T (fewer cycles than that in the record) are not listed" : "")));
        }
        List<Peak> peaks = PeakFinder.find(spectrum, probe, locator, response, options.peaks());
        if (peaks.isEmpty()) {
            notes.add(new SpectrumNote("no_peaks", "no peak stands " + options.peaks().minSnrDb()
                    + " dB above the local noise level"));
        }
        double enbw = spectrum.noiseBandwidthBins();
        if (options.refinePeaks() && !peaks.isEmpty()) {
            JointPeakFit.Outcome joint = JointPeakFit.refine(data, peaks, Math.max(0, options.detrendDegree()),
                    spectrum.resolutionHz(), enbw);
            double lowest = options.peaks().minCycles() / spectrum.recordSeconds();
            // a peak whose joint amplitude falls below the threshold was leakage of the others or of the trend
            peaks = joint.peaks().stream().filter(p -> p.snrDb() >= options.peaks().minSnrDb()
                    && p.frequencyHz() >= lowest).toList();
            notes.add(joint.refined()
                    ? new SpectrumNote("peaks_refined", "peak frequencies and amplitudes re-estimated jointly by least"
                    + " squares with the trend (" + joint.sweeps() + (joint.sweeps() == 1 ? " sweep" : " sweeps")
                    + "); frequency errors from the local noise level")
                    : new SpectrumNote("peaks_not_refined", "peak frequencies are read off the spectrum, not re-estimated"
                    + " jointly (the record is too long or the peaks cannot be fitted together)"));
        } else {
            peaks = JointPeakFit.withErrors(peaks, data, enbw);
        }
        double low = Math.max(spectrum.frequencyAt(0), options.peaks().minCycles() / spectrum.recordSeconds());
        double high = spectrum.frequencyAt(spectrum.size() - 1);
        Optional<FundamentalCandidate> f0 = Optional.empty();
        List<FundamentalCandidate> others = List.of();
        if (peaks.size() >= 2 && high > low) {
            FundamentalSearch.Criteria criteria = new FundamentalSearch.Criteria(low, high, spectrum.resolutionHz(),
                    options.harmonicToleranceHz(), 2 * spectrum.resolutionHz(), options.maxDivisor(),
                    options.maxChanceProbability());
            FundamentalSearch.Outcome found = FundamentalSearch.series(peaks, criteria);
            f0 = found.best();
            others = found.series().isEmpty() ? List.of() : found.series().subList(1, found.series().size());
            notes.add(fundamentalNote(found, peaks.size(), options.maxChanceProbability()));
            for (FundamentalCandidate c : others) {
                notes.add(new SpectrumNote("other_series", "the peaks it leaves hold another series: " + describe(c)));
            }
        }
        return new SurveyResult(spectrum, peaks, f0, fap, notes, others);
    }

    private static SpectrumNote fundamentalNote(FundamentalSearch.Outcome found, int peakCount, double limit) {
        if (found.best().isPresent()) {
            FundamentalCandidate c = found.best().get();
            return new SpectrumNote("fundamental", "fundamental " + describe(c) + ", explaining " + c.harmonics().size()
                    + " of " + peakCount + " peaks");
        }
        if (found.bestRejected().isPresent()) {
            FundamentalCandidate c = found.bestRejected().get();
            return new SpectrumNote("no_fundamental", "no common fundamental: the best, " + g6(c.frequencyHz())
                    + " Hz with harmonics " + join(c.harmonicNumbers()) + ", could arise by chance with probability up to "
                    + g3(c.chanceProbability()) + " (" + g3(c.evidenceBits()) + " bits of evidence; at most " + g3(limit)
                    + " is accepted)");
        }
        return new SpectrumNote("no_fundamental", "no common fundamental: no two peaks lie at whole-number multiples"
                + " of one frequency within their frequency errors");
    }

    private static String describe(FundamentalCandidate c) {
        List<Integer> missing = c.missingHarmonics();
        return g6(c.frequencyHz()) + " Hz (standard error " + g3(c.frequencyStdErrorHz()) + " Hz) with harmonics "
                + join(c.harmonicNumbers()) + (missing.isEmpty() ? "" : ", none at " + join(missing))
                + "; " + g3(c.evidenceBits()) + " bits of evidence, chance probability at most " + g3(c.chanceProbability());
    }

    private static String degreeName(int d) {
        return switch (d) {
            case 0 -> "constant";
            case 1 -> "straight-line trend";
            case 2 -> "quadratic trend";
            default -> "polynomial trend of degree " + d;
        };
    }

    private static String join(List<Integer> ks) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < ks.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(ks.get(i));
        }
        return b.toString();
    }

    private static String g3(double v) {
        return String.format(Locale.ROOT, "%.3g", v);
    }

    private static String g6(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
