package org.phasewright.refine;

import org.phasewright.fit.FitOptions;

/**
 * Options of {@link FrequencyRefiner}.
 *
 * @param maxIterations Levenberg-Marquardt iterations at most
 * @param tolerance     convergence when every frequency step is below {@code tolerance / T} hertz
 *                      (T the record length) or the residual sum of squares stops falling by more than
 *                      {@code tolerance} relative
 * @param fit           options of the final linear fit at the refined frequencies
 */
public record RefineOptions(int maxIterations, double tolerance, FitOptions fit) {

    public RefineOptions {
        if (maxIterations < 1) {
            throw new IllegalArgumentException("at least one refinement iteration is needed, got " + maxIterations);
        }
        if (!(tolerance > 0 && tolerance < 1)) {
            throw new IllegalArgumentException("refinement tolerance must lie in (0, 1), got " + tolerance);
        }
        if (fit == null) {
            throw new IllegalArgumentException("fit options must be given");
        }
    }

    /** 100 iterations, tolerance 1e-10, default fit options. */
    public static RefineOptions defaults() {
        return new RefineOptions(100, 1e-10, FitOptions.defaults());
    }

    public RefineOptions withFit(FitOptions f) {
        return new RefineOptions(maxIterations, tolerance, f);
    }
}
