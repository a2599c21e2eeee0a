package org.phasewright.spectrum;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Finds the peaks of an amplitude {@link Spectrum}.
 *
 * <p>Method: (1) the local noise level at each grid point is the median of the grid amplitudes
 * within +-{@code noiseHalfWidthBins} resolution bins (narrower at low frequencies, see
 * {@link #noiseLevel}), divided by sqrt(ln 2): for a noise-only
 * spectrum each grid amplitude is Rayleigh distributed, whose median is sqrt(ln 2) times its RMS
 * (common practice; the median ignores the few bins occupied by tones). Medians are taken at
 * centres a quarter band apart and interpolated linearly. (2) Local maxima above the SNR threshold
 * are candidates, except within the window's main-lobe half-width of the first grid frequency (there
 * the leakage of the mean or of a trend dominates) and below {@code minCycles / T} (fewer than about two
 * cycles in the record cannot be told from a trend); each gets an interpolated frequency ({@link Periodogram#interpolatePeak}), polished
 * by a golden-section maximisation of the {@link ToneProbe} amplitude within half a grid step, and
 * the amplitude read there by the probe. (3) Candidates are taken strongest first; one is
 * dropped when its amplitude is within {@code leakageMarginDb} of the leakage predicted from the
 * peaks already kept, {@code sum_s A_s (R(f - f_s) + R(f + f_s))} with R the window's normalised
 * response (FFT) or the spectral window of the sampling (Lomb-Scargle) — this removes side lobes
 * and sampling aliases.
 *
 * <p>Cost: O(K log B) for the noise level (K grid points, B band points), O(n) per candidate for
 * the probe and O(n) per candidate pair for the spectral window of uneven data.
 */
public final class PeakFinder {

    private static final int MAX_CANDIDATES = 200;

    private PeakFinder() {
    }

    /**
     * Peaks of a spectrum, strongest first.
     *
     * @param response normalised leakage response as a function of the offset in hertz
     *                 (see {@link #windowResponse(Spectrum)} and {@link LombScargle#spectralWindow})
     */
    public static List<Peak> find(Spectrum spectrum, ToneProbe probe, DoubleUnaryOperator response, PeakOptions options) {
        return find(spectrum, probe, probe, response, options);
    }

    /**
     * As {@link #find(Spectrum, ToneProbe, DoubleUnaryOperator, PeakOptions)}, locating each peak with
     * {@code frequencyProbe} and reading its amplitude with {@code amplitudeProbe} (a flat-top spectrum
     * reads amplitudes well but its rippled main lobe locates tones poorly, so its peaks are located
     * with a Hann probe).
     */
    public static List<Peak> find(Spectrum spectrum, ToneProbe amplitudeProbe, ToneProbe frequencyProbe,
                                  DoubleUnaryOperator response, PeakOptions options) {
        ToneProbe probe = amplitudeProbe;
        double[] noise = noiseLevel(spectrum, options.noiseHalfWidthBins());
        int k = spectrum.size();
        List<Peak> candidates = new ArrayList<>();
        double minRatio = Math.pow(10, options.minSnrDb() / 20);
        double lowest = Math.max(spectrum.frequencyAt(0) + spectrum.resolutionHz() * spectrum.window().mainLobeHalfWidthBins(),
                options.minCycles() / spectrum.recordSeconds());
        for (int j = 1; j < k; j++) {
            if (spectrum.frequencyAt(j) < lowest) {
                continue;
            }
            double a = spectrum.amplitudeAt(j);
            boolean left = a > spectrum.amplitudeAt(j - 1);
            boolean right = j == k - 1 || a >= spectrum.amplitudeAt(j + 1);
            if (left && right && noise[j] > 0 && a >= minRatio * noise[j]) {
                candidates.add(new Peak(spectrum.frequencyAt(j), a, 0, noise[j], j));
            }
        }
        candidates.sort(Comparator.comparingDouble(Peak::amplitude).reversed());
        if (candidates.size() > MAX_CANDIDATES) {
            candidates = new ArrayList<>(candidates.subList(0, MAX_CANDIDATES));
        }
        List<Peak> refined = new ArrayList<>();
        for (Peak c : candidates) {
            double f = polish(spectrum, frequencyProbe, Periodogram.interpolatePeak(spectrum, c.gridIndex()));
            double amp = Math.max(probe.amplitudeAt(f), c.amplitude());
            double snr = 20 * Math.log10(amp / c.noiseAmplitude());
            refined.add(new Peak(f, amp, snr, c.noiseAmplitude(), c.gridIndex()));
        }
        refined.sort(Comparator.comparingDouble(Peak::amplitude).reversed());
        double margin = Math.pow(10, options.leakageMarginDb() / 20);
        List<Peak> kept = new ArrayList<>();
        for (Peak c : refined) {
            if (c.snrDb() < options.minSnrDb()) {
                continue;
            }
            double leak = 0;
            boolean duplicate = false;
            for (Peak s : kept) {
                if (Math.abs(c.frequencyHz() - s.frequencyHz()) < 0.5 * spectrum.resolutionHz()) {
                    duplicate = true;
                    break;
                }
                leak += s.amplitude() * (response.applyAsDouble(c.frequencyHz() - s.frequencyHz())
                        + response.applyAsDouble(c.frequencyHz() + s.frequencyHz()));
            }
            if (!duplicate && c.amplitude() > margin * leak) {
                kept.add(c);
                if (kept.size() == options.maxPeaks()) {
                    break;
                }
            }
        }
        return List.copyOf(kept);
    }

    /**
     * Maximises the probe amplitude by golden-section search within half a resolution bin (or half a
     * grid step, if larger) either side of the interpolated frequency (32 probe evaluations,
     * tolerance about 1e-7 of the bracket). For a single
     * tone this is the maximum of the windowed DTFT, which removes the bias of the log-parabola.
     */
    static double polish(Spectrum s, ToneProbe probe, double f) {
        double half = 0.5 * Math.max(s.gridStepHz(), s.resolutionHz());
        double lo = Math.max(s.frequencyAt(0), f - half);
        double hi = Math.min(s.frequencyAt(s.size() - 1), f + half);
        return GoldenSection.maximise(probe, lo, hi, f, 32);
    }

    /** The window's normalised response for an FFT spectrum, as a function of the offset in hertz. */
    public static DoubleUnaryOperator windowResponse(Spectrum spectrum) {
        Window w = spectrum.window();
        int n = spectrum.samples();
        double res = spectrum.resolutionHz();
        return offsetHz -> w.response(offsetHz / res, n);
    }

    /** Half-width of the noise band never goes below this many resolution bins. */
    static final double MIN_NOISE_HALF_WIDTH_BINS = 4;

    /**
     * Local RMS noise amplitude at each grid point (median / sqrt(ln 2) over a band). The band is
     * +-{@code halfWidthBins} resolution bins, narrowed at low frequencies to half the frequency itself
     * (in bins, but at least {@value #MIN_NOISE_HALF_WIDTH_BINS}): a spectrum that rises steeply towards zero
     * frequency (weather, drift, any red noise) is then judged against its own level there, not against the
     * flatter floor above it. Medians are taken at centres a quarter band apart and interpolated linearly.
     */
    static double[] noiseLevel(Spectrum s, double halfWidthBins) {
        int k = s.size();
        double pointsPerBin = s.resolutionHz() / s.gridStepHz();
        double scale = 1 / Math.sqrt(Math.log(2));
        List<double[]> centres = new ArrayList<>();
        double[] buf = new double[(int) Math.max(5, 2 * Math.round(halfWidthBins * pointsPerBin) + 1) + 2];
        int centre = 0;
        while (true) {
            double bins = s.frequencyAt(centre) / s.resolutionHz();
            double halfBins = Math.min(halfWidthBins, Math.max(MIN_NOISE_HALF_WIDTH_BINS, 0.5 * bins));
            int half = (int) Math.max(2, Math.round(halfBins * pointsPerBin));
            int lo = Math.max(0, centre - half);
            int hi = Math.min(k - 1, centre + half);
            if (hi - lo < 2 * half) {
                if (lo == 0) {
                    hi = Math.min(k - 1, 2 * half);
                } else {
                    lo = Math.max(0, k - 1 - 2 * half);
                }
            }
            int m = hi - lo + 1;
            for (int j = 0; j < m; j++) {
                buf[j] = s.amplitudeAt(lo + j);
            }
            Arrays.sort(buf, 0, m);
            double median = m % 2 == 1 ? buf[m / 2] : 0.5 * (buf[m / 2 - 1] + buf[m / 2]);
            centres.add(new double[] {centre, median * scale});
            if (centre == k - 1) {
                break;
            }
            centre = Math.min(k - 1, centre + Math.max(1, half / 4));
        }
        double[] out = new double[k];
        int c = 0;
        for (int j = 0; j < k; j++) {
            while (c + 1 < centres.size() && centres.get(c + 1)[0] <= j) {
                c++;
            }
            double[] a = centres.get(c);
            if (c + 1 == centres.size() || a[0] == j) {
                out[j] = a[1];
            } else {
                double[] b = centres.get(c + 1);
                double u = (j - a[0]) / (b[0] - a[0]);
                out[j] = a[1] + u * (b[1] - a[1]);
            }
        }
        return out;
    }
}
