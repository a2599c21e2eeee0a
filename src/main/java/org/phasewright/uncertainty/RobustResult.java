package org.phasewright.uncertainty;

import java.util.List;
import org.phasewright.fit.CoefficientEstimate;
import org.phasewright.fit.Components;
import org.phasewright.fit.FitResult;
import org.phasewright.model.TermReport;

/**
 * A robust (M-estimation) fit.
 *
 * @param loss          loss function
 * @param tuning        its tuning constant (in units of the scale)
 * @param scale         robust residual scale, MAD / 0.6745 of the final residuals: the estimate of the noise
 *                      standard deviation that the standard errors use (the s of {@link RobustFit}'s covariance)
 * @param n             samples that entered the fit
 * @param p             columns of the design
 * @param dof           n - p, the degrees of freedom of the t references behind intervals and p-values
 * @param level         confidence level of every interval
 * @param coefficients  robust estimates with their standard errors
 * @param covariance    Huber's asymptotic covariance (see {@link RobustFit})
 * @param terms         term reports from the robust estimates (variance shares are the plain fit's)
 * @param components    the robust fit along the record: observed (NaN at gaps), fitted, residual (NaN where
 *                      the sample did not enter the fit) and one part per term, from the robust coefficients
 * @param weights       final robustness weights in record order (1 = full weight, 0 = rejected; NaN where
 *                      the sample did not enter the fit)
 * @param downweighted  samples with weight below 0.5
 * @param iterations    IRLS iterations
 * @param converged     whether the relative change fell below the tolerance
 * @param plain         the ordinary least-squares fit it started from
 */
public record RobustResult(RobustLoss loss, double tuning, double scale, int n, int p, int dof, double level,
                           List<CoefficientEstimate> coefficients, double[][] covariance, List<TermReport> terms,
                           Components components, double[] weights, int downweighted, int iterations,
                           boolean converged, FitResult plain) {

    public RobustResult {
        coefficients = List.copyOf(coefficients);
        terms = List.copyOf(terms);
        weights = weights.clone();
    }

    @Override
    public double[] weights() {
        return weights.clone();
    }

    /** The robust coefficient vector in column order. */
    public double[] beta() {
        return coefficients.stream().mapToDouble(CoefficientEstimate::estimate).toArray();
    }
}
