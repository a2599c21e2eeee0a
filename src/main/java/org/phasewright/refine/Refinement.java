package org.phasewright.refine;

import java.util.List;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.FitResult;
import org.phasewright.fit.FitWarning;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.TermReport;

/**
 * Result of nonlinear frequency refinement.
 *
 * @param model       the model with refined frequencies
 * @param frequencies one entry per refined frequency, in model order
 * @param fit         the linear fit of {@link #model()} at the refined frequencies, its standard errors
 *                    conditional on them (as if they were known); residuals, components and R^2 are those of
 *                    the refined model
 * @param iterations  Levenberg-Marquardt iterations taken
 * @param converged   whether the tolerance was met within the iteration limit
 * @param rss         residual sum of squares at the optimum (weighted)
 * @param dof         n - p - q: samples less linear and nonlinear parameters
 * @param warnings    what the user must know (no convergence, a frequency moved far from its start), plus
 *                    the final fit's warnings
 * @param jointCoefficients the linear coefficients with standard errors, t-tests and intervals from the joint
 *                    covariance (frequencies estimated too) on {@code dof} degrees of freedom
 * @param jointCovariance   that covariance of the linear coefficients, s^2 (C + B S^-1 B') ({@link JointInference})
 * @param jointTerms  the term reports from it: amplitudes and phases whose errors include the frequencies'
 *                    (a phase referred to the record's start has about twice the conditional error for one
 *                    tone); tests are Wald tests on it, variance shares those of {@link #fit()}
 */
public record Refinement(ModelSpec model, List<RefinedFrequency> frequencies, FitResult fit, int iterations,
                         boolean converged, double rss, int dof, List<FitWarning> warnings,
                         List<CoefficientEstimate> jointCoefficients, double[][] jointCovariance,
                         List<TermReport> jointTerms) {

    public Refinement {
        frequencies = List.copyOf(frequencies);
        warnings = List.copyOf(warnings);
        jointCoefficients = List.copyOf(jointCoefficients);
        jointTerms = List.copyOf(jointTerms);
    }
}
