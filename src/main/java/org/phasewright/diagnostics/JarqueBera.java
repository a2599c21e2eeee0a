package org.phasewright.diagnostics;

/**
 * Jarque-Bera test of residual normality.
 *
 * @param statistic JB = n/6 (S^2 + (K - 3)^2 / 4)
 * @param skewness  S, the moment skewness m3 / m2^1.5 (no bias correction)
 * @param kurtosis  K, the moment kurtosis m4 / m2^2 (3 for a normal distribution)
 * @param pValue    P(chi^2_2 >= JB), the asymptotic reference
 */
public record JarqueBera(double statistic, double skewness, double kurtosis, double pValue) {
}
