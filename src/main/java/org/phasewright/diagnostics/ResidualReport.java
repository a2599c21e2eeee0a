package org.phasewright.diagnostics;

import java.util.List;
import org.phasewright.fit.FitWarning;

/**
 * Residual diagnostics of a fit.
 *
 * @param n                 residuals used (gaps excluded)
 * @param durbinWatson      sum (e_t - e_{t-1})^2 / sum e_t^2 over consecutive observed pairs; near 2 for
 *                          uncorrelated residuals, near 2 (1 - r_1) in general
 * @param autocorrelation   r_1..r_maxLag
 * @param band              approximate 95% band +-1.96 / sqrt(n) for r_k under white noise
 * @param ljungBox          portmanteau test up to maxLag
 * @param jarqueBera        normality test
 * @param warnings          autocorrelated or non-normal residuals, in words
 */
public record ResidualReport(int n, double durbinWatson, double[] autocorrelation, double band, LjungBox ljungBox,
                             JarqueBera jarqueBera, List<FitWarning> warnings) {

    public ResidualReport {
        autocorrelation = autocorrelation.clone();
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] autocorrelation() {
        return autocorrelation.clone();
    }
}
