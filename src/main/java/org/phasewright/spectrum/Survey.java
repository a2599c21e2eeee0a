package org.phasewright.spectrum;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.phasewright.series.Series;

/**
 * Frequency discovery in one call: periodogram, peak list, fundamental candidate.
 *
 * <p>Complete uniform records use the FFT {@link Periodogram}; uneven or gappy ones the generalised
 * {@link LombScargle} periodogram (with the false-alarm probability of its top peak). Peaks come from
 * {@link PeakFinder}, the fundamental from {@link FundamentalSearch}. Cost: that of the periodogram
 * plus O(n) per candidate peak.
 */
public final class Survey {

    private Survey() {
    }

    public static SurveyResult of(Series series) {
        return of(series, SurveyOptions.defaults());
    }

    public static SurveyResult of(Series series, SurveyOptions options) {
        List<SpectrumNote> notes = new ArrayList<>();
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
            spectrum = Periodogram.of(series, options.periodogram());
            probe = Periodogram.probe(series, options.periodogram());
            locator = options.periodogram().window() == Window.FLAT_TOP
                    ? Periodogram.probe(series, options.periodogram().withWindow(Window.HANN)) : probe;
            response = PeakFinder.windowResponse(spectrum);
            notes.add(new SpectrumNote("method_fft", "FFT periodogram, " + options.periodogram().window().id()
                    + " window, zero padding x" + options.periodogram().zeroPad()));
        } else {
            UnevenPeriodogram ls = LombScargle.of(series, options.lombScargle());
            spectrum = ls.spectrum();
            probe = LombScargle.probe(series);
            locator = probe;
            response = LombScargle.spectralWindow(series);
            fap = OptionalDouble.of(ls.falseAlarmProbability());
            String why = !series.isUniform() ? "the sampling is uneven"
                    : series.missingCount() > 0 ? "the record has " + series.missingCount() + " missing samples"
                    : "it was requested";
            notes.add(new SpectrumNote("method_lomb_scargle", "generalised Lomb-Scargle periodogram because " + why
                    + "; top peak false-alarm probability " + String.format(java.util.Locale.ROOT, "%.3g", ls.falseAlarmProbability())
                    + " (Baluev 2008, white-noise assumption)"));
        }
        List<Peak> peaks = PeakFinder.find(spectrum, probe, locator, response, options.peaks());
        if (peaks.isEmpty()) {
            notes.add(new SpectrumNote("no_peaks", "no peak stands " + options.peaks().minSnrDb()
                    + " dB above the local noise level"));
        }
        double tol = Double.isNaN(options.harmonicToleranceHz()) ? spectrum.resolutionHz() : options.harmonicToleranceHz();
        Optional<FundamentalCandidate> f0 = FundamentalSearch.find(peaks, tol, 2 * spectrum.resolutionHz(), options.maxDivisor());
        return new SurveyResult(spectrum, peaks, f0, fap, notes);
    }
}
