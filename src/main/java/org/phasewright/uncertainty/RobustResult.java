package org.phasewright.uncertainty;

import java.util.List;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.FitResult;
import org.phasewright.model.TermReport;

/**
 * A robust (M-estimation) fit.
 *
 * @param loss          loss function
 * @param tuning        its tuning constant (in units of the scale)
 * @param scale         robust residual scale, MAD / 0.6745 at convergence
 * @param coefficients  robust estimates with their standard errors
 * @param covariance    Huber's asymptotic covariance (see {@link RobustFit})
 * @param terms         term reports from the robust estimates (variance shares are the plain fit's)
 * @param weights       final robustness weights in record order (1 = full weight, 0 = rejected; NaN where
 *                      the sample did not enter the fit)
 * @param downweighted  samples with weight below 0.5
 * @param iterations    IRLS iterations
 * @param converged     whether the relative change fell below the tolerance
 * @param dof           n - p
 * @param plain         the ordinary least-squares fit it started from
 */
public record RobustResult(RobustLoss loss, double tuning, double scale, List<CoefficientEstimate> coefficients,
                           double[][] covariance, List<TermReport> terms, double[] weights, int downweighted,
                           int iterations, boolean converged, int dof, FitResult plain) {

    public RobustResult {
        coefficients = List.copyOf(coefficients);
        terms = List.copyOf(terms);
        weights = weights.clone();
    }

    @Override
    public double[] weights() {
        return weights.clone();
    }
}
