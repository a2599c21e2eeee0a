package org.phasewright.fit;

/**
 * What every solver path returns: the coefficients b, the matrix C = (X'WX)^-1 (so that the
 * covariance is s^2 C), the weighted residual sum of squares, the sample count, the condition
 * number of the column-scaled design, whether the constant vector lies in the column space
 * (which decides between centred and uncentred R^2), and the weighted centred total sum of squares
 * sum w (y - ybar_w)^2 computed in two passes.
 */
record LeastSquaresSolution(double[] beta, double[][] xtxInverse, double rss, int n, double conditionNumber,
                            boolean constantInSpan, double weightedSumY, double weightedSumY2, double sumWeights,
                            double sumLogWeights, double centredTss) {
}
