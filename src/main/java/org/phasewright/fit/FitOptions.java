package org.phasewright.fit;

/**
 * Choices that shape a fit's report but not its estimates.
 *
 * @param level     confidence level of every interval, in (0, 1); 0.95 by default
 * @param leverages whether to compute the leverages h_ii (one more pass over the design)
 */
public record FitOptions(double level, boolean leverages) {
    public FitOptions {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("confidence level must lie strictly between 0 and 1, got " + level);
        }
    }

    public static FitOptions defaults() {
        return new FitOptions(0.95, false);
    }

    public FitOptions withLevel(double newLevel) {
        return new FitOptions(newLevel, leverages);
    }

    public FitOptions withLeverages(boolean on) {
        return new FitOptions(level, on);
    }
}
