package org.phasewright.model;

/**
 * A joint F-test that a group of coefficients is zero.
 *
 * @param fStat             F statistic
 * @param df1               numerator degrees of freedom (the group's size)
 * @param df2               denominator degrees of freedom (residual, n - p)
 * @param pValue            upper-tail probability of the F distribution
 * @param extraSumOfSquares rise in the residual sum of squares if the group were dropped
 * @param varianceShare     extra sum of squares divided by the total sum of squares: the share of
 *                          the signal's variation that this group alone explains
 */
public record GroupTest(double fStat, int df1, int df2, double pValue, double extraSumOfSquares,
                        double varianceShare) {
}
