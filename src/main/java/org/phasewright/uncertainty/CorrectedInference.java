package org.phasewright.uncertainty;

import java.util.List;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.FitResult;
import org.phasewright.model.TermReport;

/**
 * Coefficients and term reports of a fit with standard errors computed by {@link #method()}.
 * Estimates are those of the plain fit (least squares); only standard errors, intervals, tests and
 * p-values differ. Variance shares are those of the plain fit.
 *
 * @param method       which standard errors these are
 * @param description  the same in words, for display beside every table that uses them
 * @param coefficients one entry per design column
 * @param covariance   the covariance behind the standard errors
 * @param terms        one report per term, in model order
 * @param dof          degrees of freedom of the t and F references
 * @param arCoefficients AR coefficients phi_1..phi_p of the noise model ({@link SeMethod#AR_NOISE}; empty otherwise)
 * @param bandwidth    Newey-West truncation lag ({@link SeMethod#NEWEY_WEST}; NaN otherwise)
 * @param localNoise   per-sinusoid noise ratios ({@link SeMethod#LOCAL_SPECTRUM}; empty otherwise)
 * @param plain        the plain fit (R^2, residuals, components, warnings)
 */
public record CorrectedInference(SeMethod method, String description, List<CoefficientEstimate> coefficients,
                                 double[][] covariance, List<TermReport> terms, int dof, double[] arCoefficients,
                                 double bandwidth, List<LocalNoise> localNoise, FitResult plain) {

    public CorrectedInference {
        coefficients = List.copyOf(coefficients);
        terms = List.copyOf(terms);
        localNoise = List.copyOf(localNoise);
        arCoefficients = arCoefficients.clone();
    }

    @Override
    public double[] arCoefficients() {
        return arCoefficients.clone();
    }

    /** The report of the term labelled {@code label}. */
    public TermReport term(String label) {
        return terms.stream().filter(t -> t.label().equals(label)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no term '" + label + "' in the fit"));
    }
}
