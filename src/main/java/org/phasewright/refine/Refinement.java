package org.phasewright.refine;

import java.util.List;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.model.ModelSpec;

/**
 * Result of nonlinear frequency refinement.
 *
 * @param model       the model with refined frequencies
 * @param frequencies one entry per refined frequency, in model order
 * @param fit         the linear fit of {@link #model()} (amplitudes, phases and their standard errors
 *                    conditional on the refined frequencies; amplitude errors are unaffected to first order
 *                    by the frequency's uncertainty, phase errors referred to t = 0 are not)
 * @param iterations  Levenberg-Marquardt iterations taken
 * @param converged   whether the tolerance was met within the iteration limit
 * @param rss         residual sum of squares at the optimum (weighted)
 * @param dof         n - p - q: samples less linear and nonlinear parameters
 * @param warnings    what the user must know (no convergence, a frequency moved far from its start), plus
 *                    the final fit's warnings
 */
public record Refinement(ModelSpec model, List<RefinedFrequency> frequencies, FitResult fit, int iterations,
                         boolean converged, double rss, int dof, List<FitWarning> warnings) {

    public Refinement {
        frequencies = List.copyOf(frequencies);
        warnings = List.copyOf(warnings);
    }
}
