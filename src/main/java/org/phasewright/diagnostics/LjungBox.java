package org.phasewright.diagnostics;

/**
 * Ljung-Box portmanteau test of residual autocorrelation.
 *
 * @param statistic Q = n (n + 2) sum_{k=1..h} r_k^2 / (n - k); across gaps each term is weighted by m_k / (n - k),
 *                  m_k the pairs present at lag k
 * @param lags      h
 * @param dof       degrees of freedom of the chi-square reference (h minus fitted ARMA parameters, here h; less
 *                  any lag at which gaps leave no pair)
 * @param pValue    P(chi^2_dof >= Q)
 */
public record LjungBox(double statistic, int lags, int dof, double pValue) {
}
