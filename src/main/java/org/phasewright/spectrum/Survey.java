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

    /** Expected number of noise peaks the residual search may add. */
    private static final double HIDDEN_FALSE_PEAKS = 0.01;

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
                    + (options.peaks().minCycles() > 0 ? "; peaks below " + compact(options.peaks().minCycles())
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
            int found = 0;
            if (joint.refined()) {
                Series residual = data.withValues(joint.residual());
                Spectrum rest = fft ? Periodogram.of(residual, options.periodogram())
                        : LombScargle.of(residual, options.lombScargle()).spectrum();
                double[] noise = PeakFinder.noiseLevel(rest, options.peaks().noiseHalfWidthBins());
                if (joint.peaks().size() < options.peaks().maxPeaks()) {
                    List<Peak> hidden = hiddenPeaks(residual, rest, joint.peaks(), fft, options);
                    if (!hidden.isEmpty()) {
                        List<Peak> all = new ArrayList<>(joint.peaks());
                        all.addAll(hidden.subList(0, Math.min(hidden.size(), options.peaks().maxPeaks() - all.size())));
                        JointPeakFit.Outcome again = JointPeakFit.refine(data, all, Math.max(0, options.detrendDegree()),
                                spectrum.resolutionHz(), enbw);
                        if (again.refined()) {
                            found = all.size() - joint.peaks().size();
                            joint = again;
                        }
                    }
                }
                peaks = rescore(joint.peaks(), rest, noise, enbw, JointPeakFit.timeSpread(data), options);
            } else {
                peaks = joint.peaks();
            }
            notes.add(joint.refined()
                    ? new SpectrumNote("peaks_refined", "peak frequencies and amplitudes re-estimated jointly by least"
                    + " squares with the trend (" + joint.sweeps() + (joint.sweeps() == 1 ? " sweep" : " sweeps")
                    + "); noise levels and frequency errors from the residual spectrum"
                    + (found > 0 ? "; " + found + (found == 1 ? " peak" : " peaks")
                    + " found in the residual spectrum, hidden beside stronger ones" : ""))
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

    /**
     * The jointly estimated peaks with the noise level of the residual spectrum at their frequencies (the leakage
     * of strong peaks no longer inflates it), their SNR and frequency errors from it; peaks that fall below the SNR
     * threshold or below minCycles/T were leakage of the others or of the trend and are dropped.
     */
    private static List<Peak> rescore(List<Peak> peaks, Spectrum rest, double[] noise, double enbw, double sdTime,
                                      SurveyOptions options) {
        double lowest = options.peaks().minCycles() / rest.recordSeconds();
        List<Peak> out = new ArrayList<>();
        for (Peak p : peaks) {
            int j = (int) Math.round((p.frequencyHz() - rest.frequencyAt(0)) / rest.gridStepHz());
            double level = noise[Math.max(0, Math.min(noise.length - 1, j))];
            if (!(level > 0)) {
                level = p.noiseAmplitude();
            }
            double snr = 20 * Math.log10(p.amplitude() / level);
            if (snr >= options.peaks().minSnrDb() && p.frequencyHz() >= lowest) {
                out.add(new Peak(p.frequencyHz(), p.amplitude(), snr, level, p.gridIndex(),
                        JointPeakFit.frequencyStdError(level, p.amplitude(), enbw, sdTime)));
            }
        }
        return List.copyOf(out);
    }

    /**
     * Peaks of the residual spectrum (the record minus the joint fit) farther than 1/T from every peak already
     * found: tones a stronger neighbour's leakage hid from the first search (one pass, as in the successive
     * subtraction of CLEAN, J. A. Högbom 1974, Astron. Astrophys. Suppl. 15, 417). Since the whole residual
     * spectrum is searched again, a hidden peak must also stand z times above the noise RMS with
     * {@code exp(-z^2) = 0.01 / bins}: a white-noise amplitude exceeds z RMS in one bin with probability
     * exp(-z^2) (Rayleigh tail, common practice), so noise alone adds a peak in at most about 1 record in 100.
     */
    private static List<Peak> hiddenPeaks(Series residual, Spectrum spectrum, List<Peak> known, boolean fft,
                                          SurveyOptions options) {
        ToneProbe probe = fft ? Periodogram.probe(residual, options.periodogram()) : LombScargle.probe(residual);
        DoubleUnaryOperator response = fft ? PeakFinder.windowResponse(spectrum) : LombScargle.spectralWindow(residual);
        ToneProbe locator = fft && options.periodogram().window() == Window.FLAT_TOP
                ? Periodogram.probe(residual, options.periodogram().withWindow(Window.HANN)) : probe;
        double res = spectrum.resolutionHz();
        double bins = Math.max(1, (spectrum.frequencyAt(spectrum.size() - 1) - spectrum.frequencyAt(0)) / res);
        double threshold = Math.max(options.peaks().minSnrDb(), 10 * Math.log10(Math.log(bins / HIDDEN_FALSE_PEAKS)));
        return PeakFinder.find(spectrum, probe, locator, response, options.peaks()).stream()
                .filter(p -> p.snrDb() >= threshold)
                .filter(p -> known.stream().noneMatch(q -> Math.abs(q.frequencyHz() - p.frequencyHz()) < res))
                .toList();
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

    private static String compact(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : g3(v);
    }

    private static String g3(double v) {
        return String.format(Locale.ROOT, "%.3g", v);
    }

    private static String g6(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
