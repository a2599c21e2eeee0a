package org.phasewright.fit;

/**
 * What every solver path returns: the coefficients b, the matrix C = (X'WX)^-1 (so that the
 * covariance is s^2 C), the weighted residual sum of squares, the sample count, the condition
 * number of the column-scaled design, and whether the constant vector lies in the column space
 * (which decides between centred and uncentred R^2).
 */
record LeastSquaresSolution(double[] beta, double[][] xtxInverse, double rss, int n, double conditionNumber,
                            boolean constantInSpan, double weightedSumY, double weightedSumY2, double sumWeights,
                            double sumLogWeights) {
}
