package org.phasewright.spectrum;

/**
 * Options of the FFT periodogram.
 *
 * @param window     data window
 * @param zeroPad    padding factor: the FFT length is at least {@code zeroPad * n} (1 = none); the
 *                   grid becomes {@code zeroPad} times finer, the resolution is unchanged
 * @param removeMean subtract the mean before windowing so that the zero-frequency leakage does not
 *                   hide low-frequency tones
 */
public record PeriodogramOptions(Window window, int zeroPad, boolean removeMean) {

    public PeriodogramOptions {
        if (window == null) {
            throw new IllegalArgumentException("window must be given");
        }
        if (zeroPad < 1 || zeroPad > 64) {
            throw new IllegalArgumentException("zero padding factor must be between 1 and 64, got " + zeroPad);
        }
    }

    /** Hann window, padding factor 4, mean removed. */
    public static PeriodogramOptions defaults() {
        return new PeriodogramOptions(Window.HANN, 4, true);
    }

    public PeriodogramOptions withWindow(Window w) {
        return new PeriodogramOptions(w, zeroPad, removeMean);
    }

    public PeriodogramOptions withZeroPad(int factor) {
        return new PeriodogramOptions(window, factor, removeMean);
    }

    public PeriodogramOptions withRemoveMean(boolean remove) {
        return new PeriodogramOptions(window, zeroPad, remove);
    }
}
